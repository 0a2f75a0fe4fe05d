/**
 * Bends on a site plan route: where a double-click puts a new bend, how a bend's node is named,
 * and the path drawn through the bends (each leg along x, then y, as the length is measured:
 * rectilinear routes along walls and trenches, common practice).
 */
import { describe, expect, test } from 'vitest';
import { bendId, bendIndex, parseBendId, planEdges, planNodes } from '../../../src/ui/plan/planFlow.ts';
import { routePath } from '../../../src/ui/plan/PlanParts.tsx';
import { applyCommand } from '../../../src/model/commands.ts';
import { solve } from '../../../src/solver/solve.ts';
import { smallNetwork } from '../commands/fixture.ts';

describe('bends on a plan route', () => {
  test('a new bend goes on the leg nearest the click', () => {
    // (0,0) → (10,10) is drawn (0,0)–(10,0)–(10,10); then → (30,10) and → (30,40).
    const points = [
      { xM: 0, yM: 0 },
      { xM: 10, yM: 10 },
      { xM: 30, yM: 10 },
      { xM: 30, yM: 40 },
    ];
    expect(bendIndex(points, { xM: 4, yM: 0 })).toBe(0);
    expect(bendIndex(points, { xM: 10, yM: 6 })).toBe(0);
    expect(bendIndex(points, { xM: 20, yM: 10.2 })).toBe(1);
    expect(bendIndex(points, { xM: 30, yM: 25 })).toBe(2);
  });

  test('bend node ids name the cable and the bend, cable ids with colons too', () => {
    expect(parseBendId(bendId('C7', 2))).toEqual({ cableId: 'C7', index: 2 });
    expect(parseBendId(bendId('A:B', 0))).toEqual({ cableId: 'A:B', index: 0 });
    expect(parseBendId('DB1')).toBeNull();
  });

  test('the route is drawn through its bends, each leg along x then y', () => {
    expect(
      routePath({ x: 0, y: 0 }, [
        { x: 50, y: 100 },
        { x: 120, y: 40 },
      ]),
    ).toBe('M 0 0 L 50 0 L 50 100 L 120 100 L 120 40');
  });

  test('the plan shows a handle for each bend of a measured route and the edge carries them', () => {
    let doc = smallNetwork();
    const place = applyCommand(doc, {
      type: 'placeOnPlan',
      moves: [
        { id: 'S1', plan: { xM: 0, yM: 0 } },
        { id: 'DB1', plan: { xM: 12, yM: 5 } },
      ],
    });
    if (!place.ok) throw new Error(place.error);
    const bent = applyCommand(place.doc, {
      type: 'updateCable',
      id: 'C1',
      patch: { route: { allowanceM: 1, via: [{ xM: 0, yM: 9 }] } },
    });
    if (!bent.ok) throw new Error(bent.error);
    doc = bent.doc;
    const results = solve(doc);
    const bends = planNodes(doc, results, [], null).filter((n) => n.type === 'bend');
    expect(bends.map((n) => n.id)).toEqual([bendId('C1', 0)]);
    const edge = planEdges(doc, results, []).find((e) => e.id === 'C1')!;
    expect(edge.data!.bends).toEqual([{ x: 0, y: 90 }]);
    // 9 + 12 + 4 = 25 m through the bend, the length shown for a typed cable's comparison too.
    expect(edge.data!.distanceM).toBe(25);
    expect(doc.cables.find((c) => c.id === 'C1')!.lengthM).toBe(26);
  });
});
