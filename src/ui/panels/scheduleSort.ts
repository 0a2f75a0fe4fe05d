/** Sorting and status filtering of schedule rows. */
import type { Status } from '../../solver/results.ts';
import type { Row } from '../../export/schedules.ts';

const STATUS_RANK: Record<Status, number> = { within: 0, close: 1, over: 2 };

export type SortOrder = { column: string; descending: boolean } | null;

/** Sorted copy; empty cells always go last, whichever the direction. */
export function sortRows(rows: Row[], order: SortOrder): Row[] {
  if (!order) return rows;
  const sign = order.descending ? -1 : 1;
  const key = (r: Row) =>
    order.column === 'status'
      ? r.status
        ? STATUS_RANK[r.status]
        : null
      : (r.cells[order.column]?.sort ?? null);
  return rows.slice().sort((a, b) => {
    const x = key(a);
    const y = key(b);
    if (x === null && y === null) return 0;
    if (x === null) return 1;
    if (y === null) return -1;
    if (typeof x === 'number' && typeof y === 'number') return sign * (x - y);
    return sign * String(x).localeCompare(String(y), undefined, { numeric: true });
  });
}

export type StatusFilter = Record<Status | 'none', boolean>;
export const ALL_STATUSES: StatusFilter = { within: true, close: true, over: true, none: true };

export function filterRows(rows: Row[], filter: StatusFilter): Row[] {
  return rows.filter((r) => filter[r.status ?? 'none']);
}
