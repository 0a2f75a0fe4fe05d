/** Names for the files the exports write, from the project's reference (or title) and revision. */
import type { ProjectDocument } from '../model/types.ts';

/** Text safe in a file name: runs of anything else become one hyphen. */
function safe(text: string): string {
  return text.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '');
}

function projectBase(doc: ProjectDocument): string {
  return safe(doc.details.reference || doc.details.title || 'project') || 'project';
}

/** A file name for a schedule of this project, e.g. "PBJ-E-001-cable-schedule.csv". */
export function scheduleFileName(doc: ProjectDocument, title: string): string {
  const what = title.toLowerCase().replace(/[^\w]+/g, '-');
  return `${projectBase(doc)}-${what}.csv`;
}

/** "-rev-B" from the project's revision, or nothing when it has none. */
function revisionPart(doc: ProjectDocument): string {
  return doc.details.revision ? `-rev-${doc.details.revision.replace(/[^\w.-]+/g, '-')}` : '';
}

/** "PBJ-E-001-rev-B-tender-pack.pdf" from the project's reference (or title) and revision. */
export function tenderPackFileName(doc: ProjectDocument): string {
  return `${projectBase(doc)}${revisionPart(doc)}-tender-pack.pdf`;
}

/** "PBJ-E-001-rev-B-single-line.svg": the drawing's file name, from the reference (or title) and revision. */
export function drawingFileName(doc: ProjectDocument): string {
  return `${projectBase(doc)}${revisionPart(doc)}-single-line.svg`;
}
