/**
 * Random radial networks for the benchmark: one supply, a few levels of boards, junctions and
 * loads, single- and three-phase, with a seeded generator so every run measures the same trees.
 */
import type { Cable, NodeElement, ProjectDocument } from '../src/model/types.ts';
import { MAX_PARALLEL } from '../src/model/bounds.ts';
import { baseSettings } from '../tests/fixtures/build.ts';
import { BREAKER_RATINGS_A, MCCB_RATINGS_A, nextRating } from '../src/catalogue/devices.ts';

/** Mulberry32: small, fast, seedable. */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const PHASES = ['L1', 'L2', 'L3'] as const;
const FINAL_SIZES = [1.5, 2.5, 4, 6, 10];
/** Levels of boards below the origin (main board = 1). */
const MAX_BOARD_DEPTH = 4;
const MAIN_SIZES = [16, 25, 35, 50, 70, 95, 120, 150, 185, 240];

/**
 * About `elements` nodes plus cables (a tree of N nodes has N − 1 cables).
 * Boards feed sub-boards and three-phase cables; loads hang on single-phase or three-phase cables.
 */
/**
 * Sizes each three-phase feeder for the current below it (about 2 A/mm², 240 mm² cables in
 * parallel beyond that), so the benchmark network is a plausible design, not a wall of findings.
 */
function sizeFeeders(nodes: NodeElement[], cables: Cable[]): void {
  const demandA = new Map<string, number>();
  const loadCurrentA = new Map<string, number>();
  for (const n of nodes)
    if (n.kind === 'load')
      loadCurrentA.set(
        n.id,
        (n.demand.value * 1000) / (n.phases === 3 ? Math.sqrt(3) * 400 : 230) / n.powerFactor,
      );
  for (const n of nodes)
    if (n.kind === 'load')
      demandA.set(n.id, (n.demand.value * 1000) / (230 * n.powerFactor) / (n.phases === 3 ? 1 : 3));
  // Cables were created parent-first, so a reverse sweep sums children before parents.
  for (let k = cables.length - 1; k >= 0; k--) {
    const c = cables[k] as Cable;
    const below = demandA.get(c.to) ?? 0;
    demandA.set(c.from, (demandA.get(c.from) ?? 0) + below);
    protect(c, below, loadCurrentA.get(c.to));
    if (c.phases !== 3 || !c.to.startsWith('B')) continue;
    const needMm2 = below / 2;
    const size = MAIN_SIZES.find((s) => s >= needMm2);
    if (size !== undefined) c.sizeMm2 = size;
    else {
      c.sizeMm2 = 240;
      c.parallel = Math.min(MAX_PARALLEL, Math.ceil(needMm2 / 240));
    }
  }
}

/**
 * Every real circuit has a protective device and known installation conditions; giving them here
 * keeps the benchmark a plausible design (checks assessed, not a wall of "not assessed" findings).
 */
function protect(c: Cable, belowA: number, loadA: number | undefined): void {
  const feeder = c.to.startsWith('B');
  // Feeders: the per-phase estimate plus a margin for imbalance; finals: the load's own current.
  const wanted = Math.max(6, loadA !== undefined ? loadA : belowA * 1.6);
  const rating = feeder
    ? (nextRating(MCCB_RATINGS_A, wanted) ?? MCCB_RATINGS_A[MCCB_RATINGS_A.length - 1]!)
    : (nextRating(BREAKER_RATINGS_A, wanted) ?? BREAKER_RATINGS_A[BREAKER_RATINGS_A.length - 1]!);
  c.device = feeder
    ? { type: 'mccb', ratingA: rating, breakingKa: 36, irMultiple: 1, imMultiple: 10 }
    : { type: 'mcb', curve: 'B', ratingA: rating, breakingKa: 10 };
  c.installation = {
    method: 'clippedDirect',
    ambientC: 30,
    groupedCircuits: 1,
    groupArrangement: 'bunched',
    insulationFactor: 1,
  };
}

export function randomNetwork(elements: number, seed = 1): ProjectDocument {
  const rand = rng(seed);
  const nodeTarget = Math.max(2, Math.round((elements + 1) / 2));
  const nodes: NodeElement[] = [];
  const cables: Cable[] = [];
  const pos = { x: 0, y: 0 };
  nodes.push({
    kind: 'supply',
    id: 'S',
    name: 'Supply',
    position: pos,
    phases: 3,
    u0V: 230,
    earthing: 'TN-C-S',
    zeOhm: 0.2,
    zeSource: 'declared',
    pfcKa: 10,
    ownership: 'public',
  });
  // Boards that take final circuits: the origin feeds boards only, as at a real intake.
  const boards: string[] = [];
  let c = 0;
  const cable = (from: string, to: string, phases: 1 | 3, sizeMm2: number, lengthM: number): Cable => ({
    id: `C${c++}`,
    name: '',
    from,
    to,
    lengthM,
    material: 'Cu',
    // Constructions with a built-in capacity table: PVC multicore finals, XLPE armoured feeders.
    insulation: phases === 3 && rand() < 0.7 ? 'thermosetting90' : 'thermoplastic70',
    construction: phases === 3 ? 'armouredMulticore' : 'multicore',
    sizeMm2,
    cpc: { kind: 'core', sizeMm2: Math.min(sizeMm2, 16), material: 'Cu' },
    phases,
    parallel: 1,
  });
  const ways = new Map<string, number>();
  const depth = new Map<string, number>([['S', 0]]);
  // Boards that may feed another board. Real distribution has a few levels (origin, main board,
  // sub-main boards, local boards), so a bigger site grows in breadth, not in depth, and its
  // paths, drops and findings per element stay like a smaller one's.
  const feeders: string[] = ['S'];
  // A board takes at most 36 outgoing ways, like a real one; full boards take no more.
  const free = (b: string) => (ways.get(b) ?? 0) < 36;
  /** A random board from `list` with a way free, else the newest such one. */
  const pick = (list: string[]): string | undefined => {
    for (let t = 0; t < 8; t++) {
      const b = list[Math.floor(rand() * list.length)] as string;
      if (free(b)) return b;
    }
    for (let k = list.length - 1; k >= 0; k--) if (free(list[k] as string)) return list[k];
    return undefined;
  };
  while (nodes.length < nodeTarget) {
    const k = nodes.length;
    const roll = rand();
    const from = roll < 0.06 || boards.length < 2 ? undefined : pick(boards);
    if (from === undefined) {
      // A new board, also when every board is full.
      const parent = pick(feeders) ?? (feeders[feeders.length - 1] as string);
      ways.set(parent, (ways.get(parent) ?? 0) + 1);
      const id = `B${k}`;
      const level = (depth.get(parent) ?? 0) + 1;
      depth.set(id, level);
      nodes.push({ kind: 'board', id, name: '', position: pos, diversity: 0.7 + 0.3 * rand() });
      cables.push(
        cable(parent, id, 3, MAIN_SIZES[Math.floor(rand() * MAIN_SIZES.length)] as number, 5 + 30 * rand()),
      );
      boards.push(id);
      if (level < MAX_BOARD_DEPTH) feeders.push(id);
      continue;
    }
    ways.set(from, (ways.get(from) ?? 0) + 1);
    if (roll < 0.1) {
      const j = `J${k}`;
      const id = `L${k + 1}`;
      nodes.push({ kind: 'junction', id: j, name: '', position: pos });
      cables.push(cable(from, j, 1, 10, 5 + 20 * rand()));
      nodes.push(load(id, 1));
      cables.push(cable(j, id, 1, 4, 5 + 20 * rand()));
    } else {
      const three = rand() < 0.15;
      const id = `L${k}`;
      nodes.push(load(id, three ? 3 : 1));
      cables.push(
        cable(
          from,
          id,
          three ? 3 : 1,
          FINAL_SIZES[Math.floor(rand() * FINAL_SIZES.length)] as number,
          3 + 25 * rand(),
        ),
      );
    }
  }
  sizeFeeders(nodes, cables);
  function load(id: string, phases: 1 | 3): NodeElement {
    return {
      kind: 'load',
      id,
      name: '',
      position: pos,
      loadKind: 'other',
      category: rand() < 0.3 ? 'lighting' : 'other',
      demand: { value: 0.2 + 4 * rand(), unit: 'kW' },
      powerFactor: 0.8 + 0.2 * rand(),
      phases,
      phase: PHASES[Math.floor(rand() * 3)] as (typeof PHASES)[number],
      demandFactor: 0.5 + 0.5 * rand(),
    };
  }
  return {
    format: 'dropline-project',
    version: 2,
    details: {
      title: 'Benchmark',
      client: '',
      site: '',
      reference: '',
      revision: '',
      author: '',
      date: '',
      notes: '',
    },
    settings: baseSettings(),
    nodes,
    cables,
    alternatives: [],
  };
}
