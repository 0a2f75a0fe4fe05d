/**
 * Writes public/demo-project.json: an invented joinery workshop with offices and a timber store
 * across the yard. Names, figures and lengths are our own scenario. Lengths were tuned with
 * `dropline check` so that some loads are close to their limit and some over it.
 *
 * Run: npx tsx scripts/buildDemo.ts
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type {
  Cable,
  Device,
  Installation,
  Load,
  LoadKind,
  Phase,
  ProjectDocument,
} from '../src/model/types.ts';
import { newBoard, newCable, newJunction, newLoad, newProject } from '../src/model/defaults.ts';
import { parseDocument } from '../src/model/parseDocument.ts';
import { serializeDocument } from '../src/model/serializeDocument.ts';

const doc: ProjectDocument = newProject({ date: '2025-03-14' });
doc.details = {
  title: 'Pellow Brook Joinery: workshop, offices and timber store',
  client: 'Pellow Brook Joinery Ltd',
  site: 'Unit 3, Pellow Brook Farm, Eastmoor',
  reference: 'PBJ-E-001',
  revision: 'B',
  author: 'D. Marsh',
  date: '2025-03-14',
  notes:
    'Demo project (invented scenario). Public three-phase supply at the workshop; the timber store is ' +
    'fed across the yard by a buried sub-main that changes size at the yard junction. Ze and fault ' +
    'level are the supply company declared maxima and must be confirmed on site.',
  revisions: [
    {
      revision: 'A',
      date: '2025-02-21',
      description: 'First issue, for comment',
      by: 'D. Marsh',
      checked: '',
    },
    {
      revision: 'B',
      date: '2025-03-14',
      description:
        'Issued for tender: timber store fed across the yard, cable lengths measured on the site plan',
      by: 'D. Marsh',
      checked: 'R. Penhale',
    },
  ],
};

const supply = doc.nodes[0]!;
supply.name = 'Supply 100 A TP&N';
// Centred over the main board (positions are top-left corners: supply 72 px wide, board 176 px).
supply.position = { x: 52, y: 0 };
// Declared by the (invented) supply company for this rural pole-mounted transformer.
if (supply.kind === 'supply') supply.pfcKa = 10;

const T_E: Partial<Cable> = { construction: 'flatTwinEarth', insulation: 'thermoplastic70', phases: 1 };
const SWA3: Partial<Cable> = { construction: 'armouredMulticore', insulation: 'thermosetting90', phases: 3 };
const clipped: Installation = {
  method: 'clippedDirect',
  ambientC: 30,
  groupedCircuits: 1,
  groupArrangement: 'bunched',
  insulationFactor: 1,
};
const grouped = (n: number): Installation => ({
  ...clipped,
  groupedCircuits: n,
  groupArrangement: 'singleLayer',
});
const mcb = (curve: 'B' | 'C' | 'D', ratingA: number, rcd = false, breakingKa = 10): Device => ({
  type: rcd ? 'rcbo' : 'mcb',
  curve,
  ratingA,
  breakingKa,
  ...(rcd ? { rcd: { type: 'A' as const, idnMa: 30 } } : {}),
});
const teCpc = (size: number) => ({
  kind: 'core' as const,
  sizeMm2: size <= 1.5 ? 1 : size <= 4 ? 1.5 : 2.5,
  material: 'Cu' as const,
});
const armour = (mm2: number) => ({ kind: 'armour' as const, sizeMm2: mm2, material: 'steel' as const });

let cableNo = 1;
function cable(
  from: string,
  to: string,
  name: string,
  lengthM: number,
  sizeMm2: number,
  extra: Partial<Cable>,
): void {
  doc.cables.push(
    newCable(`C${cableNo++}`, from, to, doc.settings.cableDefaults, { name, lengthM, sizeMm2, ...extra }),
  );
}

let loadNo = 1;
interface LoadSpec {
  name: string;
  kind: LoadKind;
  kw?: number;
  amps?: number;
  pf?: number;
  phase?: Phase;
  three?: boolean;
  df?: number;
  at: number;
}
function load(board: string, row: number, spec: LoadSpec): string {
  const id = `L${loadNo++}`;
  const over: Partial<Load> = {
    name: spec.name,
    phase: spec.phase ?? 'L1',
    position: { x: spec.at, y: row },
  };
  if (spec.kw !== undefined) over.demand = { value: spec.kw, unit: 'kW' };
  if (spec.amps !== undefined) over.demand = { value: spec.amps, unit: 'A' };
  if (spec.pf !== undefined) over.powerFactor = spec.pf;
  if (spec.three !== undefined) over.phases = spec.three ? 3 : 1;
  if (spec.df !== undefined) over.demandFactor = spec.df;
  doc.nodes.push(newLoad(id, { x: spec.at, y: row }, spec.kind, over));
  void board;
  return id;
}

// Main board in the workshop, fed by 35 mm² single-core tails from the cut-out.
doc.nodes.push(newBoard('MB', { x: 0, y: 160 }, { name: 'Main board (workshop)', diversity: 0.7 }));
cable('S1', 'MB', 'Meter tails', 3, 35, {
  construction: 'singleCore',
  insulation: 'thermoplastic70',
  phases: 3,
  cpc: { kind: 'separate', sizeMm2: 16, material: 'Cu' },
  device: { type: 'fuseGG', ratingA: 100, breakingKa: 80 },
  installation: clipped,
});

// Workshop final circuits straight off the main board.
const rowA = 340;
const ws: [LoadSpec, number, Partial<Cable>, Device][] = [
  [
    { name: 'Workshop high-bay lights 1', kind: 'lighting', kw: 1.2, pf: 0.95, phase: 'L1', at: -1300 },
    32,
    { ...T_E, sizeMm2: 1.5, cpc: teCpc(1.5) },
    mcb('B', 10),
  ],
  [
    { name: 'Workshop high-bay lights 2', kind: 'lighting', kw: 1.2, pf: 0.95, phase: 'L3', at: -1170 },
    38,
    { ...T_E, sizeMm2: 1.5, cpc: teCpc(1.5) },
    mcb('B', 10),
  ],
  [
    { name: 'Bench sockets north', kind: 'sockets', amps: 20, pf: 0.95, phase: 'L1', df: 0.8, at: -1040 },
    26,
    { ...T_E, sizeMm2: 6, cpc: teCpc(6) },
    mcb('B', 32, true),
  ],
  [
    { name: 'Bench sockets south', kind: 'sockets', amps: 20, pf: 0.95, phase: 'L3', df: 0.8, at: -910 },
    30,
    { ...T_E, sizeMm2: 6, cpc: teCpc(6) },
    mcb('B', 32, true),
  ],
  [
    { name: 'Panel saw', kind: 'motor', kw: 5.5, pf: 0.85, three: true, at: -780 },
    18,
    { ...SWA3, sizeMm2: 4, cpc: armour(35) },
    mcb('C', 20),
  ],
  [
    { name: 'Spindle moulder', kind: 'motor', kw: 4, pf: 0.84, three: true, at: -650 },
    22,
    { ...SWA3, sizeMm2: 2.5, cpc: armour(19) },
    mcb('C', 16),
  ],
  [
    { name: 'Dust extractor', kind: 'motor', kw: 7.5, pf: 0.86, three: true, at: -520 },
    28,
    { ...SWA3, sizeMm2: 4, cpc: armour(35) },
    mcb('C', 20),
  ],
  [
    { name: 'Compressor', kind: 'motor', kw: 3, pf: 0.82, three: true, at: -390 },
    12,
    { ...SWA3, sizeMm2: 2.5, cpc: armour(19) },
    mcb('C', 16),
  ],
  [
    { name: 'Yard lights (front)', kind: 'lighting', kw: 0.4, pf: 0.9, phase: 'L1', at: -260 },
    46,
    {
      construction: 'armouredMulticore',
      insulation: 'thermosetting90',
      phases: 1,
      sizeMm2: 1.5,
      cpc: armour(14),
    },
    mcb('B', 6),
  ],
];
for (const [spec, len, c, dev] of ws) {
  const id = load('MB', rowA, spec);
  cable('MB', id, spec.name, len, c.sizeMm2!, {
    ...c,
    device: { ...dev, breakingKa: 15 },
    installation: grouped(6),
  });
}
for (const m of doc.nodes)
  if (m.kind === 'load' && m.loadKind === 'motor')
    m.motor = { startMultiple: 6, startPowerFactor: 0.3, dipLimitPct: 10 };

// Offices: a single-phase board on L2.
doc.nodes.push(newBoard('DB2', { x: 0, y: rowA }, { name: 'Offices board', diversity: 0.8 }));
cable('MB', 'DB2', 'Sub-main to offices', 28, 16, {
  construction: 'armouredMulticore',
  insulation: 'thermosetting90',
  phases: 1,
  cpc: armour(36),
  device: { type: 'fuseGG', ratingA: 63, breakingKa: 80 },
  installation: clipped,
});
const rowB = 540;
const off: [LoadSpec, number, number, Device][] = [
  [{ name: 'Office lights', kind: 'lighting', kw: 0.6, pf: 0.95, at: -260 }, 22, 1.5, mcb('B', 6)],
  [
    { name: 'Meeting room and corridor lights', kind: 'lighting', kw: 0.5, pf: 0.95, at: -130 },
    30,
    1.5,
    mcb('B', 6),
  ],
  [
    { name: 'Office sockets A', kind: 'sockets', amps: 16, pf: 0.95, df: 0.6, at: 0 },
    24,
    2.5,
    mcb('B', 20, true),
  ],
  [
    { name: 'Office sockets B', kind: 'sockets', amps: 16, pf: 0.95, df: 0.6, at: 130 },
    29,
    2.5,
    mcb('B', 20, true),
  ],
  [{ name: 'Kitchen water heater', kind: 'waterHeating', kw: 3, pf: 1, at: 260 }, 12, 2.5, mcb('B', 16)],
  [
    { name: 'Kitchen sockets', kind: 'sockets', amps: 20, pf: 1, df: 0.7, at: 390 },
    10,
    2.5,
    mcb('B', 20, true),
  ],
  [{ name: 'Office heat pump', kind: 'hvac', kw: 2.5, pf: 0.9, at: 520 }, 16, 2.5, mcb('C', 16)],
  [{ name: 'Comms cabinet', kind: 'other', kw: 0.5, pf: 0.95, at: 650 }, 8, 2.5, mcb('B', 16, true)],
];
for (const [spec, len, size, dev] of off) {
  const id = load('DB2', rowB, { ...spec, phase: 'L2' });
  cable('DB2', id, spec.name, len, size, {
    ...T_E,
    sizeMm2: size,
    cpc: teCpc(size),
    device: dev,
    installation: grouped(4),
  });
}

// Finishing shop: a three-phase board.
doc.nodes.push(newBoard('DB3', { x: 900, y: rowA }, { name: 'Finishing shop board', diversity: 0.9 }));
cable('MB', 'DB3', 'Sub-main to finishing shop', 44, 16, {
  ...SWA3,
  cpc: armour(44),
  device: { type: 'fuseGG', ratingA: 63, breakingKa: 80 },
  installation: clipped,
});
const fin: [LoadSpec, number, Partial<Cable>, Device][] = [
  [
    { name: 'Spray booth extract fan', kind: 'motor', kw: 2.2, pf: 0.8, three: true, at: 800 },
    12,
    { ...SWA3, sizeMm2: 2.5, cpc: armour(19) },
    mcb('C', 10),
  ],
  [
    { name: 'Drying room heaters', kind: 'heating', kw: 9, pf: 1, three: true, at: 930 },
    16,
    { ...SWA3, sizeMm2: 2.5, cpc: armour(19) },
    mcb('B', 20),
  ],
  [
    { name: 'Finishing lights', kind: 'lighting', kw: 0.8, pf: 0.95, phase: 'L1', at: 1060 },
    24,
    { ...T_E, sizeMm2: 1.5, cpc: teCpc(1.5) },
    mcb('B', 6),
  ],
  [
    { name: 'Finishing sockets', kind: 'sockets', amps: 16, pf: 0.95, phase: 'L2', df: 0.7, at: 1190 },
    26,
    { ...T_E, sizeMm2: 2.5, cpc: teCpc(2.5) },
    mcb('B', 20, true),
  ],
  [
    { name: 'Sanding bench sockets', kind: 'sockets', amps: 16, pf: 0.95, phase: 'L3', df: 0.7, at: 1320 },
    20,
    { ...T_E, sizeMm2: 2.5, cpc: teCpc(2.5) },
    mcb('B', 20, true),
  ],
  [
    { name: 'Store cupboard lights', kind: 'lighting', kw: 0.2, pf: 0.95, phase: 'L3', at: 1450 },
    18,
    { ...T_E, sizeMm2: 1.5, cpc: teCpc(1.5) },
    mcb('B', 6),
  ],
];
for (const [spec, len, c, dev] of fin) {
  const id = load('DB3', rowB, spec);
  cable('DB3', id, spec.name, len, c.sizeMm2!, { ...c, device: dev, installation: grouped(4) });
}

// Timber store across the yard: 25 mm² buried to the yard junction, then 16 mm² along the wall.
doc.nodes.push(newJunction('J1', { x: 1900, y: rowA }, { name: 'Yard junction box' }));
cable('MB', 'J1', 'Yard sub-main (buried)', 72, 25, {
  ...SWA3,
  cpc: armour(60),
  device: { type: 'fuseGG', ratingA: 63, breakingKa: 80 },
  installation: {
    method: 'buriedDuct',
    ambientC: 20,
    groupedCircuits: 1,
    groupArrangement: 'bunched',
    insulationFactor: 1,
  },
});
doc.nodes.push(newBoard('DB4', { x: 1900, y: rowB }, { name: 'Timber store board' }));
cable('J1', 'DB4', 'Yard sub-main (store wall)', 38, 16, { ...SWA3, cpc: armour(44), installation: clipped });
const rowC = 740;
const store: [LoadSpec, number, Partial<Cable>, Device][] = [
  [
    { name: 'Store lights', kind: 'lighting', kw: 0.6, pf: 0.95, phase: 'L1', at: 1600 },
    30,
    { ...T_E, sizeMm2: 1.5, cpc: teCpc(1.5) },
    mcb('B', 6),
  ],
  [
    { name: 'Store sockets', kind: 'sockets', amps: 16, pf: 0.95, phase: 'L2', df: 0.7, at: 1730 },
    20,
    { ...T_E, sizeMm2: 2.5, cpc: teCpc(2.5) },
    mcb('B', 20, true),
  ],
  [
    { name: 'Kiln heater', kind: 'heating', kw: 9, pf: 1, three: true, at: 1860 },
    8,
    { ...SWA3, sizeMm2: 4, cpc: armour(35) },
    mcb('B', 20),
  ],
  [
    { name: 'Van charge point', kind: 'evCharging', kw: 7, pf: 1, phase: 'L3', at: 1990 },
    26,
    {
      construction: 'armouredMulticore',
      insulation: 'thermosetting90',
      phases: 1,
      sizeMm2: 6,
      cpc: armour(23),
    },
    mcb('B', 32, true),
  ],
  [
    { name: 'Forklift charger', kind: 'other', kw: 3, pf: 0.95, phase: 'L1', at: 2120 },
    14,
    { ...T_E, sizeMm2: 2.5, cpc: teCpc(2.5) },
    mcb('C', 16, true),
  ],
  [
    { name: 'Yard floodlights (rear)', kind: 'lighting', kw: 0.8, pf: 0.9, phase: 'L2', at: 2250 },
    44,
    {
      construction: 'armouredMulticore',
      insulation: 'thermosetting90',
      phases: 1,
      sizeMm2: 1.5,
      cpc: armour(14),
    },
    mcb('B', 6),
  ],
];
for (const [spec, len, c, dev] of store) {
  const id = load('DB4', rowC, spec);
  cable('DB4', id, spec.name, len, c.sizeMm2!, { ...c, device: dev, installation: grouped(3) });
}

// The site plan: an invented drawing of the site (workshop, offices, finishing shop, yard and
// timber store), 130 m across. Boards stand where the sub-main lengths above put them; each load
// stands near its board, and a cable whose typed length is at least its rectilinear distance on
// the plan is measured there, with the rest as its allowance, so the lengths stay as typed.
const PLAN_W = 130;
const PLAN_H = 75;
const svg = [
  `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${PLAN_W * 10} ${PLAN_H * 10}" width="${PLAN_W * 10}" height="${PLAN_H * 10}">`,
  '<rect width="100%" height="100%" fill="#fdfdfb"/>',
  '<g fill="#f1eee6" stroke="#6b6455" stroke-width="4">',
  '<rect x="50" y="50" width="400" height="300"/>',
  '<rect x="500" y="50" width="250" height="200"/>',
  '<rect x="500" y="300" width="300" height="200"/>',
  '<rect x="980" y="420" width="280" height="280"/>',
  '</g>',
  '<rect x="840" y="80" width="420" height="300" fill="#eef2ea" stroke="#9aa58c" stroke-width="3" stroke-dasharray="16 10"/>',
  '<path d="M 450 200 L 950 200 L 950 300 L 1100 300 L 1100 420" fill="none" stroke="#b9ad92" stroke-width="10" stroke-dasharray="24 12"/>',
  '<g font-family="sans-serif" font-size="26" fill="#4d483d">',
  '<text x="70" y="90">Workshop</text><text x="520" y="90">Offices</text>',
  '<text x="520" y="340">Finishing shop</text><text x="1000" y="460">Timber store</text>',
  '<text x="860" y="120">Yard</text><text x="620" y="190" font-size="20">buried duct</text>',
  '</g>',
  '<g stroke="#1e2931" stroke-width="4"><path d="M 60 720 L 260 720 M 60 708 L 60 732 M 160 712 L 160 728 M 260 708 L 260 732"/></g>',
  '<text x="60" y="700" font-family="sans-serif" font-size="22" fill="#1e2931">0        10        20 m</text>',
  '</svg>',
].join('');
doc.plan = { image: `data:image/svg+xml;base64,${Buffer.from(svg).toString('base64')}`, widthM: PLAN_W };
const BOARD_PLAN: Record<string, [number, number]> = {
  S1: [42, 21],
  MB: [40, 20],
  DB2: [55, 12],
  DB3: [60, 40],
  J1: [95, 30],
  DB4: [110, 50],
};
for (const n of doc.nodes) {
  const at = BOARD_PLAN[n.id];
  if (at) n.plan = { xM: at[0], yM: at[1] };
}
// Loads in a row below their board, inside its building.
const byParent = new Map<string, string[]>();
for (const c of doc.cables) {
  const to = doc.nodes.find((n) => n.id === c.to);
  if (to?.kind === 'load') byParent.set(c.from, [...(byParent.get(c.from) ?? []), to.id]);
}
const ROW_SPAN: Record<string, [number, number, number]> = {
  MB: [8, 42, 31],
  DB2: [52, 73, 22],
  DB3: [52, 78, 47],
  DB4: [100, 124, 66],
};
for (const [board, loads] of byParent) {
  const [x0, x1, y] = ROW_SPAN[board] ?? [0, 0, 0];
  const at = BOARD_PLAN[board] ?? [0, 0];
  loads.forEach((id, k) => {
    const n = doc.nodes.find((x) => x.id === id)!;
    const length = doc.cables.find((c) => c.to === id)?.lengthM ?? 0;
    // Within reach of its cable: the rectilinear distance leaves at least 1 m of allowance.
    const dy = Math.min(y - at[1], length / 2);
    const reach = Math.max(0, length - dy - 1);
    const want = loads.length === 1 ? (x0 + x1) / 2 : x0 + ((x1 - x0) * k) / (loads.length - 1);
    const x = Math.min(at[0] + reach, Math.max(at[0] - reach, want));
    n.plan = { xM: Math.round(x * 10) / 10, yM: Math.round((at[1] + dy) * 10) / 10 };
  });
}
const planOf = new Map(doc.nodes.map((n) => [n.id, n.plan]));
for (const c of doc.cables) {
  const a = planOf.get(c.from);
  const b = planOf.get(c.to);
  if (!a || !b) continue;
  const d = Math.abs(a.xM - b.xM) + Math.abs(a.yM - b.yM);
  const allowance = Math.round((c.lengthM - d) * 10) / 10;
  if (allowance >= 0) c.route = { allowanceM: allowance };
}

// A named alternative, to compare with the design as drawn: the yard sub-main in 35 mm² all the
// way to the store board (the armour figure is this demo's own, as every figure here is).
const upsized = structuredClone({ settings: doc.settings, nodes: doc.nodes, cables: doc.cables });
for (const c of upsized.cables)
  if (c.to === 'J1' || c.to === 'DB4') {
    c.sizeMm2 = 35;
    c.cpc = armour(66);
  }
doc.alternatives.push({
  name: 'Yard sub-main in 35 mm²',
  note: 'Both lengths of the yard sub-main in 35 mm² SWA, to bring the store circuits within their limits.',
  keptAt: '2025-03-14T10:30:00.000Z',
  ...upsized,
});

const text = serializeDocument(doc);
const check = parseDocument(text);
if (!check.ok) throw new Error(`demo is not a valid project:\n${check.errors.join('\n')}`);
if (check.warnings.length > 0) throw new Error(`demo has warnings:\n${check.warnings.join('\n')}`);
const target = fileURLToPath(new URL('../public/demo-project.json', import.meta.url));
writeFileSync(target, text);
console.log(`wrote ${target}: ${doc.nodes.length} nodes, ${doc.cables.length} cables`);
