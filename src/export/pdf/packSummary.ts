/** The tender pack's summary sheet: project, settings, data and standards used, results in brief, methods and the cautions. */
import type { jsPDF } from 'jspdf';
import type { ProjectDocument } from '../../model/types.ts';
import { CAUTIONS } from '../../model/cautions.ts';
import type { Results, Status } from '../../solver/results.ts';
import { STATUS_LOOK } from '../statusLook.ts';
import { projectDetailRows } from '../labels.ts';
import { COMPARISON_METHOD } from '../comparison.ts';
import { CONTENT, GREY, INK, PACK_FONT } from './packPage.ts';

/** Methods and assumptions the figures rest on, as the engine applies them (docs/solver.md, docs/protection.md). */
export const PACK_METHODS: readonly string[] = [
  'Route lengths are one way, in metres. The method applies the loop: 2 × for a single-phase circuit, √3 line to line for a balanced three-phase one; an unbalanced three-phase segment is solved per phase with its neutral current (neutral taken equal to the phase conductor).',
  'Conductor resistance is the IEC 60228 maximum at 20 °C corrected to the conductor operating temperature (α20 0.00393/K copper, 0.00403/K aluminium), with a reactance per metre for the construction, unless a loaded data set gives the figures; the data set used is named on this sheet and in every working record.',
  'A segment’s drop is I (r cos φ + x sin φ) × L where the power factor is known. Percentages add along each path from the origin; single-phase and per-phase figures are % of U0, a balanced three-phase segment’s own drop is % of the line voltage.',
  'Design current is the sum of the loads below, with each load’s demand factor and each board’s diversity, per phase; Ib of a cable is its worst phase. Where the settings say so, the device rating In is used for the drop instead (conservative).',
  'Loop impedance Zs = Ze + Σ (R1 + R2) along the path at operating temperature, compared with Cmin × U0 / Ia for the protective device. Prospective fault currents use the source impedance and the cables at 20 °C with cmax.',
  'Capacity Iz is the tabulated It times the ambient, grouping and insulation factors given for the circuit; combinations with no table are reported as not assessed, never guessed.',
  COMPARISON_METHOD,
  `Status words: ${(['within', 'close', 'over'] as const).map((k) => `${STATUS_LOOK[k].glyph} ${STATUS_LOOK[k].word} (${STATUS_LOOK[k].meaning})`).join(', ')}; boards and cables show the worst load they feed.`,
];

function countStatuses(results: Results): Record<Status | 'none', number> {
  const out: Record<Status | 'none', number> = { within: 0, close: 0, over: 0, none: 0 };
  for (const id of Object.keys(results.loads)) out[results.loads[id]!.status ?? 'none']++;
  return out;
}

/** A block's heading; returns the y of the first line under it. */
function subheading(pdf: jsPDF, x: number, y: number, heading: string): number {
  pdf.setFont(PACK_FONT, 'bold');
  pdf.setFontSize(10.5);
  pdf.setTextColor(...INK);
  pdf.text(heading, x, y);
  return y + 5.5;
}

/** Label/value lines under a heading; returns the y below them. */
function block(
  pdf: jsPDF,
  x: number,
  y: number,
  w: number,
  heading: string,
  lines: readonly (readonly [string, string])[],
): number {
  y = subheading(pdf, x, y, heading);
  for (const [label, value] of lines) {
    pdf.setFont(PACK_FONT, 'normal');
    pdf.setFontSize(8.5);
    pdf.setTextColor(...GREY);
    pdf.text(label, x, y);
    pdf.setTextColor(...INK);
    const wrapped = pdf.splitTextToSize(value || '–', w - 48) as string[];
    pdf.text(wrapped, x + 46, y);
    y += 4.2 * wrapped.length;
  }
  return y + 4;
}

/** Paragraphs (bulleted) under a heading; returns the y below them. */
function paragraphs(
  pdf: jsPDF,
  x: number,
  y: number,
  w: number,
  heading: string,
  items: readonly string[],
): number {
  y = subheading(pdf, x, y, heading);
  pdf.setFont(PACK_FONT, 'normal');
  pdf.setFontSize(8.5);
  for (const item of items) {
    const wrapped = pdf.splitTextToSize(item, w - 5) as string[];
    pdf.text('•', x, y);
    pdf.text(wrapped, x + 4, y);
    y += 4 * wrapped.length + 1.2;
  }
  return y + 3;
}

export function summarySheet(pdf: jsPDF, doc: ProjectDocument, results: Results): void {
  const d = doc.details;
  const s = doc.settings;
  const colW = (CONTENT.w - 12) / 2;
  const left = CONTENT.x;
  const right = CONTENT.x + colW + 12;
  let y = CONTENT.y;
  y = block(pdf, left, y, colW, 'Project details', [...projectDetailRows(d), ['Notes', d.notes]]);
  // The revision table, newest first as drawings list it; every figure in this pack is of the last.
  if (d.revisions && d.revisions.length > 0)
    y = block(
      pdf,
      left,
      y,
      colW,
      'Revisions',
      [...d.revisions]
        .reverse()
        .map((r) => [
          `${r.revision}  ${r.date}`,
          `${r.description}${r.by ? ` (by ${r.by}${r.checked ? `, checked ${r.checked}` : ''})` : r.checked ? ` (checked ${r.checked})` : ''}`,
        ]),
    );
  const counts = countStatuses(results);
  const errors = results.findings.filter((f) => f.severity === 'error').length;
  const warnings = results.findings.length - errors;
  const supply = doc.nodes.find((n) => n.kind === 'supply');
  y = block(pdf, left, y, colW, 'Settings and supply', [
    ['Frequency', `${s.frequencyHz} Hz`],
    ['Nominal voltages', `U0 ${s.u0V} V, ULL ${s.uLlV} V`],
    [
      'Supply',
      supply && supply.kind === 'supply'
        ? `${supply.id}: ${supply.phases === 3 ? 'three-phase' : 'single-phase'}, ${supply.earthing}, Ze ${supply.zeOhm} Ω, Ipf ${supply.pfcKa} kA, ${supply.ownership} supply`
        : 'none',
    ],
    ['Close to limit', `above ${Math.round(s.closeThreshold * 100)} % of a load’s drop budget`],
    [
      'Drop worked out with',
      s.designCurrentBasis === 'In' ? 'the device rating In (conservative)' : 'the design current Ib',
    ],
    [
      'Long-run allowance',
      s.longRunAllowance ? 'applied (+0.005 % per metre beyond 100 m, at most +0.5 %)' : 'not applied',
    ],
  ]);
  y = block(pdf, left, y, colW, 'Results in brief', [
    [
      'Loads',
      `${Object.keys(results.loads).length}: ${counts.within} within, ${counts.close} close, ${counts.over} over, ${counts.none} with no result`,
    ],
    ['Cables', String(doc.cables.length)],
    ['Findings', `${errors} errors, ${warnings} warnings (listed on the findings sheet)`],
    ...(results.protection
      ? ([
          [
            'Protection checks',
            `${results.protection.failedChecks} failed, ${results.protection.unassessedChecks} not assessed`,
          ],
        ] as const)
      : []),
  ]);
  let r = CONTENT.y;
  r = block(pdf, right, r, colW, 'Data and standards used', [
    ['Conductor data', `${results.dataSet.title} (${results.dataSet.id}); ${results.dataSet.source}`],
    ['Drop limits', `${results.profile.title}; ${results.profile.source}`],
    ...(results.protection
      ? ([
          ['Fuse data', results.protection.fuseDataSet.title],
          ['Capacity tables', results.protection.capacityDataSets.join('; ')],
        ] as const)
      : []),
  ]);
  r = paragraphs(pdf, right, r, colW, 'Standards and editions', results.references);
  r = paragraphs(pdf, right, r, colW, 'Cautions', CAUTIONS);
  const methodsY = Math.max(y, r);
  paragraphs(pdf, left, methodsY, CONTENT.w, 'Methods and assumptions', PACK_METHODS);
}
