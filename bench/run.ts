/**
 * `npm run bench`: solver timings on random radial networks against a bare traversal of the same
 * tree, measured in the same run, interleaved, medians of several rounds.
 * `npm run bench -- --json` prints one JSON object instead of the table.
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

function measure(elements: number): Row {
  const doc = randomNetwork(elements, 20261201);
  const rounds = elements >= 100000 ? 15 : elements >= 10000 ? 31 : 101;
  const solveT: number[] = [];
  const dropT: number[] = [];
  const travT: number[] = [];
  let sink = 0;
  // Warm up every path so the timed rounds compare compiled code.
  for (let k = 0; k < 3; k++) {
    sink += bareTraversal(doc);
    solve(doc);
    solveDrop(doc);
  }
  for (let k = 0; k < rounds; k++) {
    travT.push(time(() => (sink += bareTraversal(doc))));
    solveT.push(time(() => solve(doc)));
    dropT.push(time(() => solveDrop(doc)));
  }
  if (sink < 0) console.log(sink);
  return {
    elements: doc.nodes.length + doc.cables.length,
    solveMs: median(solveT),
    dropMs: median(dropT),
    traversalMs: median(travT),
  };
}

async function editorBench(): Promise<object | undefined> {
  const path = fileURLToPath(new URL('./editor.ts', import.meta.url));
  if (!existsSync(path)) return undefined;
  const mod = (await import('./editor.ts' as string)) as { runEditorBench?: () => Promise<object> };
  return mod.runEditorBench ? await mod.runEditorBench() : undefined;
}

const rows = SIZES.map(measure);
const last = rows[rows.length - 1] as Row;
const tenK = rows.find((r) => r.elements >= 9000 && r.elements < 90000) as Row;
const ratio = last.solveMs / last.traversalMs;
const scaling = last.solveMs / tenK.solveMs;
const baseline =
  'bare traversal = build the node id -> index map and the child adjacency from the cables, then walk the tree from the supply iteratively with one addition per element';
const editor = await editorBench();

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
      `10k -> 100k scaling ${scaling.toFixed(2)}x (target <= ${TARGET_SCALING}x).`,
  );
  if (editor !== undefined) console.log('Editor:', JSON.stringify(editor));
}
