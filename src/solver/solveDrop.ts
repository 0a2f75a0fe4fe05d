/**
 * Demand, voltage drop, cumulative drop, status and headroom for a whole distribution.
 *
 * Pure and synchronous; never throws on user data: a malformed document or element becomes a
 * finding and everything still solvable is solved. The passes run over flat typed arrays in
 * breadth-first order (no recursion, so a chain of 100,000 segments is fine); result objects
 * read from them, and working records are built when someone asks for them.
 *
 * @example
 *   const results = solveDrop(doc);
 *   results.loads['L4']?.cumulativePct; // { value: 3.1, basis: 'U0', basisV: 230 }
 *   results.cables['C2']?.working.find((w) => w.key === 'drop')?.formula;
 */
import type { ProjectDocument } from '../model/types.ts';
import { STANDARD_EDITIONS } from '../model/cautions.ts';
import type { CatalogueSet } from '../catalogue/catalogueSet.ts';
import { BUILTIN_CATALOGUE } from '../catalogue/builtinConductors.ts';
import { limitProfile } from '../catalogue/limits.ts';
import type { LimitProfileId } from '../model/types.ts';
import type { CableResult, LoadResult, NodeResult, Results } from './results.ts';
import type { DropState } from './dropState.ts';
import { KIND_INVALID, KIND_LOAD, allocateArrays } from './dropState.ts';
import type { DropFinding } from './findings.ts';
import { shown } from './findings.ts';
import { buildTopology, nodeLabel } from './topology.ts';
import { validateCables, validateNodes } from './validateElements.ts';
import { phaseIgnoredFindings } from './phases.ts';
import { accumulate, sumDemand } from './flow.ts';
import { judgeLoads } from './judge.ts';
import { CableResultView, LoadResultView, NodeResultView } from './resultObjects.ts';
import { lazyRecord } from './lazyRecord.ts';
import { IdIndex } from './idIndex.ts';
import { IdList } from './idList.ts';

type Loose = Record<string, unknown>;

function isObject(v: unknown): v is Loose {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

const PROFILE_IDS: readonly LimitProfileId[] = ['iecPublic', 'iecPrivate', 'nec', 'asnzs', 'custom'];

function readSettings(doc: unknown, findings: DropFinding[]) {
  const settings = isObject(doc) && isObject(doc.settings) ? doc.settings : {};
  const num = (v: unknown, ok: (x: number) => boolean) => (typeof v === 'number' && ok(v) ? v : undefined);
  const profileId = PROFILE_IDS.includes(settings.limitProfile as LimitProfileId)
    ? (settings.limitProfile as LimitProfileId)
    : 'iecPublic';
  if (profileId !== settings.limitProfile)
    findings.push({
      code: 'malformedDocument',
      severity: 'warning',
      message: `settings: limitProfile must be one of ${PROFILE_IDS.join(', ')}, got ${shown(settings.limitProfile)}; iecPublic is used.`,
    });
  const custom = isObject(settings.customLimits) ? settings.customLimits : {};
  const lightingPct = num(custom.lightingPct, (x) => x > 0 && x < 100);
  const otherPct = num(custom.otherPct, (x) => x > 0 && x < 100);
  if (profileId === 'custom' && (lightingPct === undefined || otherPct === undefined))
    findings.push({
      code: 'malformedDocument',
      severity: 'error',
      message:
        'settings: customLimits lightingPct and otherPct must be percentages above 0; 3 % and 5 % are used meanwhile.',
    });
  return {
    settings,
    profile: limitProfile(profileId, { lightingPct: lightingPct ?? 3, otherPct: otherPct ?? 5 }),
    frequencyHz: num(settings.frequencyHz, (x) => x === 50 || x === 60) ?? 50,
    closeThreshold: num(settings.closeThreshold, (x) => x > 0 && x <= 1) ?? 0.8,
    useDeviceRating: settings.designCurrentBasis === 'In',
    longRunAllowance: settings.longRunAllowance === true,
  };
}

function allocate(doc: unknown, catalogue: CatalogueSet, findings: DropFinding[]): DropState {
  const nodes = isObject(doc) && Array.isArray(doc.nodes) ? (doc.nodes as ProjectDocument['nodes']) : [];
  const cables = isObject(doc) && Array.isArray(doc.cables) ? (doc.cables as ProjectDocument['cables']) : [];
  if (!isObject(doc) || !Array.isArray(doc.nodes) || !Array.isArray(doc.cables))
    findings.push({
      code: 'malformedDocument',
      severity: 'error',
      message: 'the document must have a list of nodes and a list of cables; open a Dropline project file.',
    });
  const read = readSettings(doc, findings);
  const n = nodes.length;
  const m = cables.length;
  const nodeIds = new IdList(n);
  const cableIds = new IdList(m);
  return {
    doc: doc as ProjectDocument,
    catalogue,
    profile: read.profile,
    findings,
    u0V: 230,
    uLlV: 400,
    voltageSource: { u0: 'document: settings u0V', uLl: 'document: settings uLlV' },
    frequencyHz: read.frequencyHz,
    closeThreshold: read.closeThreshold,
    useDeviceRating: read.useDeviceRating,
    longRunAllowance: read.longRunAllowance,
    nodes,
    cables,
    nodeCount: n,
    cableCount: m,
    nodeIndex: new IdIndex(nodeIds, n),
    cableIndex: new IdIndex(cableIds, m),
    nodeIds,
    cableIds,
    rows: [undefined],
    vRe: new Float64Array(0),
    vIm: new Float64Array(0),
    orderLength: 0,
    root: -1,
    walkIsDocumentOrder: false,
    rankReady: false,
    ...allocateArrays(n, m, read.useDeviceRating),
  };
}

/** U0 from the supply (falling back to the settings), ULL from the settings (falling back to √3 U0). */
function readVoltages(s: DropState, settings: Loose): void {
  const ok = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v) && v > 0 && v < 100000;
  const supply = s.root >= 0 ? (s.nodes[s.root] as unknown as Loose) : undefined;
  const id = s.root >= 0 ? s.nodeIds.at(s.root) : '';
  if (supply && ok(supply.u0V)) {
    s.u0V = supply.u0V;
    s.voltageSource.u0 = `document: supply ${id} u0V`;
    if (ok(settings.u0V) && Math.abs(settings.u0V - supply.u0V) > 0.5)
      s.findings.push({
        code: 'voltageMismatch',
        severity: 'warning',
        elementId: id,
        message: `supply ${id} gives U0 = ${supply.u0V} V but the project settings say ${settings.u0V} V; the supply's value is used. Make them agree.`,
      });
  } else if (ok(settings.u0V)) {
    s.u0V = settings.u0V;
    if (supply)
      s.findings.push({
        code: 'badVoltage',
        severity: 'error',
        elementId: id,
        message: `supply ${id}: u0V must be a positive number of volts, got ${shown(supply.u0V)}; the settings' ${settings.u0V} V is used.`,
      });
  } else if (supply) {
    s.findings.push({
      code: 'badVoltage',
      severity: 'error',
      elementId: id,
      message: `supply ${id}: u0V must be a positive number of volts, got ${shown(supply.u0V)}; 230 V is used until it is set.`,
    });
    s.voltageSource.u0 = 'fallback 230 V (no valid U0 in the document)';
  }
  if (ok(settings.uLlV)) s.uLlV = settings.uLlV;
  else {
    s.uLlV = Math.sqrt(3) * s.u0V;
    s.voltageSource.uLl = '√3 × U0 (settings uLlV missing or not valid)';
  }
}

function buildResults(s: DropState): Results {
  // A load's entry in `nodes` and in `loads` is the same object.
  // Made on the first read, like the records' own memory.
  let nodeViews: (NodeResult | undefined)[] | undefined;
  const nodeView = (i: number): NodeResult => {
    nodeViews ??= new Array<NodeResult | undefined>(s.nodeCount);
    let r = nodeViews[i];
    if (!r) {
      r = s.nodeKind[i] === KIND_LOAD ? new LoadResultView(s, i) : new NodeResultView(s, i);
      nodeViews[i] = r;
    }
    return r;
  };
  const cables = lazyRecord<CableResult>(
    s.cableIds,
    s.cableIndex,
    () => true,
    (j) => new CableResultView(s, j),
  );
  const nodes = lazyRecord<NodeResult>(
    s.nodeIds,
    s.nodeIndex,
    (i) => s.nodeKind[i] !== KIND_INVALID,
    nodeView,
  );
  const loads = lazyRecord<LoadResult>(
    s.nodeIds,
    s.nodeIndex,
    (i) => s.nodeKind[i] === KIND_LOAD,
    (i) => nodeView(i) as LoadResult,
  );
  const profile = s.profile;
  const references = STANDARD_EDITIONS.filter(
    (e) =>
      e.startsWith('IEC 60228') ||
      e.startsWith('IEC 60364-5-52') ||
      (profile.id === 'nec' && e.startsWith('NFPA 70')) ||
      (profile.id === 'asnzs' && e.startsWith('AS/NZS 3000')),
  );
  if (s.catalogue.id === BUILTIN_CATALOGUE.id)
    references.push(
      'BS 7671:2018 Appendix 4 mV/A/m tables (reactance and large-size a.c. factors fitted to them)',
    );
  return {
    cables,
    nodes,
    loads,
    findings: s.findings,
    dataSet: { id: s.catalogue.id, title: s.catalogue.title, source: s.catalogue.source },
    profile: { id: profile.id, title: profile.title, source: profile.source },
    references,
  };
}

/** The state behind each result set, so passes built on the drop results can read its arrays. */
const STATE_OF = new WeakMap<Results, DropState>();

/**
 * The drop solver's working arrays behind `results` (read only), or undefined for results it did
 * not build. Protection uses them instead of building every result object.
 * @example dropStateOf(solveDrop(doc))?.order
 */
export function dropStateOf(results: Results): DropState | undefined {
  return STATE_OF.get(results);
}

function checkDataSet(s: DropState, settings: Loose, given: boolean): void {
  const wanted = settings.dataSet;
  if (typeof wanted !== 'string' || wanted === s.catalogue.id) return;
  s.findings.push({
    code: 'dataSetMismatch',
    severity: 'warning',
    message: given
      ? `the project names data set "${wanted}" but "${s.catalogue.id}" was supplied; figures come from "${s.catalogue.title}".`
      : `the project names data set "${wanted}", which is not loaded; the built-in data set is used. Load that data set to use it.`,
  });
}

/**
 * Solves demand, segment and cumulative drop, status and headroom.
 * @example solveDrop(doc).loads['L1']?.status // 'within' | 'close' | 'over' | null
 */
export function solveDrop(doc: ProjectDocument, catalogue?: CatalogueSet): Results {
  const findings: DropFinding[] = [];
  const set = catalogue && Array.isArray(catalogue.conductors) ? catalogue : BUILTIN_CATALOGUE;
  let s: DropState | undefined;
  try {
    s = allocate(doc, set, findings);
    const settings = isObject(doc) && isObject(doc.settings) ? doc.settings : {};
    checkDataSet(s, settings, catalogue !== undefined);
    buildTopology(s);
    readVoltages(s, settings);
    validateNodes(s);
    validateCables(s);
    sumDemand(s);
    phaseIgnoredFindings(s);
    accumulate(s);
    judgeLoads(s);
    const results = buildResults(s);
    STATE_OF.set(results, s);
    return results;
  } catch (error) {
    // A defect of ours, not of the user's data: report it rather than take the editor down.
    findings.push({
      code: 'malformedDocument',
      severity: 'error',
      message: `the solver could not finish (${error instanceof Error ? error.message : String(error)}); please report this with the file.`,
    });
    return {
      cables: Object.create(null) as Record<string, CableResult>,
      nodes: Object.create(null) as Record<string, NodeResult>,
      loads: Object.create(null) as Record<string, LoadResult>,
      findings,
      dataSet: { id: set.id, title: set.title, source: set.source },
      profile: {
        id: s?.profile.id ?? 'iecPublic',
        title: s?.profile.title ?? '',
        source: s?.profile.source ?? '',
      },
      references: [],
    };
  }
}

export { nodeLabel };
