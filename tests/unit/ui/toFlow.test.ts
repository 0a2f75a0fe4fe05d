import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { parseDocument } from '../../../src/model/parseDocument.ts';
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

describe('status styling follows the label mode', () => {
  // The demo project (invented): its meter tails feed an over-limit load, so their drop status is
  // "over", while their own capacity and the loop impedance at the main board pass.
  function demo(): FlowInputs {
    const parsed = parseDocument(readFileSync('public/demo-project.json', 'utf8'));
    if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
    return { ...inputs(), doc: parsed.doc, results: solve(parsed.doc) };
  }

  test('capacity mode colours a cable by Ib <= In <= Iz and I2 <= 1.45 Iz, not by the drop it leads to', () => {
    const i = demo();
    const b = createFlowBuilder();
    const drop = new Map(b.edges(i).map((e) => [e.id, e.data!.status]));
    const capacity = b.edges({ ...i, labelMode: 'capacity' });
    let differs = 0;
    for (const e of capacity) {
      const p = i.results.cables[e.id]!.protection!;
      const checks = p.checks.filter((c) => ['ibIn', 'inIz', 'i2'].includes(c.key));
      const expected = checks.some((c) => c.pass === false)
        ? 'over'
        : checks.some((c) => c.pass === null)
          ? null
          : p.capacityUse! >= i.doc.settings.closeThreshold
            ? 'close'
            : 'within';
      expect(e.data!.status, e.id).toBe(expected);
      if (e.data!.status !== drop.get(e.id)) differs++;
    }
    expect(differs).toBeGreaterThan(0);
    const tails = i.doc.cables.find((c) => c.from === i.doc.nodes.find((n) => n.kind === 'supply')!.id)!;
    expect(drop.get(tails.id)).toBe('over');
    expect(capacity.find((e) => e.id === tails.id)!.data!.status).not.toBe('over');
  });

  test('loop impedance mode colours each point by Zs against its maximum', () => {
    const i = demo();
    const nodes = createFlowBuilder().nodes({ ...i, labelMode: 'zs' });
    for (const n of nodes) {
      const p = i.results.nodes[n.id]!.protection;
      if (!p || p.zsMaxOhm === null) continue;
      const share = p.zsOhm / p.zsMaxOhm;
      const expected = share > 1 ? 'over' : share >= i.doc.settings.closeThreshold ? 'close' : 'within';
      expect(n.data.status, n.id).toBe(expected);
    }
  });
});

describe('what sets a board status', () => {
  function demoInputs(labelMode: FlowInputs['labelMode']): FlowInputs {
    const parsed = parseDocument(
      readFileSync(new URL('../../../public/demo-project.json', import.meta.url), 'utf8'),
    );
    if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
    return { ...inputs(), doc: parsed.doc, results: solve(parsed.doc), labelMode };
  }

  test('a board shown over names the worst load it feeds, with that load’s own drop', () => {
    const i = demoInputs('drop');
    const nodes = createFlowBuilder().nodes(i);
    // The demo's worst load is L27 (over its 5 % limit); the main board and the timber store board feed it.
    const worst = Object.entries(i.results.loads).sort((a, b) => b[1].budgetUsed - a[1].budgetUsed)[0]!;
    expect(worst[1].status).toBe('over');
    const text = `${worst[0]} ${worst[1].cumulativePct.value.toFixed(2)} %`;
    for (const id of ['MB', 'DB4']) {
      const n = nodes.find((x) => x.id === id)!;
      expect(n.data.status).toBe('over');
      expect(n.data.setBy).toBe(text);
    }
    // A board whose loads are all clear needs no explaining; a load never names another.
    const clear = nodes.find((x) => x.data.element.kind === 'board' && x.data.status === 'within');
    if (clear) expect(clear.data.setBy).toBeNull();
    for (const n of nodes.filter((x) => x.data.element.kind === 'load')) expect(n.data.setBy).toBeNull();
    // The sub-main into the store board names the same load at the end of its label.
    const edges = createFlowBuilder().edges(i);
    const into = edges.find((e) => e.target === 'DB4')!;
    expect(into.data!.lines.at(-1)).toMatch(new RegExp(`· ${worst[0]}$`));
  });

  test('outside the drop views no load is named', () => {
    const nodes = createFlowBuilder().nodes(demoInputs('zs'));
    for (const n of nodes) expect(n.data.setBy).toBeNull();
  });
});

describe('fault view beyond a junction', () => {
  test('a segment with no device of its own shows the device that protects it, as its load does', async () => {
    const { newCable, newJunction, newLoad, newProject } = await import('../../../src/model/defaults.ts');
    const doc = newProject();
    doc.nodes.push(newJunction('J1', { x: 0, y: 100 }), newLoad('L1', { x: 0, y: 200 }, 'sockets'));
    doc.cables.push(
      newCable('C1', 'S1', 'J1', undefined, {
        lengthM: 10,
        device: { type: 'mcb', curve: 'B', ratingA: 20, breakingKa: 10 },
      }),
      newCable('C2', 'J1', 'L1', undefined, { lengthM: 10 }),
    );
    const results = solve(doc);
    expect(results.cables['C2']!.protection!.deviceCableId).toBe('C1');
    const i: FlowInputs = { ...inputs(), doc, results, labelMode: 'fault' };
    const edges = createFlowBuilder().edges(i);
    const c1 = edges.find((e) => e.id === 'C1')!.data!.status;
    expect(c1).not.toBeNull();
    expect(edges.find((e) => e.id === 'C2')!.data!.status).toBe(c1);
    expect(
      createFlowBuilder()
        .nodes(i)
        .find((n) => n.id === 'L1')!.data.status,
    ).toBe(c1);
  });
});
