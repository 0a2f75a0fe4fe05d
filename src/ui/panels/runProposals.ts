/**
 * Runs a proposal job off the current frame so the dialog can show progress first, and lets the
 * dialog stop caring about a run it no longer needs (the result is then dropped).
 */
import type { ProjectDocument } from '../../model/types.ts';
import type { Results } from '../../solver/results.ts';
import { phaseBalanceProposals, type ProposalKind, type ProposalSet } from './proposals.ts';
import { sizingProposals } from './sizingProposals.ts';
import { DEFAULT_SIZING, type SizingOptions } from '../../solver/sizing/sizingCore.ts';

export interface Progress {
  text: string;
  /** 0..1 where the engine reports it; null while it cannot say. */
  fraction: number | null;
}

export interface Job {
  done: Promise<ProposalSet>;
  cancel: () => void;
}

export function runProposals(
  kind: ProposalKind,
  doc: ProjectDocument,
  results: Results,
  onProgress: (p: Progress) => void,
  sizing: SizingOptions = DEFAULT_SIZING,
): Job {
  let cancelled = false;
  const report = (p: Progress) => {
    if (!cancelled) onProgress(p);
  };
  const done = new Promise<ProposalSet>((resolve, reject) => {
    report({
      text: kind === 'sizing' ? 'Looking for the least conductor that passes…' : 'Balancing phases…',
      fraction: null,
    });
    // A macrotask, so the progress is painted before the engine starts.
    setTimeout(() => {
      if (cancelled) return;
      try {
        const set =
          kind === 'balance'
            ? phaseBalanceProposals(doc, results)
            : sizingProposals(
                doc,
                results,
                (fraction, text) => report({ fraction, text }),
                () => cancelled,
                sizing,
              );
        Promise.resolve(set).then((s) => {
          if (!cancelled) resolve(s);
        }, reject);
      } catch (e) {
        reject(e);
      }
    }, 0);
  });
  return {
    done,
    cancel: () => {
      cancelled = true;
    },
  };
}
