/**
 * The tender pack's site plan sheet: the plan picture at its scale, each element where it stands,
 * and each cable along the route its length is measured on (along x, then y), in the same status
 * style as the single-line diagram, with a scale bar and a note of how lengths were measured.
 * Only made when an element stands on the plan.
 */
import type { jsPDF } from 'jspdf';
import type { NodeElement, PlanPoint, ProjectDocument } from '../../model/types.ts';
import type { Results } from '../../solver/results.ts';
import { routeDistanceM, routePoints } from '../../model/planLengths.ts';
import { statusLook } from '../statusLook.ts';
import { fmt } from '../format.ts';
import { applyStatus } from './diagramDraw.ts';
import { CONTENT, GREY, INK, PACK_FONT, rgb } from './packPage.ts';

/** A raster of the plan picture (PNG or JPEG data URL) and its size in pixels. */
export interface PlanPicture {
  dataUrl: string;
  widthPx: number;
  heightPx: number;
}

/** True when the pack should carry a site plan sheet. */
export function hasPlanSheet(doc: ProjectDocument): boolean {
  return doc.nodes.some((n) => n.plan !== undefined);
}

/** The document's own picture when jsPDF can place it as it is (PNG or JPEG), else null. */
export function rasterOf(pdf: jsPDF, doc: ProjectDocument): PlanPicture | null {
  const image = doc.plan?.image;
  if (!image || !/^data:image\/(png|jpeg);/.test(image)) return null;
  try {
    const p = pdf.getImageProperties(image);
    return { dataUrl: image, widthPx: p.width, heightPx: p.height };
  } catch {
    return null;
  }
}

const NOTE =
  'Cables are drawn along x, then y, between the plan points of their ends (leg by leg through any bends drawn on the route), the route their length is measured on: length = Σ (|Δx| + |Δy|) + allowance, rounded up to 0.1 m. Solid, in the status style of the diagram: measured on the plan. Thin grey dashes: length typed, not measured here. Lengths in the schedules are the ones the figures use.';

function scaleBarM(mmPerM: number): number {
  for (const m of [1, 2, 5, 10, 20, 50, 100, 200, 500, 1000, 2000, 5000]) if (m * mmPerM >= 30) return m;
  return 10000;
}

export function drawPlanSheet(
  pdf: jsPDF,
  doc: ProjectDocument,
  results: Results,
  picture: PlanPicture | null,
): void {
  const placed = doc.nodes.filter((n): n is NodeElement & { plan: PlanPoint } => n.plan !== undefined);
  const widthM = doc.plan?.widthM ?? 0;
  const heightM = picture && widthM > 0 ? (widthM * picture.heightPx) / picture.widthPx : 0;
  const bends = doc.cables.flatMap((c) => c.route?.via ?? []);
  const xs = [...placed.map((n) => n.plan.xM), ...bends.map((p) => p.xM)];
  const ys = [...placed.map((n) => n.plan.yM), ...bends.map((p) => p.yM)];
  const pad = 2;
  const x0 = Math.min(picture ? 0 : Infinity, ...xs) - (picture ? 0 : pad);
  const y0 = Math.min(picture ? 0 : Infinity, ...ys) - (picture ? 0 : pad);
  const x1 = Math.max(picture ? widthM : -Infinity, ...xs) + pad;
  const y1 = Math.max(picture ? heightM : -Infinity, ...ys) + pad;
  const area = { x: CONTENT.x, y: CONTENT.y + 2, w: CONTENT.w, h: CONTENT.h - 18 };
  const s = Math.min(area.w / Math.max(x1 - x0, 1), area.h / Math.max(y1 - y0, 1));
  const ox = area.x + (area.w - (x1 - x0) * s) / 2;
  const oy = area.y;
  const at = (p: PlanPoint) => ({ x: ox + (p.xM - x0) * s, y: oy + (p.yM - y0) * s });

  if (picture)
    pdf.addImage(picture.dataUrl, at({ xM: 0, yM: 0 }).x, at({ xM: 0, yM: 0 }).y, widthM * s, heightM * s);

  const byId = new Map(placed.map((n) => [n.id, n]));
  // Line widths and dashes as on the diagram, a canvas pixel taken as 0.25 mm.
  const k = 0.25;
  const labels: { x: number; y: number; text: string }[] = [];
  for (const c of doc.cables) {
    const a = byId.get(c.from);
    const b = byId.get(c.to);
    if (!a || !b) continue;
    const route = routePoints(c, a.plan, b.plan).map(at);
    const pa = route[0]!;
    const next = route[1]!;
    if (c.route) applyStatus(pdf, results.cables[c.id]?.status ?? null, k);
    else {
      pdf.setDrawColor(...GREY);
      pdf.setLineWidth(0.2);
      pdf.setLineDashPattern([0.8, 1], 0);
    }
    // Each leg along x, then y, as it is measured.
    const legs: [number, number][] = [];
    for (let i = 1; i < route.length; i++)
      legs.push([route[i]!.x - route[i - 1]!.x, 0], [0, route[i]!.y - route[i - 1]!.y]);
    pdf.lines(legs, pa.x, pa.y);
    if (b.kind !== 'load')
      labels.push({
        x: (pa.x + next.x) / 2,
        y: pa.y - 0.8,
        text: c.route
          ? `${c.id} ${fmt(c.lengthM, 1)} m`
          : `${c.id} typed ${fmt(c.lengthM, 1)} m (plan ${fmt(routeDistanceM(routePoints(c, a.plan, b.plan)), 1)} m)`,
      });
  }
  pdf.setLineDashPattern([], 0);

  pdf.setFont(PACK_FONT, 'normal');
  pdf.setFontSize(5);
  for (const n of placed) {
    const p = at(n.plan);
    const look = statusLook(results.nodes[n.id]?.status ?? null);
    pdf.setDrawColor(...rgb(look.colour));
    pdf.setFillColor(255, 255, 255);
    pdf.setLineWidth(0.45);
    if (n.kind === 'load') pdf.circle(p.x, p.y, 1.3, 'FD');
    else pdf.rect(p.x - 1.6, p.y - 1.6, 3.2, 3.2, 'FD');
    pdf.setTextColor(...INK);
    pdf.text(n.kind === 'load' ? n.id : `${n.id} ${n.name}`, p.x + 2, p.y + 0.8);
  }
  for (const l of labels) {
    const w = pdf.getTextWidth(l.text);
    pdf.setFillColor(255, 255, 255);
    pdf.rect(l.x - w / 2 - 0.5, l.y - 2, w + 1, 2.5, 'F');
    pdf.setTextColor(...INK);
    pdf.text(l.text, l.x - w / 2, l.y);
  }

  // Scale bar and the note, under the drawing.
  const barM = scaleBarM(s);
  const by = CONTENT.y + CONTENT.h - 12;
  pdf.setDrawColor(...INK);
  pdf.setLineWidth(0.5);
  pdf.line(CONTENT.x, by, CONTENT.x + barM * s, by);
  pdf.line(CONTENT.x, by - 1.2, CONTENT.x, by + 1.2);
  pdf.line(CONTENT.x + barM * s, by - 1.2, CONTENT.x + barM * s, by + 1.2);
  pdf.setFontSize(7);
  pdf.setTextColor(...INK);
  pdf.text(`${barM} m  (1 : ${Math.round(1000 / s)})`, CONTENT.x + barM * s + 3, by + 1);
  pdf.setFontSize(6.5);
  pdf.setTextColor(...GREY);
  const note = [
    NOTE,
    doc.plan
      ? picture
        ? `Plan picture ${fmt(widthM, 1)} m across, from the project file.`
        : 'The plan picture is an SVG drawing, which this pack does not reproduce here; make the pack in the editor to include it.'
      : 'The project has no plan picture; the elements are shown where they stand.',
  ].join(' ');
  pdf.text(pdf.splitTextToSize(note, CONTENT.w) as string[], CONTENT.x, by + 5);
}
