/**
 * `npm run bench`: solver timings on random radial networks against a bare traversal of the same
 * tree, measured in the same run: every size in every round, medians of the rounds' samples.
 * `npm run bench -- --json` prints one JSON object instead of the table; `--solver-only` skips
 * the editor benchmark (headless Chromium).
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { randomNetwork } from './randomNetwork.ts';
import { bareTraversal } from './traversal.ts';
import { solve } from '../src/solver/solve.ts';
import { solveDrop } from '../src/solver/solveDrop.ts';

const SIZES = [1000, 10000, 100000];
const TARGET_RATIO = 5;
const TARGET_SCALING = 12;
const json = process.argv.includes('--json');

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? (s[mid] as number) : ((s[mid - 1] as number) + (s[mid] as number)) / 2;
}

function time(fn: () => unknown): number {
  const t = performance.now();
  fn();
  return performance.now() - t;
}

interface Row {
  elements: number;
  solveMs: number;
  dropMs: number;
  traversalMs: number;
}

interface Case {
  doc: ReturnType<typeof randomNetwork>;
  /** Timed samples per round: more for small networks, so a round's median is not all noise. */
  repeats: number;
  solveT: number[];
  dropT: number[];
  travT: number[];
  /** Per round, the median solve time of this size in that round. */
  roundSolve: number[];
  /** Per round, the median bare traversal time of this size in that round. */
  roundTrav: number[];
}

const ROUNDS = 31;
let sink = 0;

/**
 * Every size is measured in every round, in blocks one after the other, so each figure and each
 * ratio between sizes comes from the same stretch of time on a shared machine. The scaling is the
 * median over rounds of the 100k solve over the 10k solve of the same round (each the median of
 * its block); the ratio to the traversal is the ratio of the medians, measured in the same blocks.
 */
function measureAll(): { rows: Row[]; pairedScaling: number; traversalScaling: number } {
  const cases: Case[] = SIZES.map((elements) => ({
    doc: randomNetwork(elements, 20261201),
    repeats: elements >= 100000 ? 5 : elements >= 10000 ? 7 : 15,
    solveT: [],
    dropT: [],
    travT: [],
    roundSolve: [],
    roundTrav: [],
  }));
  // Warm up every path so the timed rounds compare compiled code.
  for (const c of cases)
    for (let k = 0; k < 3; k++) {
      sink += bareTraversal(c.doc);
      solve(c.doc);
      solveDrop(c.doc);
    }
  for (let round = 0; round < ROUNDS; round++)
    for (const c of cases) {
      const inRound: number[] = [];
      const travInRound: number[] = [];
      for (let k = 0; k < c.repeats; k++) {
        const tt = time(() => (sink += bareTraversal(c.doc)));
        c.travT.push(tt);
        travInRound.push(tt);
        const t = time(() => solve(c.doc));
        c.solveT.push(t);
        inRound.push(t);
        c.dropT.push(time(() => solveDrop(c.doc)));
      }
      c.roundSolve.push(median(inRound));
      c.roundTrav.push(median(travInRound));
    }
  if (sink < 0) console.log(sink);
  const rows = cases.map((c) => ({
    elements: c.doc.nodes.length + c.doc.cables.length,
    solveMs: median(c.solveT),
    dropMs: median(c.dropT),
    traversalMs: median(c.travT),
  }));
  const big = cases[cases.length - 1] as Case;
  const ten = cases[SIZES.indexOf(10000)] as Case;
  const pairedScaling = median(big.roundSolve.map((t, k) => t / (ten.roundSolve[k] as number)));
  // The same pairing for the baseline: how much of the growth the machine gives any walk of the tree.
  const traversalScaling = median(big.roundTrav.map((t, k) => t / (ten.roundTrav[k] as number)));
  return { rows, pairedScaling, traversalScaling };
}

async function editorBench(): Promise<object | undefined> {
  const path = fileURLToPath(new URL('./editor.ts', import.meta.url));
  if (!existsSync(path)) return undefined;
  const mod = (await import('./editor.ts' as string)) as { runEditorBench?: () => Promise<object> };
  return mod.runEditorBench ? await mod.runEditorBench() : undefined;
}

const { rows, pairedScaling: scaling, traversalScaling } = measureAll();
const last = rows[rows.length - 1] as Row;
const tenK = rows[SIZES.indexOf(10000)] as Row;
const ratio = last.solveMs / last.traversalMs;
const baseline =
  'bare traversal = build the node id -> index map and the child adjacency from the cables, then walk the tree from the supply iteratively with one addition per element';
const editor = process.argv.includes('--solver-only') ? undefined : await editorBench();

if (json) {
  const out: Record<string, unknown> = {
    solver: rows.map(({ elements, solveMs, traversalMs, dropMs }) => ({
      elements,
      solveMs,
      traversalMs,
      dropMs,
    })),
    ratioAt100k: ratio,
    scaling10kTo100k: scaling,
    scalingOfMedians: last.solveMs / tenK.solveMs,
    traversalScaling10kTo100k: traversalScaling,
    rounds: ROUNDS,
    targets: { ratioAt100k: TARGET_RATIO, scaling10kTo100k: TARGET_SCALING },
    baseline,
  };
  if (editor !== undefined) out.editor = editor;
  console.log(JSON.stringify(out));
} else {
  console.log(`Solver benchmark (medians; solve = full solve incl. protection, drop = solveDrop alone)`);
  console.log(`Baseline: ${baseline}.`);
  console.log('elements   solve ms   drop ms   traversal ms   solve/traversal');
  for (const r of rows)
    console.log(
      `${String(r.elements).padStart(8)} ${r.solveMs.toFixed(2).padStart(10)} ${r.dropMs.toFixed(2).padStart(9)} ${r.traversalMs
        .toFixed(2)
        .padStart(14)} ${(r.solveMs / r.traversalMs).toFixed(2).padStart(17)}`,
    );
  console.log(
    `At ${last.elements} elements: solve is ${ratio.toFixed(2)}x the traversal (target <= ${TARGET_RATIO}x); ` +
      `10k -> 100k scaling ${scaling.toFixed(2)}x (target <= ${TARGET_SCALING}x; median of ${ROUNDS} paired rounds, ` +
      `${(last.solveMs / tenK.solveMs).toFixed(2)}x from the medians).`,
  );
  console.log(
    `The bare traversal grows ${traversalScaling.toFixed(2)}x from 10k to 100k in the same rounds (paired the same way).`,
  );
  if (editor !== undefined) console.log('Editor:', JSON.stringify(editor));
}
