/**
 * The protection part of a user's data set: capacity tables and a gG fuse time-current set, read
 * from the `capacityTables` and `ggFuses` keys of a JSON data set (docs/catalogue-data.md). They
 * replace the built-in tables for the solve, and the working names them.
 */
import { z } from 'zod';
import type { CapacityTable } from './capacityTables.ts';
import type { FuseDataSet } from './devices.ts';

const text = z.string().trim().min(1).max(400);
const amps = z.array(z.number().positive().finite().nullable()).max(64);

const column = z.strictObject({
  label: text,
  amps: z.strictObject({ 2: amps.optional(), 3: amps.optional() }),
});

const METHODS = [
  'clippedDirect',
  'conduitOnWall',
  'conduitInInsulatedWall',
  'trayOrFreeAir',
  'buriedDirect',
  'buriedDuct',
  'inInsulation',
  'aboveInsulation',
] as const;

const table = z.strictObject({
  id: text,
  title: text,
  source: text,
  material: z.enum(['Cu', 'Al']),
  insulation: z.enum(['thermoplastic70', 'thermosetting90']),
  constructions: z.array(z.enum(['flatTwinEarth', 'multicore', 'armouredMulticore', 'singleCore'])).min(1),
  referenceC: z.number().finite().min(0).max(60),
  sizesMm2: z.array(z.number().positive().finite()).min(1).max(64),
  methods: z.partialRecord(z.enum(METHODS), column),
});

const fuses = z.strictObject({
  id: text,
  title: text,
  source: text,
  rows: z
    .array(
      z.strictObject({
        ratingA: z.number().positive().finite(),
        ia04sA: z.number().positive().finite(),
        ia5sA: z.number().positive().finite(),
      }),
    )
    .min(1)
    .max(200),
});

export interface ProtectionDataLoad {
  capacityTables?: CapacityTable[];
  ggFuses?: FuseDataSet;
  errors: string[];
}

function messages(prefix: string, error: z.ZodError): string[] {
  return error.issues.map((i) => `${prefix}${i.path.length ? `.${i.path.join('.')}` : ''}: ${i.message}.`);
}

/**
 * Reads the optional protection keys of a parsed JSON data set. Every table's columns must give
 * one capacity per listed size, and a fuse must need more current for 0.4 s than for 5 s.
 * @example readProtectionData({ ggFuses: { id: 'f', title: 'T', source: 'S', rows: [...] } }).errors // []
 */
export function readProtectionData(raw: Record<string, unknown>): ProtectionDataLoad {
  const out: ProtectionDataLoad = { errors: [] };
  if (raw.capacityTables !== undefined) {
    const parsed = z.array(table).min(1).max(100).safeParse(raw.capacityTables);
    if (!parsed.success) out.errors.push(...messages('capacityTables', parsed.error));
    else {
      parsed.data.forEach((t, i) => {
        for (const [method, col] of Object.entries(t.methods)) {
          for (const loaded of ['2', '3'] as const) {
            const cells = col?.amps[loaded];
            if (cells && cells.length !== t.sizesMm2.length)
              out.errors.push(
                `capacityTables.${i} (${t.id}).methods.${method}.amps.${loaded}: give one value (or null) per size; ${t.sizesMm2.length} sizes, ${cells.length} values.`,
              );
          }
        }
      });
      out.capacityTables = parsed.data as CapacityTable[];
    }
  }
  if (raw.ggFuses !== undefined) {
    const parsed = fuses.safeParse(raw.ggFuses);
    if (!parsed.success) out.errors.push(...messages('ggFuses', parsed.error));
    else {
      parsed.data.rows.forEach((r, i) => {
        if (r.ia04sA <= r.ia5sA)
          out.errors.push(
            `ggFuses.rows.${i} (${r.ratingA} A): ia04sA must be larger than ia5sA (a fuse melts faster at higher current); got ${r.ia04sA} and ${r.ia5sA}.`,
          );
      });
      out.ggFuses = parsed.data;
    }
  }
  return out;
}
