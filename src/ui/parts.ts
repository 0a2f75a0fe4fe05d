/** What the tray offers, and how a part becomes a new element with a fresh id and name. */
import type { LoadKind, NodeElement, Position, ProjectDocument } from '../model/types.ts';
import { nextIdFor } from '../model/ids.ts';
import { newBoard, newJunction, newLoad, newSupply } from '../model/defaults.ts';
import { loadTitle } from './canvas/symbols.tsx';

export type PartKind = 'supply' | 'board' | 'junction' | `load:${LoadKind}`;

export const PART_MIME = 'application/x-dropline-part';

export interface PartInfo {
  part: PartKind;
  title: string;
  group: 'Sources and boards' | 'Loads';
  loadKind?: LoadKind;
}

const LOADS: LoadKind[] = [
  'lighting',
  'sockets',
  'heating',
  'cooking',
  'waterHeating',
  'motor',
  'evCharging',
  'hvac',
  'other',
];

export const PARTS: PartInfo[] = [
  { part: 'supply', title: 'Supply', group: 'Sources and boards' },
  { part: 'board', title: 'Board', group: 'Sources and boards' },
  { part: 'junction', title: 'Junction', group: 'Sources and boards' },
  ...LOADS.map((k): PartInfo => ({
    part: `load:${k}`,
    title: cap(loadTitle(k)),
    group: 'Loads',
    loadKind: k,
  })),
];

function cap(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

export function isPartKind(value: string): value is PartKind {
  return PARTS.some((p) => p.part === value);
}

/** A new element for a part, numbered after the ones already in the document. */
export function buildNode(doc: ProjectDocument, part: PartKind, position: Position): NodeElement {
  if (part === 'supply') {
    const id = nextIdFor(doc, 'supply');
    return newSupply(id, position, { name: id === 'S1' ? 'Supply' : `Supply ${id.slice(1)}` });
  }
  if (part === 'board') {
    const id = nextIdFor(doc, 'board');
    return newBoard(id, position, { name: id });
  }
  if (part === 'junction') return newJunction(nextIdFor(doc, 'junction'), position);
  const kind = part.slice('load:'.length) as LoadKind;
  const id = nextIdFor(doc, 'load');
  return newLoad(id, position, kind, { name: `${cap(loadTitle(kind))} ${id.slice(1)}` });
}
