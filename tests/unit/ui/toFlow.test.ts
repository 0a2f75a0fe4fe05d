import { describe, expect, test } from 'vitest';
import { createFlowBuilder, type FlowInputs } from '../../../src/ui/canvas/toFlow.ts';
import { cableLabel } from '../../../src/ui/canvas/labels.ts';
import { solve } from '../../../src/solver/solve.ts';
import { smallNetwork } from '../commands/fixture.ts';

function inputs(): FlowInputs {
  const doc = smallNetwork();
  return {
    doc,
    results: solve(doc),
    selection: [],
    dragPositions: null,
    labelMode: 'drop',
    showLabels: true,
    detail: 2,
  };
}

describe('flow view of the document', () => {
  test('one flow node per element and one edge per cable, joined to the solver results', () => {
    const b = createFlowBuilder();
    const i = inputs();
    const nodes = b.nodes(i);
    const edges = b.edges(i);
    expect(nodes.map((n) => n.id)).toEqual(['S1', 'DB1', 'L1', 'L2']);
    expect(edges.map((e) => [e.source, e.target, e.sourceHandle, e.targetHandle])).toEqual([
      ['S1', 'DB1', 'out', 'in'],
      ['DB1', 'L1', 'out', 'in'],
      ['DB1', 'L2', 'out', 'in'],
    ]);
    expect(edges[2]!.data!.status).toBe(i.results.cables['C3']!.status);
    // Every edge end names a handle its node declares, or React Flow would drop the edge.
    for (const e of edges) {
      const src = nodes.find((n) => n.id === e.source)!;
      const dst = nodes.find((n) => n.id === e.target)!;
      expect(src.handles!.some((h) => h.id === e.sourceHandle && h.type === 'source')).toBe(true);
      expect(dst.handles!.some((h) => h.id === e.targetHandle && h.type === 'target')).toBe(true);
    }
  });

  test('during a drag only the dragged node gets a new object; the others keep theirs', () => {
    const b = createFlowBuilder();
    const i = inputs();
    const first = b.nodes(i);
    const second = b.nodes({ ...i, dragPositions: { DB1: { x: 300, y: 160 } } });
    expect(second[1]!.position).toEqual({ x: 300, y: 160 });
    expect(second[1]!.data).toBe(first[1]!.data);
    for (const k of [0, 2, 3]) expect(second[k]).toBe(first[k]);
  });

  test('a cable that cannot be drawn (from a load) stays out of the view', () => {
    const b = createFlowBuilder();
    const i = inputs();
    i.doc.cables.push({ ...i.doc.cables[1]!, id: 'C9', from: 'L1', to: 'L2' });
    expect(b.edges(i).map((e) => e.id)).toEqual(['C1', 'C2', 'C3']);
  });
});

describe('cable labels', () => {
  test('show Ib and own drop in V, then the cumulative % and the cable’s own share, from the results, rounded for display', () => {
    const i = inputs();
    const r = i.results.cables['C3']!;
    const [first, second] = cableLabel(r, 'drop', i.results.nodes['L2']);
    expect(first).toBe(`${r.ibA.toFixed(r.ibA >= 10 ? 1 : 2)} A · ${r.dropV.toFixed(2)} V`);
    expect(second).toBe(`Σ ${r.cumulativePct.value.toFixed(2)} % (+${r.dropPct.value.toFixed(2)} %)`);
  });
});
