/**
 * Cable sizing proposals for the review dialog. The sizing engine (src/solver/sizing*) is the
 * protection engineer's; until it is part of the build, the dialog says so rather than invent
 * sizes of its own.
 */
import type { ProjectDocument } from '../../model/types.ts';
import type { Results } from '../../solver/results.ts';
import type { ProposalSet } from './proposals.ts';

export function sizingProposals(
  _doc: ProjectDocument,
  _results: Results,
  _progress: (fraction: number, text: string) => void,
): ProposalSet | Promise<ProposalSet> {
  return {
    rows: [],
    summary: ['Cable sizing is not in this build yet. Phase allocation proposals are available.'],
  };
}
