/** Fields of the project details and settings forms. */
import type { ProjectDetails, Settings } from '../../model/types.ts';
import type { FieldGroup, TextField } from './fieldSpec.ts';
import { LIMIT_PROFILE_OPTIONS } from './options.ts';

type D = ProjectDetails;
const detail = (
  key: Exclude<keyof D, 'revisions'> & string,
  label: string,
  hint?: string,
): TextField<D, Partial<D>> => ({
  kind: 'text',
  key,
  label,
  hint,
  required: key === 'title',
  get: (d) => d[key],
  set: (_d, v) => ({ [key]: v }),
});

export const DETAILS_FIELDS: FieldGroup<D, Partial<D>>[] = [
  {
    title: 'Project',
    fields: [
      detail('title', 'Title'),
      detail('client', 'Client'),
      detail('site', 'Site'),
      detail('reference', 'Reference'),
    ],
  },
  {
    title: 'Issue',
    fields: [
      // With a revision table, its last row gives the revision and the date.
      { ...detail('revision', 'Revision'), shown: (d) => !d.revisions?.length },
      detail('author', 'Author'),
      {
        kind: 'text',
        key: 'date',
        label: 'Date',
        hint: 'Year-month-day, e.g. 2025-03-14.',
        check: dateProblem,
        shown: (d) => !d.revisions?.length,
        get: (d) => d.date,
        set: (_d, v) => ({ date: v }),
      },
      detail('notes', 'Notes'),
    ],
  },
];

/** A date the user typed, checked as a real calendar day in year-month-day form (or left empty). */
export function dateProblem(text: string): string | null {
  if (text === '') return null;
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  if (!m) return `Date of the project: "${text}" is not in year-month-day form; type e.g. 2025-03-14.`;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const day = new Date(Date.UTC(y, mo - 1, d));
  if (day.getUTCFullYear() !== y || day.getUTCMonth() !== mo - 1 || day.getUTCDate() !== d) {
    return `Date of the project: ${text} is not a calendar day; check the month and day.`;
  }
  return null;
}

type S = Settings;
export const SETTINGS_FIELDS: FieldGroup<S, Partial<S>>[] = [
  {
    title: 'Drop limits',
    fields: [
      {
        kind: 'choice',
        key: 'limitProfile',
        label: 'Limit profile',
        options: LIMIT_PROFILE_OPTIONS,
        get: (s) => s.limitProfile,
        set: (_s, v) => ({ limitProfile: v as S['limitProfile'] }),
      },
      {
        kind: 'number',
        key: 'customLimits.lightingPct',
        label: 'Lighting limit (% of nominal)',
        unit: '%',
        rule: { min: 0, minExclusive: true, max: 25 },
        shown: (s) => s.limitProfile === 'custom',
        get: (s) => s.customLimits.lightingPct,
        set: (s, lightingPct) => ({ customLimits: { ...s.customLimits, lightingPct } }),
      },
      {
        kind: 'number',
        key: 'customLimits.otherPct',
        label: 'Other uses limit (% of nominal)',
        unit: '%',
        rule: { min: 0, minExclusive: true, max: 25 },
        shown: (s) => s.limitProfile === 'custom',
        get: (s) => s.customLimits.otherPct,
        set: (s, otherPct) => ({ customLimits: { ...s.customLimits, otherPct } }),
      },
      {
        kind: 'toggle',
        key: 'longRunAllowance',
        label: 'Allow the extra 0.005 % per metre beyond 100 m (IEC 60364-5-52 G.52.1, at most 0.5 %)',
        get: (s) => s.longRunAllowance,
        set: (_s, longRunAllowance) => ({ longRunAllowance }),
      },
      {
        kind: 'number',
        key: 'closeThreshold',
        label: 'Report as tight above (% of the budget)',
        unit: '%',
        rule: { min: 1, max: 100 },
        hint: 'A load whose drop uses more of its budget than this is marked tight.',
        // Stored as a fraction of the budget; typed as a percentage of it.
        get: (s) => Number((s.closeThreshold * 100).toPrecision(12)),
        set: (_s, pct) => ({ closeThreshold: pct / 100 }),
      },
    ],
  },
  {
    title: 'System',
    fields: [
      {
        kind: 'number',
        key: 'u0V',
        label: 'Nominal voltage to neutral U0',
        unit: 'V',
        rule: { min: 50, max: 1000 },
        get: (s) => s.u0V,
        set: (_s, u0V) => ({ u0V }),
      },
      {
        kind: 'number',
        key: 'uLlV',
        label: 'Nominal line-to-line voltage',
        unit: 'V',
        rule: { min: 50, max: 1000 },
        get: (s) => s.uLlV,
        set: (_s, uLlV) => ({ uLlV }),
      },
      {
        kind: 'choice',
        key: 'frequencyHz',
        label: 'Frequency',
        options: [
          { value: '50', label: '50 Hz' },
          { value: '60', label: '60 Hz' },
        ],
        get: (s) => String(s.frequencyHz),
        set: (_s, v) => ({ frequencyHz: Number(v) as 50 | 60 }),
      },
      {
        kind: 'choice',
        key: 'designCurrentBasis',
        label: 'Drop computed with',
        options: [
          { value: 'Ib', label: 'Design current Ib' },
          { value: 'In', label: 'Device rating In (conservative)' },
        ],
        get: (s) => s.designCurrentBasis,
        set: (_s, v) => ({ designCurrentBasis: v as S['designCurrentBasis'] }),
      },
    ],
  },
];
