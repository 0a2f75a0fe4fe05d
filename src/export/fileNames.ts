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

/** "PBJ-E-001-rev-B-tender-pack.pdf" from the project's reference (or title) and revision. */
export function tenderPackFileName(doc: ProjectDocument): string {
  const rev = doc.details.revision ? `-rev-${doc.details.revision.replace(/[^\w.-]+/g, '-')}` : '';
  return `${projectBase(doc)}${rev}-tender-pack.pdf`;
}
