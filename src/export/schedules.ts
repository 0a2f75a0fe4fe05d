/**
 * The schedules' rows and columns, built from the document and the solver's results. Cells carry a
 * raw value (for sorting) and its display text. No figure is computed here beyond picking the
 * solver's own values and the document's inputs.
 */
import type { Device, Id, NodeElement, ProjectDocument } from '../model/types.ts';
import type { Results, Status } from '../solver/results.ts';
import type { Check, NodeProtection } from '../solver/protection/protectionResults.ts';
import { fmt } from './format.ts';
import { LOAD_KIND_LABELS } from './labels.ts';

export type Cell = { sort: number | string | null; text: string };

export interface Column {
  id: string;
  label: string;
  /** Shown in the header's tooltip: what the column is, with its unit and basis. */
  title: string;
  numeric: boolean;
}

export interface Row {
  id: Id;
  status: Status | null;
  cells: Record<string, Cell>;
}

export interface Schedule {
  columns: Column[];
  rows: Row[];
}

const num = (v: number | null | undefined, digits?: number): Cell =>
  v === null || v === undefined || !Number.isFinite(v)
    ? { sort: null, text: '–' }
    : { sort: v, text: fmt(v, digits) };
const txt = (v: string): Cell => ({ sort: v, text: v });
const col = (id: string, label: string, title: string, numeric = true): Column => ({
  id,
  label,
  title,
  numeric,
});

function nameOf(nodes: Map<Id, NodeElement>, id: Id | undefined): string {
  if (!id) return '–';
  return nodes.get(id)?.name || id;
}

/** The titles of the failed checks, or "none"; sorts by how many failed. */
function failedChecks(checks: Check[] | undefined): Cell {
  if (!checks) return { sort: null, text: '–' };
  const failed = checks.filter((c) => c.pass === false);
  return { sort: failed.length, text: failed.length ? failed.map((c) => c.title).join('; ') : 'none' };
}

function nodeProtectionCells(p: NodeProtection | undefined): Record<string, Cell> {
  return {
    zs: num(p?.zsOhm, 3),
    zsMax: num(p?.zsMaxOhm, 3),
    pfc: num(p ? p.fault.maxA / 1000 : undefined, 2),
    fails: failedChecks(p?.checks),
  };
}

// The IEC 60364-5-52 reference method letters, as a reviewer reads them in a schedule.
const METHOD_SHORT: Record<string, string> = {
  clippedDirect: 'C',
  conduitOnWall: 'B',
  conduitInInsulatedWall: 'A',
  trayOrFreeAir: 'E/F',
  buriedDirect: 'D2',
  buriedDuct: 'D1',
  inInsulation: 'in insulation',
  aboveInsulation: 'on joist',
};

const DEVICE_SHORT: Record<string, string> = { mcb: 'MCB', rcbo: 'RCBO', fuseGG: 'gG fuse', mccb: 'MCCB' };

function deviceShort(d: Device | undefined): string {
  if (!d) return '–';
  const curve = d.curve && (d.type === 'mcb' || d.type === 'rcbo') ? ` ${d.curve}` : '';
  return `${DEVICE_SHORT[d.type] ?? d.type}${curve} ${d.ratingA} A${d.rcd ? ` + RCD ${d.rcd.idnMa} mA` : ''}`;
}

export function cableSchedule(doc: ProjectDocument, results: Results): Schedule {
  const nodes = new Map(doc.nodes.map((n) => [n.id, n]));
  const columns = [
    col('name', 'Cable', 'Cable name', false),
    col('from', 'From', 'Sending end (towards the supply)', false),
    col('to', 'To', 'Receiving end', false),
    col('length', 'Length m', 'Route length, one way, metres'),
    col(
      'lengthFrom',
      'Length from',
      'Where the length comes from: measured on the site plan (along x, then y) plus the allowance shown, or typed',
      false,
    ),
    col('size', 'Size mm²', 'Line conductor / cpc cross-section, mm² (arm.: the armour is the cpc)'),
    col('phases', 'Ph', 'Phases carried'),
    col('device', 'Device', 'Protective device at the sending end', false),
    col('ib', 'Ib A', 'Design current Ib, worst phase, amperes'),
    col('dropV', 'Drop V', 'Drop in this segment, volts'),
    col('dropPct', 'Drop %', 'Drop in this segment, % of the voltage in the next column'),
    col(
      'dropBasis',
      'of',
      'What the segment drop is a share of: U0 (single-phase, or per phase) or ULL (balanced three-phase)',
      false,
    ),
    col('cumPct', 'Cum. %', 'Cumulative drop from the origin at the far end, % of U0'),
    col('maxLen', 'Max m', 'Longest run within the drop budget left on its worst path, metres'),
    col('in', 'In A', 'Rating of the device protecting the segment, amperes'),
    col('iz', 'Iz A', 'Current-carrying capacity after correction factors, amperes'),
    col('use', 'Ib/Iz %', 'Capacity use: design current as a share of Iz, %'),
    col(
      'r1r2',
      'R1+R2 Ω',
      'Line plus protective conductor resistance of the segment at operating temperature, ohms',
    ),
    col('method', 'Method', 'Reference installation method', false),
    col('ipfSend', 'Ipf send kA', 'Prospective fault current at the sending end, kA'),
    col('zsEnd', 'Zs end Ω', 'Earth fault loop impedance at the receiving end, conductors hot, ohms'),
    col('tReq', 't req s', 'Disconnection time required for the circuit, seconds'),
    col('fails', 'Failed', 'Protection checks this segment fails', false),
  ];
  const rows = doc.cables.map((c): Row => {
    const r = results.cables[c.id];
    const p = r?.protection;
    const d = c.device;
    return {
      id: c.id,
      status: r?.status ?? null,
      cells: {
        name: txt(c.name || c.id),
        from: txt(nameOf(nodes, c.from)),
        to: txt(nameOf(nodes, c.to)),
        length: num(c.lengthM, 1),
        lengthFrom: txt(c.route ? `plan + ${c.route.allowanceM} m` : 'typed'),
        size: {
          sort: c.sizeMm2,
          // An SWA cable's "cpc" is its armour, whose cross-section is much larger than the cores':
          // say so, or "4 / 35" reads as a 35 mm² protective conductor.
          text: `${c.parallel > 1 ? `${c.parallel}× ` : ''}${c.sizeMm2} / ${c.cpc.sizeMm2}${c.cpc.kind === 'armour' ? ' arm.' : ''}`,
        },
        phases: num(c.phases, 0),
        device: txt(
          d ? `${DEVICE_SHORT[d.type] ?? d.type}${d.curve ? ` ${d.curve}` : ''} ${d.ratingA} A` : '–',
        ),
        ib: num(r?.ibA),
        dropV: num(r?.dropV),
        dropPct: num(r?.dropPct.value, 2),
        dropBasis: txt(r ? r.dropPct.basis : '–'),
        cumPct: num(r?.cumulativePct.value, 2),
        maxLen: num(r?.maxLengthM, 0),
        in: num(p?.device?.ratingA, 0),
        iz: num(p?.izA),
        use: num(p?.capacityUse === null || p?.capacityUse === undefined ? null : p.capacityUse * 100, 0),
        r1r2: num(p?.r1r2HotOhm, 3),
        method: txt(c.installation ? (METHOD_SHORT[c.installation.method] ?? c.installation.method) : '–'),
        ipfSend: num(
          results.nodes[c.from]?.protection
            ? results.nodes[c.from]!.protection!.fault.maxA / 1000
            : undefined,
          2,
        ),
        zsEnd: num(results.nodes[c.to]?.protection?.zsOhm, 3),
        tReq: num(p?.requiredTimeS, 1),
        fails: failedChecks(p?.checks),
      },
    };
  });
  return { columns, rows };
}

export function loadSchedule(doc: ProjectDocument, results: Results): Schedule {
  const nodes = new Map(doc.nodes.map((n) => [n.id, n]));
  const cables = new Map(doc.cables.map((c) => [c.id, c]));
  const columns = [
    col('name', 'Load', 'Load name', false),
    col('kind', 'Kind', 'Kind of load', false),
    col('fedFrom', 'Fed from', 'Node at the sending end of the final cable', false),
    col('demand', 'Demand', 'Connected demand as entered', false),
    col('phase', 'Phase', 'Phase connection', false),
    col('ib', 'Ib A', 'Design current of the cable feeding it, amperes'),
    col('cumPct', 'Cum. %', 'Cumulative drop from the origin, % of U0'),
    col('limit', 'Limit %', 'Drop limit for this load, % of U0'),
    col('budget', 'Budget %', 'Share of the drop budget used, %'),
    col('zs', 'Zs Ω', 'Earth fault loop impedance at the load, conductors hot, ohms'),
    col('zsMax', 'Zs max Ω', 'Largest Zs for the protective device, ohms'),
    col('pfc', 'Ipf kA', 'Largest prospective fault current at the load, kA'),
    col('fails', 'Failed', 'Protection checks failed at the load', false),
  ];
  const rows = doc.nodes
    .filter((n) => n.kind === 'load')
    .map((l): Row => {
      const r = results.loads[l.id];
      const last = r?.path[r.path.length - 1];
      const feeder = last ? cables.get(last) : undefined;
      return {
        id: l.id,
        status: r?.status ?? null,
        cells: {
          name: txt(l.name || l.id),
          kind: txt(LOAD_KIND_LABELS[l.loadKind] ?? l.loadKind),
          fedFrom: txt(nameOf(nodes, feeder?.from)),
          demand: { sort: l.demand.value, text: `${fmt(l.demand.value)} ${l.demand.unit}` },
          phase: txt(l.phases === 3 ? '3-phase' : l.phase),
          ib: num(last ? results.cables[last]?.ibA : undefined),
          cumPct: num(r?.cumulativePct.value, 2),
          limit: num(r?.limitPct.value, 2),
          budget: num(r ? r.budgetUsed * 100 : undefined, 0),
          ...nodeProtectionCells(r?.protection),
        },
      };
    });
  return { columns, rows };
}

export function boardSchedule(doc: ProjectDocument, results: Results): Schedule {
  const nodes = new Map(doc.nodes.map((n) => [n.id, n]));
  const cables = new Map(doc.cables.map((c) => [c.id, c]));
  const columns = [
    col('name', 'Board', 'Board or supply name', false),
    col('fedFrom', 'Fed from', 'Upstream node', false),
    col('cable', 'Incoming cable', 'Cable feeding the board', false),
    col('incomer', 'Incoming device', 'Device at the sending end of the incoming cable', false),
    col('ways', 'Ways', 'Outgoing cables'),
    col('l1', 'L1 A', 'Demand current on L1, amperes'),
    col('l2', 'L2 A', 'Demand current on L2, amperes'),
    col('l3', 'L3 A', 'Demand current on L3, amperes'),
    col('n', 'N A', 'Neutral current, amperes'),
    col('cumPct', 'Cum. %', 'Cumulative drop from the origin, % of U0'),
    col(
      'imbalance',
      'Imbal. %',
      'Phase imbalance: largest phase current above the average, % of the average',
    ),
    col('zs', 'Zdb Ω', 'Earth fault loop impedance at the board, conductors hot, ohms'),
    col('zsMax', 'Zs max Ω', 'Largest Zs for the device feeding the board, ohms'),
    col('pfc', 'Ipf kA', 'Largest prospective fault current at the board, kA'),
    col('fails', 'Failed', 'Protection checks failed at the board', false),
  ];
  const balance = results.protection?.balance ?? {};
  const rows = doc.nodes
    .filter((n) => n.kind === 'board' || n.kind === 'supply')
    .map((b): Row => {
      const r = results.nodes[b.id];
      const last = r?.path[r.path.length - 1];
      const feeder = last ? cables.get(last) : undefined;
      return {
        id: b.id,
        status: r?.status ?? null,
        cells: {
          name: txt(b.name || b.id),
          fedFrom: txt(b.kind === 'supply' ? 'origin' : nameOf(nodes, feeder?.from)),
          cable: txt(feeder ? feeder.name || feeder.id : '–'),
          incomer: txt(deviceShort(feeder?.device)),
          ways: num(doc.cables.filter((c) => c.from === b.id).length, 0),
          l1: num(r?.currentsA.L1),
          l2: num(r?.currentsA.L2),
          l3: num(r?.currentsA.L3),
          n: num(r?.currentsA.N),
          cumPct: num(r?.cumulativePct.value, 2),
          imbalance: num(balance[b.id]?.imbalancePct, 0),
          ...nodeProtectionCells(r?.protection),
        },
      };
    });
  return { columns, rows };
}

export type ScheduleSheet = 'cables' | 'loads' | 'boards';

/**
 * The three schedules by name, as the editor's drawer and `dropline check --schedule` offer them:
 * title, builder, and what the status column means on that sheet.
 */
export const SCHEDULE_SHEETS: Readonly<
  Record<
    ScheduleSheet,
    { title: string; build: (doc: ProjectDocument, results: Results) => Schedule; statusLabel: string }
  >
> = {
  cables: { title: 'Cable schedule', build: cableSchedule, statusLabel: 'Status (worst load fed)' },
  loads: { title: 'Loads', build: loadSchedule, statusLabel: 'Status' },
  boards: { title: 'Board schedule', build: boardSchedule, statusLabel: 'Status (worst load fed)' },
};
