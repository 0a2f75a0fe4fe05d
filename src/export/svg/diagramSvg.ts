/**
 * The single-line diagram as a standalone SVG drawing, in millimetres, drawn by the very code that
 * draws the tender pack's diagram sheet (export/pdf/diagram.ts) through an SvgPen. A drawing whose
 * labels are legible on the pack's A3 sheet sits where the sheet has it; a larger one is drawn
 * whole at the scale where labels print at 4 pt (SVG has no page to fit), not split into sheets.
 * Above it: the project title, reference and revision, the data set and limit profile used, and
 * the caution line; under it, the standards and editions used.
 *
 * @example
 *   const svg = diagramSvg(doc, solve(doc), fonts); // "<?xml …><svg …>…</svg>"
 */
import { jsPDF } from 'jspdf';
import type { ProjectDocument } from '../../model/types.ts';
import type { Results } from '../../solver/results.ts';
import { drawDiagram, fitDiagram } from '../pdf/diagram.ts';
import { keySize, measurer } from '../pdf/diagramDraw.ts';
import { LABEL_MIN_PT, planDiagram, scaleForLabelPt, type Box } from '../pdf/diagramLayout.ts';
import { CONTENT, PACK_FONT, registerPackFont, type PackFonts } from '../pdf/packPage.ts';
import { SvgPen, escapeXml, num } from './svgPen.ts';

/** The fonts an SVG viewer is asked for: the pack's own first, then look-alikes. */
export const SVG_FONT_FAMILY = 'DejaVu Sans Condensed, DejaVu Sans, Arial, sans-serif';

/** The caution line every SVG drawing carries. */
export const SVG_CAUTION =
  'Design aid only: local wiring rules, the supply company and licensed practice prevail; verify on site by a competent person.';

const MARGIN = 10;
/** The status key's text size on a drawing at the 4 pt label scale (diagram.ts: 5 to 7 pt). */
const KEY_PT = 5;
const INK = '#1e242c';
const GREY = '#6e7680';

/**
 * Where the diagram goes: the pack's A3 content box when its labels are legible there (or there is
 * nothing to draw), otherwise a box as large as the whole drawing at the 4 pt label scale, with
 * room below it for the status key.
 */
export function drawingBox(pen: SvgPen, doc: ProjectDocument, results: Results): Box {
  const sheet: Box = { ...CONTENT };
  const fitted = fitDiagram(pen, doc, results, sheet, PACK_FONT);
  if (!fitted || fitted.plan.mode === 'full') return sheet;
  // A hair above the 4 pt scale, so rounding never takes the labels under it.
  const scale = scaleForLabelPt(LABEL_MIN_PT) * (1 + 1e-9);
  const plan = planDiagram(doc, results, sheet, measurer(pen, PACK_FONT), scale);
  if (!plan) return sheet;
  const key = keySize(pen, PACK_FONT, KEY_PT);
  return { x: sheet.x, y: sheet.y, w: plan.area.w, h: plan.area.h + key.h + 2 };
}

/** The lines above the drawing: project, data used and the caution. */
function headingLines(doc: ProjectDocument, results: Results): string[] {
  const d = doc.details;
  const project = [
    d.title || 'Untitled project',
    d.reference,
    d.revision ? `revision ${d.revision}` : '',
  ].filter(Boolean);
  return [
    `${project.join(' · ')}: single-line diagram`,
    `Conductor data: ${results.dataSet.title} · Drop limits: ${results.profile.title}`,
    SVG_CAUTION,
  ];
}

/** The heading's three lines: size (pt) and top (mm, from the heading's top). */
const HEADING = [
  { pt: 12, top: 0 },
  { pt: 8, top: 6 },
  { pt: 8, top: 9.6 },
];
/** From the heading's top to the drawing's top, mm. */
const HEADING_SPACE = 16;

/** Text size of the line naming the standards, pt. */
const STANDARDS_PT = 6.5;

/**
 * Under the drawing: the standards and editions the figures rest on, wrapped at `width` (mm)
 * between items, from (x, y) down.
 */
function drawStandards(
  pen: SvgPen,
  references: readonly string[],
  x: number,
  y: number,
  width: number,
): void {
  pen.setFont(PACK_FONT, 'normal');
  pen.setFontSize(STANDARDS_PT);
  pen.setTextColor(GREY);
  const items = references.map((r, i) => (i === 0 ? `Standards and editions used: ${r}` : r));
  const lines: string[] = [];
  for (const item of items) {
    const last = lines[lines.length - 1];
    if (last !== undefined && pen.getTextWidth(`${last}; ${item}`) <= width)
      lines[lines.length - 1] = `${last}; ${item}`;
    else lines.push(item);
  }
  const step = STANDARDS_PT * (25.4 / 72) * 1.3;
  lines.forEach((line, k) => pen.text(line, x, y + k * step, { baseline: 'top' }));
}

/** Writes the heading lines with their top-left corner at (x, y). */
function drawHeading(pen: SvgPen, lines: string[], x: number, y: number): void {
  lines.forEach((text, i) => {
    pen.setFont(PACK_FONT, i === 1 ? 'normal' : 'bold');
    pen.setFontSize(HEADING[i]!.pt);
    pen.setTextColor(i === 1 ? GREY : INK);
    pen.text(text, x, y + HEADING[i]!.top, { baseline: 'top' });
  });
}

/**
 * The single-line diagram of `doc` as a standalone SVG document (viewBox and sizes in mm), labels
 * measured with the pack's font `fonts` and named in the SVG by SVG_FONT_FAMILY.
 */
export function diagramSvg(doc: ProjectDocument, results: Results, fonts: PackFonts): string {
  const measure = new jsPDF({ orientation: 'landscape', unit: 'mm', format: 'a3' });
  registerPackFont(measure, fonts);
  measure.setFont(PACK_FONT, 'normal');
  const box = drawingBox(new SvgPen(measure), doc, results);
  // Where the drawing lands, found by drawing it once aside: the heading goes just above it and
  // the file is cropped to both, so the drawing can be placed in a report as it is.
  const trial = new SvgPen(measure);
  drawDiagram(trial, doc, results, box, PACK_FONT);
  const at = trial.bounds() ?? { x: box.x, y: box.y + HEADING_SPACE, w: 0, h: 0 };
  const pen = new SvgPen(measure);
  const lines = headingLines(doc, results);
  drawHeading(pen, lines, at.x, at.y - HEADING_SPACE);
  const drawn = drawDiagram(pen, doc, results, box, PACK_FONT);
  if (drawn.scale === 0) {
    pen.setFont(PACK_FONT, 'normal');
    pen.setFontSize(10);
    pen.setTextColor(GREY);
    pen.text('Nothing to draw: no element has a place on the diagram.', at.x, at.y, { baseline: 'top' });
  }
  const drawnAt = pen.bounds()!;
  drawStandards(pen, results.references, at.x, drawnAt.y + drawnAt.h + 4, Math.max(drawnAt.w, 200));
  const all = pen.bounds()!;
  const x = all.x - MARGIN;
  const y = all.y - MARGIN;
  const w = all.w + 2 * MARGIN;
  const h = all.h + 2 * MARGIN;
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" width="${num(w)}mm" height="${num(h)}mm" viewBox="${num(x)} ${num(y)} ${num(w)} ${num(h)}"` +
      ` font-family="${SVG_FONT_FAMILY}">`,
    `<title>${escapeXml(lines[0]!)}</title>`,
    `<rect x="${num(x)}" y="${num(y)}" width="${num(w)}" height="${num(h)}" fill="#ffffff"/>`,
    pen.elements(),
    '</svg>',
    '',
  ].join('\n');
}
