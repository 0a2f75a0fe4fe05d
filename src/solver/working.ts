/**
 * Working records, built on demand from the solver state: formula, inputs with units and their
 * source, result. Nothing here runs during a solve, so a 100,000-element network pays only for
 * the records someone opens.
 */
import { STATUS_SHOWN, type Working, type WorkingInput } from './results.ts';
import type { DropState } from './dropState.ts';
import { KIND_BOARD, KIND_LOAD, cableRow, dropCurrentScale } from './dropState.ts';
import { PHASE_NAMES, dropMethod, pathTo, phasesOf, worstCablePhase, worstNodeCum } from './dropMethod.ts';
import { cableIbA, deviceRatingA } from './flow.ts';
import { judged, loadPhaseMask } from './judge.ts';
import { longRunAllowancePct } from '../catalogue/limits.ts';
import { hypot } from './hypot.ts';

const r4 = (x: number) => Number(x.toPrecision(4));

function phasorText(re: number, im: number): string {
  const mag = hypot(re, im);
  const deg = (Math.atan2(im, re) * 180) / Math.PI;
  return `${r4(mag)} A ∠ ${deg.toFixed(1)}°`;
}

function catalogueSource(s: DropState, j: number): string {
  const row = cableRow(s, j);
  return row ? `data set "${s.catalogue.title}" (${s.catalogue.id}): ${row.source}` : 'no catalogue row';
}

function field(kind: string, id: string, name: string): string {
  return `document: ${kind} ${id} ${name}`;
}

/** Every record for one cable. */
export function cableWorking(s: DropState, j: number): Working[] {
  const id = s.cableIds.at(j);
  const c = s.cables[j] as unknown as Record<string, unknown>;
  const v = s.cableTo[j] as number;
  if (v < 0 || !s.reached[v]) {
    return [
      {
        key: 'unsolved',
        title: 'Not solved',
        formula: 'This cable is not part of the tree fed from the supply (see the findings).',
        inputs: [],
        result: { value: 'not solved', unit: '' },
      },
    ];
  }
  const out: Working[] = [];
  const mask = s.cablePhases[j] as number;
  const toId = s.nodeIds.at(v);
  const currentInputs: WorkingInput[] = [];
  for (let p = 0; p < 3; p++) {
    if (!(mask & (1 << p))) continue;
    currentInputs.push({
      name: `I ${PHASE_NAMES[p]}`,
      value: phasorText(s.iRe[v * 3 + p] as number, s.iIm[v * 3 + p] as number),
      unit: 'A',
      source: `result: demand flowing into ${toId}`,
    });
  }
  if (s.nodeKind[v] === KIND_BOARD) {
    const board = s.nodes[v] as unknown as { diversity?: unknown; spareCapacityPct?: unknown };
    const spare = typeof board.spareCapacityPct === 'number' ? board.spareCapacityPct : 0;
    currentInputs.push({
      name: 'diversity',
      value: spare > 0 ? (s.diversity[v] as number) / (1 + spare / 100) : (s.diversity[v] as number),
      unit: '',
      source: field('board', toId, 'diversity'),
    });
    if (spare > 0)
      currentInputs.push({
        name: 'spare',
        value: spare,
        unit: '%',
        source: `${field('board', toId, 'spareCapacityPct')}: allowance for loads to come, × (1 + spare / 100)`,
      });
  }
  const ib = cableIbA(s, j);
  out.push({
    key: 'ib',
    title: 'Design current Ib',
    formula:
      'I_p = Σ demand phasors of the loads below on phase p (each × its demand factor, × board diversity, × (1 + spare capacity allowance) of each board passed); Ib = max over phases |I_p|',
    inputs: currentInputs,
    result: { value: ib, unit: 'A' },
  });
  const row = cableRow(s, j);
  const parallel = typeof c.parallel === 'number' ? c.parallel : NaN;
  if (row) {
    const scaleX = row.frequencyHz ? s.frequencyHz / row.frequencyHz : 1;
    out.push({
      key: 'impedance',
      title: 'Impedance per metre, one conductor',
      formula: `r = r_row / n; x = x_row × f / f_row / n (n cables in parallel); mV/A/m single-phase = 2 × (r, x), three-phase = √3 × (r, x)`,
      inputs: [
        { name: 'r_row', value: row.rOhmPerM, unit: `Ω/m at ${row.tempC} °C`, source: catalogueSource(s, j) },
        { name: 'x_row', value: row.xOhmPerM, unit: 'Ω/m', source: catalogueSource(s, j) },
        { name: 'f', value: s.frequencyHz, unit: 'Hz', source: 'document: settings frequencyHz' },
        { name: 'f_row', value: row.frequencyHz ?? s.frequencyHz, unit: 'Hz', source: catalogueSource(s, j) },
        { name: 'n', value: parallel, unit: '', source: field('cable', id, 'parallel') },
      ],
      result: {
        value: `${r4((row.rOhmPerM / parallel) * 1000)} + j${r4(((row.xOhmPerM * scaleX) / parallel) * 1000)}`,
        unit: 'mΩ/m',
      },
    });
  }
  if (s.cableBad[j]) {
    out.push({
      key: 'drop',
      title: 'Segment drop',
      formula: 'Not computed: this segment has an error (see the findings); loads below it are not judged.',
      inputs: [],
      result: { value: 'not computed', unit: '' },
    });
    return out;
  }
  out.push(dropRecord(s, j, ib));
  const worst = worstNodeCum(s, v, mask);
  out.push({
    key: 'cumulative',
    title: 'Cumulative drop at the far end',
    formula:
      'cumulative_p = Σ over the path of the segment drops on phase p; % = cumulative / U0 × 100; worst phase shown',
    inputs: pathTo(s, v).map((k) => ({
      name: `drop ${s.cableIds.at(k)} ${PHASE_NAMES[worst.phase] ?? ''}`,
      value: s.dropProj[k * 3 + Math.max(0, worst.phase)] as number,
      unit: 'V',
      source: `result: cable ${s.cableIds.at(k)} drop`,
    })),
    result: { value: (worst.volts / s.u0V) * 100, unit: `% of U0 = ${s.u0V} V` },
  });
  const maxLen = s.maxLengthM[j] as number;
  const d = worstCablePhase(s, j);
  out.push({
    key: 'headroom',
    title: 'Longest length with the budget left',
    formula:
      'drop is proportional to length, so L_max = L × min over loads below and phases of (limit − cumulative + d) / d, where d is this segment’s drop (% of U0) on that phase',
    inputs: [
      { name: 'L', value: s.cableLengthM[j] as number, unit: 'm', source: field('cable', id, 'lengthM') },
      {
        name: 'd (worst phase)',
        value: d >= 0 ? ((s.dropProj[j * 3 + d] as number) / s.u0V) * 100 : 0,
        unit: '% of U0',
        source: 'result: drop of this segment',
      },
    ],
    result: Number.isNaN(maxLen)
      ? { value: 'no judged load below draws current', unit: '' }
      : { value: maxLen, unit: 'm' },
    note: 'Assumes the same current and cable type; the long-run allowance is taken at the present path lengths.',
  });
  return out;
}

/** Where a cable's length came from: typed, or measured on the site plan (with how). */
function lengthSource(s: DropState, j: number, id: string): string {
  const route = (s.cables[j] as unknown as { route?: { allowanceM?: unknown; via?: unknown } }).route;
  if (route && typeof route === 'object' && typeof route.allowanceM === 'number') {
    const bends = Array.isArray(route.via) ? route.via.length : 0;
    const through = bends > 0 ? ` through its ${bends} ${bends === 1 ? 'bend' : 'bends'}` : '';
    return `${field('cable', id, 'lengthM')}, measured on the site plan: rectilinear distance between its ends${through} + ${route.allowanceM} m allowance, rounded up to 0.1 m`;
  }
  return field('cable', id, 'lengthM');
}

function dropRecord(s: DropState, j: number, ib: number): Working {
  const id = s.cableIds.at(j);
  const method = dropMethod(s, j);
  const mask = s.cablePhases[j] as number;
  const v = s.cableTo[j] as number;
  const row = cableRow(s, j);
  const parallel = (s.cables[j] as unknown as { parallel: number }).parallel;
  const scaleX = row?.frequencyHz ? s.frequencyHz / row.frequencyHz : 1;
  const inputs: WorkingInput[] = [
    {
      name: 'L',
      value: s.cableLengthM[j] as number,
      unit: 'm (one way)',
      source: lengthSource(s, j, id),
    },
    { name: 'r', value: (row?.rOhmPerM ?? NaN) / parallel, unit: 'Ω/m', source: catalogueSource(s, j) },
    {
      name: 'x',
      value: ((row?.xOhmPerM ?? NaN) * scaleX) / parallel,
      unit: 'Ω/m',
      source: catalogueSource(s, j),
    },
  ];
  // A load spread along the cable: the far-end drop is over half the length.
  const spread = s.loadSpread[v] === 1;
  const k = spread ? ' × k' : '';
  if (spread)
    inputs.push({
      name: 'k',
      value: 0.5,
      unit: '',
      source: `${field('load', s.nodeIds.at(v), 'distributed')}: the load is spread evenly along the cable, so the drop at its far end is that of the whole current over half the length (uniformly distributed load; common practice)`,
    });
  const rating = deviceRatingA(s, j);
  if (rating > 0)
    inputs.push({
      name: 'In',
      value: rating,
      unit: 'A',
      source: `${field('cable', id, 'device.ratingA')} (settings designCurrentBasis = In: the currents are scaled so the worst phase carries In)`,
    });
  const kept = dropCurrentScale(s, j);
  const scale = kept === 0 ? 1 : kept;
  const p = worstCablePhase(s, j);
  const proj = p >= 0 ? (s.dropProj[j * 3 + p] as number) : 0;
  if (method === 'singlePhaseLoop') {
    const re = (s.iRe[v * 3 + p] as number) * scale;
    const im = (s.iIm[v * 3 + p] as number) * scale;
    const cosPhi = ib > 0 ? (re * Math.cos(phaseAngle(p)) + im * Math.sin(phaseAngle(p))) / hypot(re, im) : 1;
    inputs.push(
      {
        name: 'I',
        value: r4(rating > 0 ? Math.max(rating, ib * scale) : ib),
        unit: 'A',
        source: 'result: Ib of this cable',
      },
      {
        name: 'cos φ',
        value: r4(cosPhi),
        unit: '',
        source: 'angle between the current and its phase voltage',
      },
    );
    return {
      key: 'drop',
      title: `Segment drop, single-phase loop on ${PHASE_NAMES[p]}`,
      formula: `Vd = 2 × I × L${k} × (r cos φ + x sin φ); % = Vd / U0 × 100 (line and neutral: 2 conductors)`,
      inputs,
      result: { value: proj, unit: `V = ${r4((proj / s.u0V) * 100)} % of U0` },
    };
  }
  if (method === 'balancedThreePhase') {
    const vll = Math.sqrt(3) * proj;
    return {
      key: 'drop',
      title: 'Segment drop, balanced three-phase (√3 method, line to line)',
      formula: `Vd(L-L) = √3 × I × L${k} × (r cos φ + x sin φ); % = Vd / ULL × 100 (equal to the per-phase drop as % of U0)`,
      inputs: [
        ...inputs,
        { name: 'I', value: r4(ib * scale), unit: 'A', source: 'result: Ib of this cable' },
        { name: 'ULL', value: s.uLlV, unit: 'V', source: s.voltageSource.uLl },
      ],
      result: { value: vll, unit: `V line to line = ${r4((vll / s.uLlV) * 100)} % of ULL` },
      note: 'Neutral current is zero, so each phase drops Z × I and the cumulative adds the per-phase drop as % of U0.',
    };
  }
  const per: WorkingInput[] = [];
  for (let q = 0; q < 3; q++) {
    if (!(mask & (1 << q))) continue;
    per.push({
      name: `I ${PHASE_NAMES[q]}`,
      value: phasorText((s.iRe[v * 3 + q] as number) * scale, (s.iIm[v * 3 + q] as number) * scale),
      unit: 'A',
      source: 'result: demand on this cable',
    });
    per.push({
      name: `Vd ${PHASE_NAMES[q]}`,
      value: s.dropProj[j * 3 + q] as number,
      unit: 'V',
      source: 'computed per phase',
    });
  }
  per.push({
    name: 'I N',
    value: phasorText(s.nRe[j] as number, s.nIm[j] as number),
    unit: 'A',
    source: 'phasor sum of the phase currents',
  });
  return {
    key: 'drop',
    title: 'Segment drop, unbalanced three-phase, per phase with the neutral current',
    formula: `ΔV_p = (r + jx) × L${k} × (I_p + I_N), I_N = I_L1 + I_L2 + I_L3; Vd_p = ΔV_p projected on the phase voltage direction (the r cos φ + x sin φ form); % of U0`,
    inputs: [...inputs, ...per],
    result: { value: proj, unit: `V on ${PHASE_NAMES[p]} (worst) = ${r4((proj / s.u0V) * 100)} % of U0` },
    note: 'The neutral is taken as the same size and material as the phase conductors.',
  };
}

function phaseAngle(p: number): number {
  return p === 1 ? (-2 * Math.PI) / 3 : p === 2 ? (2 * Math.PI) / 3 : 0;
}

/** Every record for one node (loads get their own extra records). */
export function nodeWorking(s: DropState, v: number): Working[] {
  const id = s.nodeIds.at(v);
  if (!s.reached[v]) {
    return [
      {
        key: 'unsolved',
        title: 'Not solved',
        formula: 'This node is not fed from the supply (see the findings).',
        inputs: [],
        result: { value: 'not solved', unit: '' },
      },
    ];
  }
  const out: Working[] = [];
  if (s.nodeKind[v] === KIND_LOAD) out.push(loadCurrentRecord(s, v));
  const mask = s.nodeKind[v] === KIND_LOAD ? loadPhaseMask(s, v) : (s.nodePhases[v] as number);
  const path = pathTo(s, v);
  const worst = worstNodeCum(s, v, mask);
  const voltages = phasesOf(mask).map((ph) => {
    const p = PHASE_NAMES.indexOf(ph);
    return {
      name: `U ${ph}`,
      value: s.u0V - (s.cum[v * 3 + p] as number),
      unit: 'V',
      source: `U0 − cumulative drop on ${ph}`,
    };
  });
  out.push({
    key: 'cumulative',
    title: `Cumulative drop from the origin at ${id}`,
    formula:
      'cumulative_p = Σ segment drops on phase p along the path; % = cumulative / U0 × 100; worst phase; U_p = U0 − cumulative_p',
    inputs: [
      { name: 'U0', value: s.u0V, unit: 'V', source: s.voltageSource.u0 },
      ...path.map((k) => ({
        name: `drop ${s.cableIds.at(k)} ${PHASE_NAMES[worst.phase] ?? ''}`,
        value: s.dropProj[k * 3 + Math.max(0, worst.phase)] as number,
        unit: 'V',
        source: `result: cable ${s.cableIds.at(k)} drop`,
      })),
      ...voltages,
    ],
    result: { value: v === s.root ? 0 : (worst.volts / s.u0V) * 100, unit: '% of U0' },
    ...(s.incomplete[v]
      ? { note: 'A segment upstream has an error; its drop is left out of this figure.' }
      : {}),
  });
  if (s.nodeKind[v] === KIND_LOAD) out.push(...loadRecords(s, v, path));
  return out;
}

function loadCurrentRecord(s: DropState, v: number): Working {
  const id = s.nodeIds.at(v);
  const el = s.nodes[v] as unknown as Record<string, unknown>;
  const demand = (el.demand ?? {}) as { value?: unknown; unit?: unknown };
  const three = el.phases === 3;
  const formula =
    {
      A: 'I = value × demand factor',
      kVA: three ? 'I = S / (√3 × ULL) × demand factor' : 'I = S / U0 × demand factor',
      kW: three ? 'I = P / (√3 × ULL × cos φ) × demand factor' : 'I = P / (U0 × cos φ) × demand factor',
      W: three ? 'I = P / (√3 × ULL × cos φ) × demand factor' : 'I = P / (U0 × cos φ) × demand factor',
    }[String(demand.unit)] ?? 'demand not valid';
  return {
    key: 'ib',
    title: 'Load current',
    formula: `${formula}; angle = phase angle − acos(cos φ) (lagging)`,
    inputs: [
      {
        name: 'demand',
        value: String(demand.value),
        unit: String(demand.unit),
        source: field('load', id, 'demand'),
      },
      { name: 'cos φ', value: String(el.powerFactor), unit: '', source: field('load', id, 'powerFactor') },
      {
        name: 'demand factor',
        value: String(el.demandFactor),
        unit: '',
        source: field('load', id, 'demandFactor'),
      },
      three
        ? { name: 'ULL', value: s.uLlV, unit: 'V', source: s.voltageSource.uLl }
        : { name: 'U0', value: s.u0V, unit: 'V', source: s.voltageSource.u0 },
    ],
    result: s.loadValid[v]
      ? { value: s.loadCurrentA[v] as number, unit: 'A per phase' }
      : { value: 'not valid', unit: '' },
  };
}

function loadRecords(s: DropState, v: number, path: number[]): Working[] {
  const verdict = judged(s, v);
  const id = s.nodeIds.at(v);
  const el = s.nodes[v] as unknown as Record<string, unknown>;
  const profile = s.profile;
  const category = el.category === 'other' ? 'other' : 'lighting';
  const allowance =
    profile.allowsLongRunAllowance && s.longRunAllowance
      ? longRunAllowancePct(s.pathLengthM[v] as number)
      : 0;
  const out: Working[] = [
    {
      key: 'limit',
      title: 'Drop limit',
      formula: profile.allowsLongRunAllowance
        ? 'limit = profile value for the category + min(0.5, 0.005 × (path length − 100 m)) % where the long-run allowance is on'
        : 'limit = profile value for the category',
      inputs: [
        { name: 'category', value: category, unit: '', source: field('load', id, 'category') },
        {
          name: `${category} limit`,
          value: profile.totalPct[category],
          unit: '% of nominal',
          source: `profile: ${profile.title} (${profile.source})`,
        },
        {
          name: 'path length',
          value: s.pathLengthM[v] as number,
          unit: 'm',
          source: 'sum of cable lengthM on the path',
        },
        { name: 'allowance', value: allowance, unit: '%', source: 'document: settings longRunAllowance' },
        ...(profile.branchPct !== undefined
          ? [
              {
                name: 'branch limit',
                value: profile.branchPct,
                unit: '%',
                source: `profile: ${profile.title}`,
              },
              {
                name: 'branch drop',
                value: verdict.branchWorst,
                unit: '% of U0',
                source: 'drop from the last board upstream',
              },
            ]
          : []),
      ],
      result: { value: verdict.limit, unit: '% of U0' },
      note: profile.note,
    },
  ];
  const total = verdict.worstPct;
  const p = Math.max(0, s.worstPhase[v] as number);
  out.push({
    key: 'shares',
    title: 'Share of the drop by segment',
    formula: 'share = segment drop on the load’s worst phase / cumulative drop at the load',
    inputs: path.map((k) => ({
      name: `${s.cableIds.at(k)}`,
      value: (((s.dropProj[k * 3 + p] as number) / s.u0V) * 100) / (total || 1),
      unit: 'share',
      source: `result: cable ${s.cableIds.at(k)} drop ${r4(((s.dropProj[k * 3 + p] as number) / s.u0V) * 100)} % of U0`,
    })),
    result: { value: total, unit: '% of U0 total' },
  });
  const status = s.status[v] as number;
  out.push({
    key: 'status',
    title: 'Status',
    formula: `${STATUS_SHOWN.over} when budget used > 1; ${STATUS_SHOWN.close} when ≥ ${s.closeThreshold}; else ${STATUS_SHOWN.within} (budget used = cumulative / limit${profile.branchPct !== undefined ? ', or branch drop / branch limit if larger' : ''})`,
    inputs: [
      { name: 'budget used', value: verdict.used, unit: '', source: 'cumulative / limit' },
      {
        name: 'close threshold',
        value: s.closeThreshold,
        unit: '',
        source: 'document: settings closeThreshold',
      },
    ],
    result: {
      value: status < 0 ? 'not judged' : STATUS_SHOWN[(['within', 'close', 'over'] as const)[status]!],
      unit: '',
    },
  });
  return out;
}
