/**
 * The schedules' rows and columns, built from the document and the solver's results. Cells carry a
 * raw value (for sorting) and its display text. No figure is computed here beyond picking the
 * solver's own values and the document's inputs.
 */
import type { Cable, Device, Id, NodeElement, ProjectDocument } from '../model/types.ts';
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
  /** Left empty, to be filled in on site (printed in the pack and the CSV, not shown in the editor). */
  onSite?: boolean;
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

function deviceShort(d: Device | undefined, withRcd = true): string {
  if (!d) return '–';
  const curve = d.curve && (d.type === 'mcb' || d.type === 'rcbo') ? ` ${d.curve}` : '';
  return `${DEVICE_SHORT[d.type] ?? d.type}${curve} ${d.ratingA} A${withRcd && d.rcd ? ` + RCD ${d.rcd.idnMa} mA` : ''}`;
}

/**
 * Line conductor / cpc, mm², with the parallel count. An SWA cable's "cpc" is its armour, whose
 * cross-section is much larger than the cores': say so, or "4 / 35" reads as a 35 mm² cpc.
 */
function sizeText(c: Cable): string {
  return `${c.parallel > 1 ? `${c.parallel}× ` : ''}${c.sizeMm2} / ${c.cpc.sizeMm2}${c.cpc.kind === 'armour' ? ' arm.' : ''}`;
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
    col(
      'run',
      'Run',
      'The shared containment run the cable is grouped in, and the circuits it holds (they set the grouping factor)',
      false,
    ),
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
          text: sizeText(c),
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
        run: txt(
          c.installation?.run !== undefined
            ? `${c.installation.run} (${c.installation.groupedCircuits})`
            : '–',
        ),
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
          kind: txt(
            `${LOAD_KIND_LABELS[l.loadKind] ?? l.loadKind}${l.distributed ? ', spread along its cable' : ''}`,
          ),
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
    col(
      'spare',
      'Spare %',
      'Allowance for loads to come, % of the board’s demand after diversity (the cables feeding it carry it)',
    ),
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
          spare: num(b.kind === 'board' ? (b.spareCapacityPct ?? 0) : null, 0),
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

/** The cables of the circuit that ends at `id`: back along its path while the sending end is a junction. */
function circuitCables(doc: ProjectDocument, nodes: Map<Id, NodeElement>, path: readonly Id[]): Id[] {
  const cables = new Map(doc.cables.map((c) => [c.id, c]));
  const out: Id[] = [];
  for (let k = path.length - 1; k >= 0; k--) {
    const c = cables.get(path[k]!);
    if (!c) break;
    out.unshift(c.id);
    if (nodes.get(c.from)?.kind !== 'junction') break;
  }
  return out;
}

const onSite = (id: string, label: string, title: string): Column => ({
  ...col(id, label, `${title}: to be filled in on site`, false),
  onSite: true,
});

/**
 * What a tester should find at the end of every circuit (each load, and each board at the end of
 * its sub-main), from the design: the circuit's R1 + R2 and the loop impedance with conductors at
 * 20 °C, the largest Zs to accept when measuring cold, the prospective fault current, the device
 * and its RCD; with empty columns for the measured values. Rows are grouped by the board the
 * circuit starts from, boards in document order.
 */
export function testSchedule(doc: ProjectDocument, results: Results): Schedule {
  const nodes = new Map(doc.nodes.map((n) => [n.id, n]));
  const cables = new Map(doc.cables.map((c) => [c.id, c]));
  const columns = [
    col('to', 'Circuit to', 'The load, or the board a sub-main feeds', false),
    col('board', 'From board', 'Where the circuit starts: its device is there', false),
    col('cables', 'Cables', 'The cables of the circuit, from the board (through junctions)', false),
    col('device', 'Device', 'Protective device of the circuit (its RCD in the next columns)', false),
    col(
      'size',
      'Size mm²',
      'Line conductor / cpc cross-section of each cable of the circuit, mm² (arm.: the armour is the cpc)',
      false,
    ),
    col('length', 'Length m', 'Route length of the circuit, one way, metres'),
    col(
      'r1r2',
      'R1+R2 Ω',
      'Expected end-to-end R1 + R2 of the circuit with conductors at 20 °C: the sum over its cables (each in the cable’s working), ohms',
    ),
    col(
      'zsCold',
      'Zs exp. Ω',
      'Expected earth fault loop impedance at the circuit end with conductors at 20 °C: the source loop plus every segment’s R1 + R2 from the origin, ohms',
    ),
    col(
      'zsTest',
      'Zs max test Ω',
      'Largest Zs to accept when testing with conductors cold: 0.8 × the maximum Zs for the device (common practice, allowing for the rise in conductor temperature in service), ohms',
    ),
    col('pfc', 'Ipf kA', 'Expected largest prospective fault current at the circuit end, kA'),
    col('rcd', 'RCD', 'Residual current device of the circuit: rated residual current IΔn and type', false),
    col(
      'rcdLimit',
      'RCD max ms',
      'Longest operating time to accept for a general (not time-delayed) RCD: 300 ms at IΔn; 40 ms at 5 IΔn (IEC 61008-1 and IEC 61009-1, general type; from memory: check against the standard)',
      false,
    ),
    onSite('r1r2Measured', 'R1+R2 meas.', 'Measured R1 + R2, ohms'),
    onSite('zsMeasured', 'Zs meas.', 'Measured earth fault loop impedance, ohms'),
    onSite('irMeasured', 'IR MΩ', 'Measured insulation resistance, megohms'),
    onSite('rcdMeasured', 'RCD ms', 'Measured RCD operating time, milliseconds'),
    onSite('polarity', 'Polarity', 'Polarity confirmed'),
  ];
  const boardOrder = new Map(doc.nodes.map((n, k) => [n.id, k]));
  const rows: { row: Row; board: number; order: number }[] = [];
  doc.nodes.forEach((n, order) => {
    if (n.kind !== 'load' && n.kind !== 'board') return;
    const r = results.nodes[n.id];
    if (!r || r.path.length === 0) return;
    const ids = circuitCables(doc, nodes, r.path);
    const list = ids.map((id) => cables.get(id)!);
    const first = list[0];
    if (!first) return;
    const p = r.protection;
    const device = results.cables[ids[ids.length - 1]!]?.protection?.device ?? first.device;
    let r1r2: number | null = 0;
    for (const id of ids) {
      const v = results.cables[id]?.protection?.r1r2ColdOhm;
      r1r2 = r1r2 !== null && v !== undefined && Number.isFinite(v) ? r1r2 + v : null;
    }
    const failed = [p?.checks, ...ids.map((id) => results.cables[id]?.protection?.checks)].some((cs) =>
      cs?.some((c) => c.pass === false),
    );
    const sizes = [...new Set(list.map((c) => sizeText(c)))];
    rows.push({
      board: boardOrder.get(first.from) ?? -1,
      order,
      row: {
        id: n.id,
        // A board's own status is the worst load it feeds; here only its circuit's checks count.
        status: failed ? 'over' : n.kind === 'board' ? (p ? 'within' : null) : r.status,
        cells: {
          to: txt(n.name || n.id),
          board: txt(nameOf(nodes, first.from)),
          cables: txt(ids.join(' → ')),
          // The RCD has columns of its own on this sheet.
          device: txt(deviceShort(device ?? undefined, false)),
          size: { sort: first.sizeMm2, text: sizes.join(' → ') },
          length: num(
            list.reduce((sum, c) => sum + c.lengthM, 0),
            1,
          ),
          r1r2: num(r1r2, 3),
          zsCold: num(p?.zsColdOhm, 3),
          zsTest: num(p?.testZsMaxOhm, 3),
          pfc: num(p ? p.fault.maxA / 1000 : undefined, 2),
          rcd: txt(device?.rcd ? `${device.rcd.idnMa} mA type ${device.rcd.type}` : '–'),
          rcdLimit: txt(device?.rcd ? '300; 40 at 5 IΔn' : '–'),
          r1r2Measured: txt(''),
          zsMeasured: txt(''),
          irMeasured: txt(''),
          rcdMeasured: txt(''),
          polarity: txt(''),
        },
      },
    });
  });
  rows.sort((a, b) => a.board - b.board || a.order - b.order);
  return { columns, rows: rows.map((x) => x.row) };
}

export type ScheduleSheet = 'cables' | 'loads' | 'boards' | 'tests';

/**
 * The schedules by name, as the editor's drawer and `dropline check --schedule` offer them: title,
 * builder, what the status column means on that sheet, and a note printed with it where it needs one.
 */
export const SCHEDULE_SHEETS: Readonly<
  Record<
    ScheduleSheet,
    {
      title: string;
      build: (doc: ProjectDocument, results: Results) => Schedule;
      statusLabel: string;
      note?: string;
    }
  >
> = {
  cables: { title: 'Cable schedule', build: cableSchedule, statusLabel: 'Status (worst load fed)' },
  loads: { title: 'Loads', build: loadSchedule, statusLabel: 'Status' },
  boards: { title: 'Board schedule', build: boardSchedule, statusLabel: 'Status (worst load fed)' },
  tests: {
    title: 'Expected test values',
    build: testSchedule,
    statusLabel: 'Design status',
    note: 'Expected values from the design, for comparison with the values measured on site. R1 + R2 and Zs are with conductors at 20 °C; a cold measurement above "Zs max test" needs investigating before the circuit is put into service. Design status: over where a protection check of the circuit fails; otherwise a load’s drop status, and clear for a sub-main. These are design figures, not test results: the tests themselves are made and recorded by a competent person under the local wiring rules.',
  },
};
