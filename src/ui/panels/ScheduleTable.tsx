import { useMemo, useState } from 'react';
import type { Id } from '../../model/types.ts';
import type { Schedule } from '../../export/schedules.ts';
import { filterRows, sortRows, type SortOrder, type StatusFilter } from './scheduleSort.ts';
import { StatusBadge } from './StatusBadge.tsx';
import { statusLook as lookOf } from '../../export/statusLook.ts';

interface Props {
  schedule: Schedule;
  filter: StatusFilter;
  selection: Id[];
  onPick: (id: Id) => void;
  testId: string;
}

/** A sortable table; a click (or Enter) on a row selects the element and shows it on the diagram. */
export function ScheduleTable({ schedule, filter, selection, onPick, testId }: Props) {
  const [order, setOrder] = useState<SortOrder>(null);
  const rows = useMemo(
    () => sortRows(filterRows(schedule.rows, filter), order),
    [schedule.rows, filter, order],
  );
  const toggle = (column: string) =>
    setOrder((o) =>
      o?.column !== column
        ? { column, descending: false }
        : o.descending
          ? null
          : { column, descending: true },
    );
  const ariaSort = (column: string) =>
    order?.column !== column ? 'none' : order.descending ? 'descending' : 'ascending';

  return (
    <table className="dl-table" data-testid={testId}>
      <thead>
        <tr>
          <th aria-sort={ariaSort('status')}>
            <button type="button" onClick={() => toggle('status')} title="Status against the limit">
              Status
            </button>
          </th>
          {schedule.columns.map((c) => (
            <th key={c.id} aria-sort={ariaSort(c.id)} className={c.numeric ? 'dl-num' : undefined}>
              <button type="button" onClick={() => toggle(c.id)} title={c.title}>
                {c.label}
                {order?.column === c.id ? (order.descending ? ' ▾' : ' ▴') : ''}
              </button>
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.length === 0 && (
          <tr>
            <td colSpan={schedule.columns.length + 1} className="dl-empty">
              No rows match the status filter.
            </td>
          </tr>
        )}
        {rows.map((r) => (
          <tr
            key={r.id}
            data-row={r.id}
            tabIndex={0}
            aria-selected={selection.includes(r.id)}
            onClick={() => onPick(r.id)}
            onKeyDown={(e) => {
              if (e.key === 'Enter') onPick(r.id);
            }}
            style={{ boxShadow: `inset 3px 0 0 ${lookOf(r.status).colour}` }}
          >
            <td>
              <StatusBadge status={r.status} />
            </td>
            {schedule.columns.map((c) => (
              <td key={c.id} className={c.numeric ? 'dl-num' : undefined}>
                {r.cells[c.id]?.text ?? '–'}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
