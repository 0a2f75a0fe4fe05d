/**
 * The project file's validator, written with zod 4 to mirror `types.ts` exactly. The published
 * JSON Schema (`docs/project.schema.json`, `npm run schema`) is generated from it, and a
 * compile-time check at the bottom keeps it and the hand-written interfaces in step both ways.
 *
 * Ranges here are the ones a file must satisfy to be opened. Engineering judgements (a length
 * of 0 m, a size missing from the data set, a loop) are the solver's findings, not file errors.
 */
import * as z from 'zod';
import { MAX_PARALLEL } from './bounds.ts';
import type { ProjectDocument } from './types.ts';
import { FORMAT_ID, FORMAT_VERSION } from './types.ts';
import { idProblem } from './ids.ts';

/**
 * Most elements (nodes and cables together) a file may hold, the current design and its
 * alternatives counted together.
 */
export const MAX_ELEMENTS = 200_000;
/** Most alternatives a project keeps beside its current design. */
export const MAX_ALTERNATIVES = 20;
/** Longest alternative name, in characters. */
export const MAX_ALTERNATIVE_NAME = 80;

const finite = () => z.number();
const positive = () => z.number().positive();
const nonNegative = () => z.number().nonnegative();
const fraction = () => z.number().positive().max(1);

export const idSchema = z
  .string()
  .min(1)
  .max(64)
  .regex(/^[A-Za-z0-9][A-Za-z0-9_.-]{0,63}$/)
  .refine((s) => idProblem(s) === null, { message: 'reserved id' });

const name = () => z.string().max(200);

export const positionSchema = z.strictObject({ x: finite(), y: finite() });
/** Largest site a plan may describe, metres across. */
export const MAX_PLAN_M = 100_000;
/** The most a cable's route allowance adds to its length measured on the plan, metres. */
export const MAX_ALLOWANCE_M = 1000;
/** Longest plan image, as data URL text (about 9 MB of picture). */
export const MAX_PLAN_IMAGE_CHARS = 12_000_000;
export const planPointSchema = z
  .strictObject({
    xM: z.number().min(-MAX_PLAN_M).max(MAX_PLAN_M),
    yM: z.number().min(-MAX_PLAN_M).max(MAX_PLAN_M),
  })
  .describe('Place on the site plan, metres from the plan’s top-left corner.');
export const sitePlanSchema = z
  .strictObject({
    image: z
      .string()
      .max(MAX_PLAN_IMAGE_CHARS)
      .regex(/^data:image\/(png|jpeg|svg\+xml);base64,[A-Za-z0-9+/=]*$/, {
        message: 'a PNG, JPEG or SVG data URL',
      }),
    widthM: z.number().positive().max(MAX_PLAN_M).describe('Metres the plan image spans across.'),
  })
  .describe('The site plan that elements are placed on to measure cable lengths.');
/** The most bends one cable's route may have on the plan. */
export const MAX_ROUTE_BENDS = 50;
export const planRouteSchema = z
  .strictObject({
    allowanceM: z.number().min(0).max(MAX_ALLOWANCE_M),
    via: z
      .array(planPointSchema)
      .max(MAX_ROUTE_BENDS)
      .optional()
      .describe(
        'Bends the route passes through, from the sending end; each leg is measured along x, then y.',
      ),
  })
  .describe('Length measured on the site plan (rectilinear, through any bends) plus this allowance, metres.');
const phaseCount = z.union([z.literal(1), z.literal(3)]);
// Spelled out rather than built from PHASES / LOAD_KINDS so the inferred types are the literal
// unions; the agreement check below catches any drift from types.ts.
const phase = z.enum(['L1', 'L2', 'L3']);

export const transformerSchema = z.strictObject({
  kva: positive(),
  impedancePct: z.number().positive().max(100),
  xOverR: nonNegative(),
});

export const supplySchema = z.strictObject({
  kind: z.literal('supply'),
  id: idSchema,
  name: name(),
  position: positionSchema,
  plan: planPointSchema.optional(),
  phases: phaseCount,
  u0V: z.number().positive().max(1000).describe('Nominal line-to-neutral voltage U0, volts.'),
  earthing: z.enum(['TN-S', 'TN-C-S', 'TT']),
  zeOhm: nonNegative().describe('External earth fault loop impedance Ze at the origin, ohms.'),
  zeSource: z.enum(['declared', 'measured']),
  pfcKa: positive().describe('Prospective fault current at the origin, kA.'),
  ownership: z.enum(['public', 'private']),
  transformer: transformerSchema.optional(),
  raOhm: nonNegative().optional(),
});

export const boardSchema = z.strictObject({
  kind: z.literal('board'),
  id: idSchema,
  name: name(),
  position: positionSchema,
  plan: planPointSchema.optional(),
  diversity: fraction().describe("Diversity applied to the board's outgoing demand, 0 to 1 (1 = none)."),
  spareCapacityPct: z
    .number()
    .min(0)
    .max(200)
    .optional()
    .describe(
      "Allowance for loads to come, % of the board's demand; the cables feeding it carry the demand with it.",
    ),
});

export const junctionSchema = z.strictObject({
  kind: z.literal('junction'),
  id: idSchema,
  name: name(),
  position: positionSchema,
  plan: planPointSchema.optional(),
});

export const motorStartSchema = z.strictObject({
  startMultiple: z.number().min(1).max(20),
  startPowerFactor: fraction(),
  dipLimitPct: z.number().positive().max(100),
});

export const loadSchema = z.strictObject({
  kind: z.literal('load'),
  id: idSchema,
  name: name(),
  position: positionSchema,
  plan: planPointSchema.optional(),
  loadKind: z.enum([
    'lighting',
    'sockets',
    'heating',
    'cooking',
    'waterHeating',
    'motor',
    'evCharging',
    'hvac',
    'other',
  ]),
  category: z.enum(['lighting', 'other']),
  demand: z.strictObject({ value: nonNegative(), unit: z.enum(['W', 'kW', 'kVA', 'A']) }),
  powerFactor: fraction(),
  phases: phaseCount,
  phase,
  demandFactor: fraction().describe('Share of the connected demand taken as design demand, 0 to 1.'),
  distributed: z
    .boolean()
    .optional()
    .describe('Spread evenly along the cable that feeds it: its far-end drop is over half the length.'),
  motor: motorStartSchema.optional(),
});

export const nodeSchema = z.discriminatedUnion('kind', [
  supplySchema,
  boardSchema,
  junctionSchema,
  loadSchema,
]);

export const cpcSchema = z.strictObject({
  kind: z.enum(['core', 'separate', 'armour']),
  sizeMm2: positive(),
  material: z.enum(['Cu', 'Al', 'steel']),
});

export const deviceSchema = z.strictObject({
  type: z.enum(['mcb', 'rcbo', 'fuseGG', 'mccb']),
  curve: z.enum(['B', 'C', 'D']).optional(),
  ratingA: positive(),
  breakingKa: positive(),
  irMultiple: positive().optional(),
  imMultiple: positive().optional(),
  rcd: z.strictObject({ type: z.enum(['AC', 'A', 'F', 'B']), idnMa: positive() }).optional(),
});

export const installationSchema = z.strictObject({
  method: z.enum([
    'clippedDirect',
    'conduitOnWall',
    'conduitInInsulatedWall',
    'trayOrFreeAir',
    'buriedDirect',
    'buriedDuct',
    'inInsulation',
    'aboveInsulation',
  ]),
  ambientC: z.number().min(-50).max(100),
  groupedCircuits: z.number().int().min(1).max(1000),
  groupArrangement: z.enum(['bunched', 'singleLayer', 'tray']),
  insulationFactor: fraction(),
  run: z
    .string()
    .trim()
    .min(1)
    .max(60)
    .optional()
    .describe('A shared containment run by name; cables in the same run are grouped together.'),
});

const cableBody = {
  // Zero is allowed (a cable not yet measured); the solver reports it. Negative never is.
  lengthM: nonNegative().describe('One-way route length, metres (0 = not yet measured).'),
  material: z.enum(['Cu', 'Al']),
  insulation: z.enum(['thermoplastic70', 'thermosetting90']),
  construction: z.enum(['flatTwinEarth', 'multicore', 'armouredMulticore', 'singleCore']),
  sizeMm2: positive().describe('Line conductor cross-section, mm².'),
  cpc: cpcSchema,
  phases: phaseCount,
  parallel: z.number().int().min(1).max(MAX_PARALLEL),
  device: deviceSchema.optional(),
  installation: installationSchema.optional(),
};

export const cableSchema = z.strictObject({
  id: idSchema,
  name: name(),
  from: idSchema.describe('Id of the upstream node (towards the supply).'),
  to: idSchema.describe('Id of the downstream node.'),
  ...cableBody,
  route: planRouteSchema.optional(),
});

export const cableDefaultsSchema = z.strictObject(cableBody);

/** The most rows a project's revision table may hold. */
export const MAX_REVISIONS = 200;
export const revisionSchema = z
  .strictObject({
    revision: z.string().max(40),
    date: z.string().max(40),
    description: z.string().max(1000),
    by: name(),
    checked: name(),
  })
  .describe('One issue of the design: revision, date, what changed, by whom, checked by whom.');

export const detailsSchema = z.strictObject({
  title: name(),
  client: name(),
  site: name(),
  reference: name(),
  revision: z.string().max(40),
  author: name(),
  date: z.string().max(40),
  notes: z.string().max(20_000),
  revisions: z
    .array(revisionSchema)
    .max(MAX_REVISIONS)
    .optional()
    .describe('Every issue of the design, oldest first; the last is the current revision.'),
});

export const settingsSchema = z.strictObject({
  frequencyHz: z.union([z.literal(50), z.literal(60)]),
  u0V: z.number().positive().max(1000),
  uLlV: z.number().positive().max(1000),
  limitProfile: z.enum(['iecPublic', 'iecPrivate', 'nec', 'asnzs', 'custom']),
  customLimits: z.strictObject({
    lightingPct: z.number().positive().max(100),
    otherPct: z.number().positive().max(100),
  }),
  longRunAllowance: z.boolean(),
  closeThreshold: z
    .number()
    .positive()
    .lt(1)
    .describe('Share of the drop budget above which a load is reported as close to its limit.'),
  designCurrentBasis: z.enum(['Ib', 'In']),
  dataSet: z.string().min(1).max(200),
  cableDefaults: cableDefaultsSchema,
});

export const alternativeSchema = z
  .strictObject({
    name: z
      .string()
      .min(1)
      .max(MAX_ALTERNATIVE_NAME)
      .refine((s) => s.trim() === s, { message: 'no spaces at either end' }),
    note: z.string().max(20_000),
    keptAt: z.string().max(40).describe('When it was kept, ISO 8601.'),
    settings: settingsSchema,
    nodes: z.array(nodeSchema).max(MAX_ELEMENTS),
    cables: z.array(cableSchema).max(MAX_ELEMENTS),
  })
  .describe('A design kept beside the current one: its own elements and settings.');

/** The list itself, before each alternative is checked on its own (see parseDocument). */
export const alternativesListSchema = z.array(z.unknown()).max(MAX_ALTERNATIVES);

export const documentSchema = z
  .strictObject({
    format: z.literal(FORMAT_ID),
    version: z.literal(FORMAT_VERSION),
    details: detailsSchema,
    settings: settingsSchema,
    nodes: z.array(nodeSchema).max(MAX_ELEMENTS),
    cables: z.array(cableSchema).max(MAX_ELEMENTS),
    alternatives: z
      .array(alternativeSchema)
      .max(MAX_ALTERNATIVES)
      .describe('Named alternatives: other designs for the same project, oldest first.'),
    plan: sitePlanSchema.optional(),
  })
  .meta({
    title: 'Dropline project',
    description:
      'A low-voltage distribution layout: supply, boards, junctions, loads and the cables between them.',
  });

export type DocumentFromSchema = z.infer<typeof documentSchema>;

// Compile-time agreement between the schema and the hand-written types, both ways: if either
// side gains, loses or changes a field, `tsc` fails on one of these lines.
type Equals<A, B> = (<T>() => T extends A ? 1 : 2) extends <T>() => T extends B ? 1 : 2 ? true : false;
const schemaMatchesTypes: Equals<DocumentFromSchema, ProjectDocument> = true;
const typesAssignToSchema: ProjectDocument extends DocumentFromSchema ? true : false = true;
const schemaAssignsToTypes: DocumentFromSchema extends ProjectDocument ? true : false = true;
void schemaMatchesTypes;
void typesAssignToSchema;
void schemaAssignsToTypes;
