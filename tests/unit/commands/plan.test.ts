import { describe, expect, test } from 'vitest';
import { applyCommand, type Command } from '../../../src/model/commands.ts';
import { measureOnPlan, planDistanceM, roundUpTenth } from '../../../src/model/planLengths.ts';
import { parseDocument } from '../../../src/model/parseDocument.ts';
import { serializeDocument } from '../../../src/model/serializeDocument.ts';
import { createEditorStore } from '../../../src/store/editorStore.ts';
import type { ProjectDocument } from '../../../src/model/types.ts';
import { smallNetwork } from './fixture.ts';

// A 1 × 1 pixel PNG, as a data URL (any valid picture will do for the file checks).
const PIXEL =
  'data:image/png;base64,iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAQAAAC1HAwCAAAAC0lEQVR42mNkYAAAAAYAAjCB0C8AAAAASUVORK5CYII=';

function run(doc: ProjectDocument, command: Command): ProjectDocument {
  const out = applyCommand(doc, command);
  if (!out.ok) throw new Error(out.error);
  return out.doc;
}

/** S1 at (0, 0), DB1 at (12, 5), L1 at (20, 9) on the plan; C1 and C2 measured there. */
function placed(): ProjectDocument {
  let doc = run(smallNetwork(), {
    type: 'placeOnPlan',
    moves: [
      { id: 'S1', plan: { xM: 0, yM: 0 } },
      { id: 'DB1', plan: { xM: 12, yM: 5 } },
      { id: 'L1', plan: { xM: 20, yM: 9 } },
    ],
  });
  doc = run(doc, { type: 'updateCable', id: 'C1', patch: { route: { allowanceM: 3 } } });
  return run(doc, { type: 'updateCable', id: 'C2', patch: { route: { allowanceM: 2.04 } } });
}

const cable = (doc: ProjectDocument, id: string) => doc.cables.find((c) => c.id === id)!;

describe('lengths measured on the site plan', () => {
  test('rectilinear distance plus the allowance, rounded up to 0.1 m (common practice)', () => {
    expect(planDistanceM({ xM: 0, yM: 0 }, { xM: 12, yM: -5 })).toBe(17);
    expect(roundUpTenth(17.01)).toBe(17.1);
    expect(roundUpTenth(17)).toBe(17);
    // Float noise does not push a whole tenth up: 0.1 + 0.2 is 0.30000000000000004.
    expect(roundUpTenth(0.1 + 0.2)).toBe(0.3);
    const doc = placed();
    expect(cable(doc, 'C1').lengthM).toBe(20); // 12 + 5 + 3
    expect(cable(doc, 'C2').lengthM).toBe(14.1); // 8 + 4 + 2.04 = 14.04 → 14.1
    const byId = new Map(doc.nodes.map((n) => [n.id, n]));
    expect(measureOnPlan(cable(doc, 'C2'), byId)).toEqual({
      distanceM: 12,
      bends: 0,
      allowanceM: 2.04,
      lengthM: 14.1,
    });
  });

  test('moving a board on the plan lengthens its sub-main and shortens its final, in one step', () => {
    const doc = run(placed(), { type: 'placeOnPlan', moves: [{ id: 'DB1', plan: { xM: 16, yM: 7 } }] });
    expect(cable(doc, 'C1').lengthM).toBe(26); // 16 + 7 + 3
    expect(cable(doc, 'C2').lengthM).toBe(8.1); // 4 + 2 + 2.04
    // C3 has no route: its typed length stays.
    expect(cable(doc, 'C3').lengthM).toBe(cable(placed(), 'C3').lengthM);
    const store = createEditorStore(placed());
    const before = store.getState().results.loads.L1!.cumulativePct.value;
    store.getState().dispatch({ type: 'placeOnPlan', moves: [{ id: 'DB1', plan: { xM: 2, yM: 1 } }] });
    expect(store.getState().results.loads.L1!.cumulativePct.value).not.toBe(before);
    store.getState().undo();
    expect(store.getState().results.loads.L1!.cumulativePct.value).toBe(before);
  });

  test('an end not on the plan leaves the length as it was; typing a length stops measuring', () => {
    let doc = run(placed(), { type: 'placeOnPlan', moves: [{ id: 'L1', plan: null }] });
    expect(cable(doc, 'C2').lengthM).toBe(14.1);
    expect(doc.nodes.find((n) => n.id === 'L1')!.plan).toBeUndefined();
    doc = run(placed(), { type: 'updateCable', id: 'C1', patch: { lengthM: 31 } });
    expect(cable(doc, 'C1')).toMatchObject({ lengthM: 31 });
    expect(cable(doc, 'C1').route).toBeUndefined();
    doc = run(doc, { type: 'placeOnPlan', moves: [{ id: 'DB1', plan: { xM: 1, yM: 1 } }] });
    expect(cable(doc, 'C1').lengthM).toBe(31);
  });

  test('bad points, allowances and pictures are refused with the fix', () => {
    const err = (c: Command) => {
      const out = applyCommand(placed(), c);
      return out.ok ? '' : out.error;
    };
    expect(err({ type: 'placeOnPlan', moves: [{ id: 'DB1', plan: { xM: NaN, yM: 0 } }] })).toMatch(
      /board DB1.*two numbers of metres/,
    );
    expect(err({ type: 'placeOnPlan', moves: [{ id: 'DB9', plan: { xM: 1, yM: 0 } }] })).toMatch(
      /No element DB9/,
    );
    expect(err({ type: 'updateCable', id: 'C1', patch: { route: { allowanceM: -1 } } })).toMatch(
      /allowance on the plan length must be 0 to 1000 metres; got -1/,
    );
    expect(err({ type: 'setSitePlan', plan: { image: 'data:text/html;base64,AAAA', widthM: 40 } })).toMatch(
      /PNG, JPEG or SVG/,
    );
    expect(err({ type: 'setSitePlan', plan: { image: PIXEL, widthM: 0 } })).toMatch(
      /width must be a positive/,
    );
  });

  test('the plan and the placed elements are saved and read back; a bad plan in a file names the field', () => {
    const doc = run(placed(), { type: 'setSitePlan', plan: { image: PIXEL, widthM: 48 } });
    const text = serializeDocument(doc);
    const back = parseDocument(text);
    expect(back.ok && back.doc).toEqual(doc);
    const bad = JSON.parse(text);
    bad.nodes[1].plan.xM = 'left';
    bad.plan.widthM = -2;
    const r = parseDocument(JSON.stringify(bad));
    expect(r.ok ? [] : r.errors).toEqual([
      'board DB1 "Board 1": plan.xM must be metres from the left of the site plan (a finite number); got the text "left"',
      'site plan: widthM must be the metres the site plan spans across, above 0; got -2',
    ]);
  });

  test('a new scale moves every plan point with the picture and measures again, alternatives too', () => {
    let doc = run(placed(), { type: 'setSitePlan', plan: { image: PIXEL, widthM: 40 } });
    doc = run(doc, { type: 'keepAlternative', name: 'Kept', note: '', keptAt: '2025-02-03T09:30:00.000Z' });
    const scaled = run(doc, { type: 'scaleSitePlan', widthM: 60 });
    expect(scaled.plan!.widthM).toBe(60);
    expect(scaled.nodes.find((n) => n.id === 'DB1')!.plan).toEqual({ xM: 18, yM: 7.5 });
    // C1: (18 + 7.5) + 3 = 28.5 m; C2: (12 + 6) + 2.04 = 20.04 → 20.1 m.
    expect(cable(scaled, 'C1').lengthM).toBe(28.5);
    expect(cable(scaled, 'C2').lengthM).toBe(20.1);
    const alt = scaled.alternatives[0]!;
    expect(alt.nodes.find((n) => n.id === 'DB1')!.plan).toEqual({ xM: 18, yM: 7.5 });
    expect(alt.cables.find((c) => c.id === 'C1')!.lengthM).toBe(28.5);
    const none = applyCommand(placed(), { type: 'scaleSitePlan', widthM: 60 });
    expect(!none.ok && none.error).toMatch(/no site plan picture to scale/);
    const bad = applyCommand(doc, { type: 'scaleSitePlan', widthM: -1 });
    expect(!bad.ok && bad.error).toMatch(/positive number of metres/);
  });

  test('a file whose measured length no longer matches its plan opens as written, with a warning', () => {
    const raw = JSON.parse(serializeDocument(placed()));
    raw.cables.find((c: { id: string }) => c.id === 'C1').lengthM = 25;
    const r = parseDocument(JSON.stringify(raw));
    expect(r.ok && cable(r.doc, 'C1').lengthM).toBe(25);
    expect(r.ok && r.warnings).toEqual([
      "cable C1: lengthM is 25 m but its route on the site plan measures 20 m (17 m + 3 m allowance); the file's length is used until the cable is edited or an end moved on the plan",
    ]);
  });

  test('the working says a length was measured on the plan', async () => {
    const { solve } = await import('../../../src/solver/solve.ts');
    const r = solve(placed());
    const drop = r.cables.C1!.working.find((w) => w.key === 'drop')!;
    expect(drop.inputs.find((i) => i.name === 'L')!.source).toMatch(
      /measured on the site plan.*\+ 3 m allowance/,
    );
  });

  test('a part added on the plan and fed from a placed board is measured there, in one step', () => {
    const doc = placed();
    const node = {
      ...doc.nodes.find((n) => n.id === 'L1')!,
      id: 'L9',
      name: 'Yard light',
      plan: { xM: 30, yM: 1 },
    };
    const out = applyCommand(doc, { type: 'addNode', node, feedFrom: 'DB1', routeAllowanceM: 1.5 });
    if (!out.ok) throw new Error(out.error);
    const fed = out.doc.cables.find((c) => c.to === 'L9')!;
    // DB1 at (12, 5), L9 at (30, 1): 18 + 4 = 22 m on the plan, plus 1.5 m.
    expect(fed.route).toEqual({ allowanceM: 1.5 });
    expect(fed.lengthM).toBe(23.5);
    expect(out.created).toEqual(['L9', fed.id]);
    // Not on the plan at the other end, or no allowance given: the default length, typed.
    const off = { ...node, id: 'L10', plan: undefined };
    const typed = run(doc, { type: 'addNode', node: off, feedFrom: 'DB1', routeAllowanceM: 1.5 });
    const plain = typed.cables.find((c) => c.to === 'L10')!;
    expect(plain.route).toBeUndefined();
    expect(plain.lengthM).toBe(doc.settings.cableDefaults.lengthM);
    const noAllowance = run(doc, { type: 'addNode', node, feedFrom: 'DB1' });
    expect(noAllowance.cables.find((c) => c.to === 'L9')!.route).toBeUndefined();
    // A bad allowance is refused with the range, and nothing is added.
    const bad = applyCommand(doc, { type: 'addNode', node, feedFrom: 'DB1', routeAllowanceM: -2 });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.error).toMatch(/allowance .* must be 0 to 1000 metres; got -2/);
  });

  test('a route through bends is measured leg by leg, each along x then y', () => {
    // S1 (0, 0) → (0, 10) → (12, 10) → DB1 (12, 5): 10 + 12 + 5 = 27 m, plus the 3 m allowance.
    const via = [
      { xM: 0, yM: 10 },
      { xM: 12, yM: 10 },
    ];
    let doc = run(placed(), { type: 'updateCable', id: 'C1', patch: { route: { allowanceM: 3, via } } });
    expect(cable(doc, 'C1').lengthM).toBe(30);
    const byId = new Map(doc.nodes.map((n) => [n.id, n]));
    expect(measureOnPlan(cable(doc, 'C1'), byId)).toEqual({
      distanceM: 27,
      bends: 2,
      allowanceM: 3,
      lengthM: 30,
    });
    // Moving the board measures through the same bends: (0,0)→(0,10) 10, →(12,10) 12, →(20,5) 8 + 5.
    doc = run(doc, { type: 'placeOnPlan', moves: [{ id: 'DB1', plan: { xM: 20, yM: 5 } }] });
    expect(cable(doc, 'C1').lengthM).toBe(38);
    // A new scale moves the bends with the picture: everything doubles but the allowance.
    doc = run(doc, { type: 'setSitePlan', plan: { image: PIXEL, widthM: 40 } });
    const scaled = run(doc, { type: 'scaleSitePlan', widthM: 80 });
    expect(cable(scaled, 'C1').route!.via).toEqual([
      { xM: 0, yM: 20 },
      { xM: 24, yM: 20 },
    ]);
    expect(cable(scaled, 'C1').lengthM).toBe(2 * 35 + 3);
    // Splitting the cable leaves both parts measured without bends (the junction is not placed yet).
    const split = run(doc, { type: 'splitCable', id: 'C1' });
    for (const c of split.cables.filter((x) => x.id === 'C1' || x.from.startsWith('J')))
      expect(c.route).toEqual({ allowanceM: 3 });
    // Saved and read back with its bends.
    const back = parseDocument(serializeDocument(doc));
    expect(back.ok && cable(back.doc, 'C1').route).toEqual({ allowanceM: 3, via });
  });

  test('bad bends are refused with the bend and the fix; a file with a bad bend names the field', () => {
    const err = (via: { xM: number; yM: number }[]) => {
      const out = applyCommand(placed(), {
        type: 'updateCable',
        id: 'C1',
        patch: { route: { allowanceM: 3, via } },
      });
      return out.ok ? '' : out.error;
    };
    expect(
      err([
        { xM: 1, yM: 1 },
        { xM: Infinity, yM: 0 },
      ]),
    ).toMatch(/cable C1.*bend 2 of the route must be two numbers of metres within ±100000; got Infinity, 0/);
    expect(err(Array.from({ length: 51 }, (_, k) => ({ xM: k, yM: 0 })))).toMatch(
      /at most 50 bends; got 51\. Remove some/,
    );
    const doc = run(placed(), {
      type: 'updateCable',
      id: 'C1',
      patch: { route: { allowanceM: 3, via: [{ xM: 0, yM: 10 }] } },
    });
    const bad = JSON.parse(serializeDocument(doc));
    bad.cables.find((c: { id: string }) => c.id === 'C1').route.via[0].yM = 'north';
    const r = parseDocument(JSON.stringify(bad));
    expect(r.ok).toBe(false);
    expect(r.ok ? '' : r.errors.join('\n')).toMatch(/cable C1.*route\.via\.0\.yM/);
  });
});
