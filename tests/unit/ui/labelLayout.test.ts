import { describe, expect, test } from 'vitest';
import { newBoard, newJunction, newLoad } from '../../../src/model/defaults.ts';
import { NODE_SIZE } from '../../../src/model/layout.ts';
import { labelRaises, labelWidthPx, type LabelBox } from '../../../src/ui/canvas/labelLayout.ts';
import { createFlowBuilder } from '../../../src/ui/canvas/toFlow.ts';
import { solve } from '../../../src/solver/solve.ts';
import { smallNetwork } from '../commands/fixture.ts';

const LINES = ['13.7 A · 9.28 V', 'Σ 4.50 % (+4.04 %)'];

function row(pitch: number, count: number): LabelBox[] {
  return Array.from({ length: count }, (_, i) => ({
    id: `C${i}`,
    to: newLoad(`L${i}`, { x: i * pitch, y: 320 }),
    heading: `C${i} · 30 m`,
    lines: LINES,
  }));
}

describe('cable label placement', () => {
  test('labels with room beside each other stay level', () => {
    const w = labelWidthPx('C1 · 30 m', LINES);
    const raises = labelRaises(row(w + 20, 5));
    expect([...raises.values()]).toEqual([0, 0, 0, 0, 0]);
  });

  test('labels that would overlap alternate between two heights, and the lifted ones clear each other', () => {
    const w = labelWidthPx('C1 · 30 m', LINES);
    const pitch = Math.round(w * 0.7);
    const raises = [...labelRaises(row(pitch, 6)).values()];
    expect(raises[0]).toBe(0);
    expect(raises[1]).toBeGreaterThan(0);
    expect(raises).toEqual([0, raises[1], 0, raises[1], 0, raises[1]]);
    // Every other label is 2 pitches apart, wider than a label: no overlap on either level.
    expect(2 * pitch).toBeGreaterThan(w);
  });

  test('labels on different rows do not affect each other', () => {
    const a = row(40, 1);
    const b = row(40, 1).map((x) => ({ ...x, id: 'D0', to: { ...x.to, position: { x: 0, y: 600 } } }));
    expect([...labelRaises([...a, ...b]).values()]).toEqual([0, 0]);
  });

  test('the flow view lifts crowded labels, labels beside a junction, and uses the id when the name repeats the load', () => {
    const doc = smallNetwork();
    // Two loads closer than a label is wide, and a junction on the way to a third.
    doc.nodes = doc.nodes.map((n) =>
      n.id === 'L1'
        ? { ...n, position: { x: 0, y: 320 } }
        : n.id === 'L2'
          ? { ...n, position: { x: 80, y: 320 } }
          : n,
    );
    doc.nodes.push(
      newJunction('J1', { x: 400, y: 240 }),
      newLoad('L3', { x: 380, y: 320 }),
      newBoard('DB9', { x: 600, y: 0 }),
    );
    doc.cables.push(
      { ...doc.cables[1]!, id: 'C4', name: 'Yard run', from: 'DB1', to: 'J1' },
      { ...doc.cables[1]!, id: 'C5', name: 'L3', from: 'J1', to: 'L3' },
    );
    const b = createFlowBuilder();
    const edges = b.edges({
      doc,
      results: solve(doc),
      selection: [],
      dragPositions: null,
      labelMode: 'drop',
      showLabels: true,
      detail: 2,
    });
    const data = new Map(edges.map((e) => [e.id, e.data!]));
    expect(data.get('C2')!.raisePx).toBe(0);
    expect(data.get('C3')!.raisePx).toBeGreaterThan(0);
    expect(data.get('C4')!.labelSide).toBe('beside');
    expect(data.get('C4')!.heading).toBe('Yard run · 30 m');
    expect(data.get('C5')!.heading).toBe('C5 · 30 m');
    expect(data.get('C5')!.labelSide).toBe('above');
    expect(NODE_SIZE.junction.width).toBeLessThan(NODE_SIZE.load.width);
  });
});
