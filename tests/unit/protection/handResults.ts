/**
 * Builds the drop-side Results for a small document by hand, so protection can be tested on its own
 * with currents the test chooses (the drop solver is tested elsewhere). Paths come from walking the
 * tree; each cable gets the design current the test gives; x per metre defaults to 0.
 */
import type { Id, Phase, ProjectDocument } from '../../../src/model/types.ts';
import type { CableResult, NodeResult, PhaseCurrents, Results } from '../../../src/solver/results.ts';

const pct = { value: 0, basis: 'U0' as const, basisV: 230 };

export function handResults(
  doc: ProjectDocument,
  ibA: Record<Id, number>,
  opts: { xOhmPerM?: Record<Id, number>; phase?: Record<Id, Phase> } = {},
): Results {
  const cables: Record<Id, CableResult> = {};
  const nodes: Record<Id, NodeResult> = {};
  const loads: Results['loads'] = {};
  const byFrom = new Map<Id, typeof doc.cables>();
  for (const c of doc.cables) (byFrom.get(c.from) ?? byFrom.set(c.from, []).get(c.from)!).push(c);
  const supply = doc.nodes.find((n) => n.kind === 'supply')!;
  const paths = new Map<Id, Id[]>([[supply.id, []]]);
  const stack = [supply.id];
  while (stack.length) {
    const id = stack.pop()!;
    for (const c of byFrom.get(id) ?? []) {
      paths.set(c.to, [...paths.get(id)!, c.id]);
      stack.push(c.to);
    }
  }
  for (const c of doc.cables) {
    const ib = ibA[c.id] ?? 0;
    const ph = opts.phase?.[c.id] ?? 'L1';
    const currentsA: PhaseCurrents =
      c.phases === 3 ? { L1: ib, L2: ib, L3: ib, N: 0 } : { L1: 0, L2: 0, L3: 0, N: ib, [ph]: ib };
    cables[c.id] = {
      id: c.id,
      ibA: ib,
      currentsA,
      phases: c.phases === 3 ? ['L1', 'L2', 'L3'] : [ph],
      rOhmPerM: 0.001,
      xOhmPerM: opts.xOhmPerM?.[c.id] ?? 0,
      dropV: 0,
      dropPct: pct,
      phaseDropV: {},
      cumulativePct: pct,
      maxLengthM: null,
      status: 'within',
      working: [],
    };
  }
  for (const n of doc.nodes) {
    const path = paths.get(n.id) ?? [];
    const last = path[path.length - 1];
    const currentsA = last ? { ...cables[last]!.currentsA } : { L1: 0, L2: 0, L3: 0, N: 0 };
    const r: NodeResult = {
      id: n.id,
      path,
      voltageV: {},
      cumulativePct: pct,
      currentsA,
      status: null,
      working: [],
    };
    nodes[n.id] = r;
    if (n.kind === 'load') {
      const lr = { ...r, limitPct: { ...pct, value: 5 }, budgetUsed: 0, shares: [] };
      nodes[n.id] = lr;
      loads[n.id] = lr;
    }
  }
  return {
    cables,
    nodes,
    loads,
    findings: [],
    dataSet: { id: 'x', title: 'x', source: 'x' },
    profile: { id: 'iecPublic', title: 'x', source: 'x' },
    references: [],
  };
}
