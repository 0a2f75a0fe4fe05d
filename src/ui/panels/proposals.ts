/**
 * Proposed changes as the review dialog lists them: what would change on which element, from what
 * to what, and why, each with the plain-data change that `applyProposals` accepts. The proposals
 * themselves come from the engine (phase balance now; cable sizing where the build has it).
 */
import type { Id, ProjectDocument } from '../../model/types.ts';
import type { ProposedChange } from '../../model/commands.ts';
import type { Results } from '../../solver/results.ts';
import { proposePhaseBalance } from '../../solver/balancePhases.ts';

export interface ProposalRow {
  key: string;
  elementId: Id;
  elementName: string;
  field: string;
  from: string;
  to: string;
  reason: string;
  change: ProposedChange;
}

export interface ProposalSet {
  rows: ProposalRow[];
  /** What the engine says the whole set achieves (e.g. the conductor saved), if it says. */
  summary: string[];
}

export type ProposalKind = 'sizing' | 'balance';

function nameOf(doc: ProjectDocument, id: Id): string {
  return (doc.nodes.find((n) => n.id === id) ?? doc.cables.find((c) => c.id === id))?.name || id;
}

export function phaseBalanceProposals(doc: ProjectDocument, results: Results): ProposalSet {
  const rows = proposePhaseBalance(doc, results).map((p): ProposalRow => ({
    key: `${p.loadId}.phase`,
    elementId: p.loadId,
    elementName: nameOf(doc, p.loadId),
    field: 'Phase',
    from: p.from,
    to: p.to,
    reason: p.reason,
    change: { target: 'node', id: p.loadId, patch: { phase: p.to } },
  }));
  return {
    rows,
    summary:
      rows.length === 0
        ? ['Every three-phase board is already as balanced as moving single-phase loads can make it.']
        : [],
  };
}

/** Only the ticked rows' changes, in the order listed. */
export function acceptedChanges(rows: ProposalRow[], ticked: ReadonlySet<string>): ProposedChange[] {
  return rows.filter((r) => ticked.has(r.key)).map((r) => r.change);
}
