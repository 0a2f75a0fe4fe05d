/**
 * Helpers for the PDF diagram tests: a jsPDF page with the DejaVu font, a spy that records every
 * line, rectangle, circle and piece of text drawn with its extent on the page, and the page text
 * as poppler's pdftotext reads it.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { jsPDF, type TextOptionsLight } from 'jspdf';
import type { Box } from '../../../src/export/pdf/diagram.ts';

/** The font family the helpers register. */
export const FONT = 'DejaVu';
/** Millimetres per point. */
export const PT_MM = 25.4 / 72;
const FONT_FILES = {
  normal: readFileSync('public/fonts/DejaVuSansCondensed.ttf').toString('base64'),
  bold: readFileSync('public/fonts/DejaVuSansCondensed-Bold.ttf').toString('base64'),
};

/** An A3 landscape jsPDF document in millimetres with FONT registered. */
export function newPdf(): jsPDF {
  const pdf = new jsPDF({ orientation: 'landscape', unit: 'mm', format: 'a3' });
  for (const style of ['normal', 'bold'] as const) {
    pdf.addFileToVFS(`${FONT}-${style}.ttf`, FONT_FILES[style]);
    pdf.addFont(`${FONT}-${style}.ttf`, FONT, style);
  }
  return pdf;
}

/** One drawing call as the spy saw it. */
export interface Mark {
  kind: 'line' | 'rect' | 'circle' | 'text';
  box: Box;
  /** For lines: the end points and the stroke in force. */
  ends?: [number, number, number, number];
  colour?: string;
  width?: number;
  dash?: number[];
  text?: string;
  /** For text: bold or not. */
  bold?: boolean;
  /** For text: the point and baseline option it was drawn with. */
  at?: [number, number];
  baseline?: string;
}

/** Wraps the drawing primitives of `pdf` so every call is recorded with its extent on the page. */
export function record(pdf: jsPDF): Mark[] {
  const marks: Mark[] = [];
  let dash: number[] = [];
  const setDash = pdf.setLineDashPattern.bind(pdf);
  pdf.setLineDashPattern = (d: number[], phase: number) => {
    dash = [...d];
    return setDash(d, phase);
  };
  const line = pdf.line.bind(pdf);
  pdf.line = (x1: number, y1: number, x2: number, y2: number, style?: string | null) => {
    marks.push({
      kind: 'line',
      box: { x: Math.min(x1, x2), y: Math.min(y1, y2), w: Math.abs(x2 - x1), h: Math.abs(y2 - y1) },
      ends: [x1, y1, x2, y2],
      colour: pdf.getDrawColor(),
      width: pdf.getLineWidth(),
      dash,
    });
    return line(x1, y1, x2, y2, style);
  };
  const rect = pdf.rect.bind(pdf);
  pdf.rect = (x: number, y: number, w: number, h: number, style?: string | null) => {
    marks.push({ kind: 'rect', box: { x, y, w, h } });
    return rect(x, y, w, h, style);
  };
  const circle = pdf.circle.bind(pdf);
  pdf.circle = (x: number, y: number, r: number, style?: string | null) => {
    marks.push({ kind: 'circle', box: { x: x - r, y: y - r, w: 2 * r, h: 2 * r } });
    return circle(x, y, r, style);
  };
  const text = pdf.text.bind(pdf) as (t: string, x: number, y: number, o?: TextOptionsLight) => jsPDF;
  (pdf as { text: unknown }).text = (t: string, x: number, y: number, o?: TextOptionsLight) => {
    const h = pdf.getFontSize() * PT_MM;
    const w = pdf.getTextWidth(t);
    const top = o?.baseline === 'top' ? y : o?.baseline === 'middle' ? y - h / 2 : y - 0.8 * h;
    const left = o?.align === 'center' ? x - w / 2 : o?.align === 'right' ? x - w : x;
    const bold = pdf.getFont().fontStyle === 'bold';
    marks.push({
      kind: 'text',
      box: { x: left, y: top, w, h },
      text: t,
      bold,
      at: [x, y],
      baseline: o?.baseline,
    });
    return text(t, x, y, o);
  };
  return marks;
}

/** Whether `b` lies inside `box`, give or take `tol` millimetres. */
export function inside(b: Box, box: Box, tol: number): boolean {
  return (
    b.x >= box.x - tol &&
    b.y >= box.y - tol &&
    b.x + b.w <= box.x + box.w + tol &&
    b.y + b.h <= box.y + box.h + tol
  );
}

/** The text of a PDF's pages as poppler's pdftotext -layout reads them. */
export function pdfPages(bytes: Uint8Array): string[] {
  const dir = mkdtempSync(join(tmpdir(), 'dropline-diagram-'));
  try {
    const file = join(dir, 'diagram.pdf');
    writeFileSync(file, bytes);
    return execFileSync('pdftotext', ['-layout', '-enc', 'UTF-8', file, '-'], {
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'ignore'],
      maxBuffer: 64 * 1024 * 1024,
    }).split('\f');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** The text of the page(s) of `pdf` as pdftotext reads them. */
export function pageText(pdf: jsPDF): string {
  return pdfPages(new Uint8Array(pdf.output('arraybuffer'))).join('\f');
}

/** Whether two boxes share more than a hair of area (text boxes touch at their edges). */
export function clash(a: Box, b: Box): boolean {
  const e = 0.05;
  return (
    a.x + e < b.x + b.w - e && b.x + e < a.x + a.w - e && a.y + e < b.y + b.h - e && b.y + e < a.y + a.h - e
  );
}
