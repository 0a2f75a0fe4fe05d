/**
 * Older project files are brought up to the current version by named steps, one version at a
 * time. Each step works on the raw parsed JSON (not yet validated), touches only what it knows,
 * and reports what it assumed, so the user can check it.
 *
 * Version history:
 * - 0 (pre-release): cables had `length` (metres) and `size` (mm²), no cpc, no `parallel`;
 *   settings had no `cableDefaults`.
 * - 1: unit-bearing names `lengthM` / `sizeMm2`, an explicit cpc per cable, `parallel`, and the
 *   cable defaults in settings.
 * - 2: `alternatives`, the named designs kept beside the current one.
 */
import type { Cable } from './types.ts';
import { FORMAT_VERSION } from './types.ts';
import { assumedCpc, defaultCableDefaults } from './defaults.ts';

/** A version-0 cable as the pre-release files held it. */
export interface CableV0 {
  id: string;
  name: string;
  from: string;
  to: string;
  /** One-way route length, metres. */
  length: number;
  material: Cable['material'];
  insulation: Cable['insulation'];
  construction: Cable['construction'];
  /** Line conductor cross-section, mm². */
  size: number;
  phases: Cable['phases'];
  device?: Cable['device'];
  installation?: Cable['installation'];
}

export interface MigrationStep {
  from: number;
  to: number;
  name: string;
  description: string;
  /** Rewrites `doc` (a plain JSON object) in place; returns what it had to assume. */
  up(doc: Record<string, unknown>): string[];
}

type Json = Record<string, unknown>;

function isObject(v: unknown): v is Json {
  return v !== null && typeof v === 'object' && !Array.isArray(v);
}

/** Moves `old` to `renamed` when the new name is absent (a file half-edited by hand keeps its new value). */
function rename(obj: Json, old: string, renamed: string): void {
  if (Object.prototype.hasOwnProperty.call(obj, old)) {
    if (!Object.prototype.hasOwnProperty.call(obj, renamed)) obj[renamed] = obj[old];
    delete obj[old];
  }
}

export const MIGRATIONS: readonly MigrationStep[] = [
  {
    from: 0,
    to: 1,
    name: 'unitNamesAndCpc',
    description: 'cable length -> lengthM, size -> sizeMm2; add cpc, parallel and settings.cableDefaults',
    up(doc) {
      const notes: string[] = [];
      const cables = Array.isArray(doc.cables) ? doc.cables : [];
      for (const cable of cables) {
        if (!isObject(cable)) continue;
        rename(cable, 'length', 'lengthM');
        rename(cable, 'size', 'sizeMm2');
        if (!('parallel' in cable)) cable.parallel = 1;
        if (!('cpc' in cable)) {
          const construction = cable.construction as Cable['construction'];
          const size = typeof cable.sizeMm2 === 'number' ? cable.sizeMm2 : NaN;
          const material = cable.material === 'Al' ? 'Al' : 'Cu';
          const cpc = assumedCpc(construction, size, material);
          cable.cpc = cpc;
          const label = typeof cable.id === 'string' ? cable.id : '?';
          notes.push(
            `cable ${label}: the file gave no cpc; assumed a ${cpc.sizeMm2} mm² ${cpc.material} core; check it`,
          );
        }
      }
      if (isObject(doc.settings) && !('cableDefaults' in doc.settings)) {
        doc.settings.cableDefaults = defaultCableDefaults();
      }
      return notes;
    },
  },
  {
    from: 1,
    to: 2,
    name: 'namedAlternatives',
    description: 'add alternatives (none yet)',
    up(doc) {
      if (!('alternatives' in doc)) doc.alternatives = [];
      return [];
    },
  },
];

export type MigrationResult =
  { ok: true; doc: Json; applied: string[]; warnings: string[] } | { ok: false; errors: string[] };

/**
 * Brings a raw file object from its `version` to the current one, step by step.
 *
 * @example
 *   migrate({ format: 'dropline-project', version: 0, ... }); // { ok: true, applied: ['unitNamesAndCpc'], ... }
 */
export function migrate(doc: Json, steps: readonly MigrationStep[] = MIGRATIONS): MigrationResult {
  const version = doc.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 0) {
    return {
      ok: false,
      errors: [
        `project file: version must be a whole number from 0 to ${FORMAT_VERSION}; got ${JSON.stringify(version)}`,
      ],
    };
  }
  if (version > FORMAT_VERSION) {
    return {
      ok: false,
      errors: [
        `project file: made by a newer Dropline (version ${version}); this one reads up to ${FORMAT_VERSION}. Open it in a newer Dropline.`,
      ],
    };
  }
  const applied: string[] = [];
  const warnings: string[] = [];
  let at = version;
  while (at < FORMAT_VERSION) {
    const step = steps.find((s) => s.from === at);
    if (!step) return { ok: false, errors: [`project file: no migration from version ${at}`] };
    warnings.push(...step.up(doc));
    applied.push(step.name);
    at = step.to;
    doc.version = at;
  }
  if (applied.length > 0) {
    warnings.unshift(
      `the file was made for version ${version}; updated to version ${FORMAT_VERSION} (${applied.join(', ')})`,
    );
  }
  return { ok: true, doc, applied, warnings };
}
