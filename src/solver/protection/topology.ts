/**
 * The fed tree in the order protection needs it: cables from the origin outwards, the device that
 * protects each segment (its own, or the one upstream through junctions), and whether each segment
 * belongs to a final or a distribution circuit.
 */
import type { Cable, Device, Id, NodeElement, ProjectDocument } from '../../model/types.ts';
import type { Results } from '../results.ts';

export interface Topology {
  /** Fed cables, parents before children. */
  order: Cable[];
  nodeById: Map<Id, NodeElement>;
  cableById: Map<Id, Cable>;
  /** The cable that feeds each fed node. */
  feeding: Map<Id, Cable>;
  protecting: Map<Id, { device: Device | null; cableId: Id | null }>;
  circuit: Map<Id, 'final' | 'distribution'>;
}

/** Linear in the number of cables: bucket by path depth, then one pass each way. */
export function buildTopology(doc: ProjectDocument, results: Results): Topology {
  const nodeById = new Map<Id, NodeElement>();
  for (const n of doc.nodes) nodeById.set(n.id, n);
  const cableById = new Map<Id, Cable>();
  for (const c of doc.cables) cableById.set(c.id, c);
  // Breadth-first from the supply over the drawn cables: parents come before children without
  // reading the drop results' paths (they are built on access, which would cost O(depth) each).
  const incoming = new Map<Id, number>();
  const children = new Map<Id, Cable[]>();
  for (const c of doc.cables) {
    incoming.set(c.to, (incoming.get(c.to) ?? 0) + 1);
    const list = children.get(c.from);
    if (list) list.push(c);
    else children.set(c.from, [c]);
  }
  const feeding = new Map<Id, Cable>();
  const order: Cable[] = [];
  const supply = doc.nodes.find((n) => n.kind === 'supply');
  const seen = new Set<Id>(supply ? [supply.id] : []);
  const queue: Id[] = supply ? [supply.id] : [];
  for (let head = 0; head < queue.length; head++) {
    for (const c of children.get(queue[head]!) ?? []) {
      if (seen.has(c.to) || !results.nodes[c.to]) continue;
      // A node fed twice is a finding of the drop solver; follow the feed its path uses.
      if ((incoming.get(c.to) ?? 0) > 1) {
        const path = results.nodes[c.to]!.path;
        if (path[path.length - 1] !== c.id) continue;
      }
      seen.add(c.to);
      feeding.set(c.to, c);
      order.push(c);
      queue.push(c.to);
    }
  }

  const protecting = new Map<Id, { device: Device | null; cableId: Id | null }>();
  for (const c of order) {
    if (c.device) {
      protecting.set(c.id, { device: c.device, cableId: c.id });
      continue;
    }
    const fromNode = nodeById.get(c.from);
    const parent = fromNode?.kind === 'junction' ? feeding.get(c.from) : undefined;
    protecting.set(c.id, (parent && protecting.get(parent.id)) || { device: null, cableId: null });
  }

  const circuit = new Map<Id, 'final' | 'distribution'>();
  const distributionJunction = new Set<Id>();
  for (let i = order.length - 1; i >= 0; i--) {
    const c = order[i]!;
    const to = nodeById.get(c.to);
    const kind =
      to?.kind === 'board' || (to?.kind === 'junction' && distributionJunction.has(to.id))
        ? 'distribution'
        : 'final';
    circuit.set(c.id, kind);
    // A segment into a junction belongs to a distribution circuit if any segment beyond it does.
    const from = nodeById.get(c.from);
    if (kind === 'distribution' && from?.kind === 'junction') distributionJunction.add(from.id);
  }
  return { order, nodeById, cableById, feeding, protecting, circuit };
}
