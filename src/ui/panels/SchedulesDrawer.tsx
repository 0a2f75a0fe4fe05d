import { useMemo, useState } from 'react';
import { useEditor } from '../../store/editorStore.ts';
import { SCHEDULE_SHEETS, type ScheduleSheet as Sheet } from '../../export/schedules.ts';
import { ALL_STATUSES, type StatusFilter } from './scheduleSort.ts';
import { ScheduleTable } from './ScheduleTable.tsx';
import { statusLook as lookOf } from '../../export/statusLook.ts';
import { scheduleCsv, scheduleFileName } from '../../export/scheduleCsv.ts';
import { download } from '../files/fileActions.ts';
import './panels.css';
import './tables.css';

const SHEETS = (['cables', 'loads', 'boards', 'tests'] as const).map((id) => ({
  id,
  label: SCHEDULE_SHEETS[id].title,
}));
const FILTER_KEYS = ['within', 'close', 'over', 'none'] as const;

/** The schedules drawer: cables, loads and boards with the solver's figures, sortable and filterable. */
export function SchedulesDrawer() {
  const open = useEditor((s) => s.view.drawer === 'schedules');
  const doc = useEditor((s) => s.doc);
  const results = useEditor((s) => s.results);
  const selection = useEditor((s) => s.selection);
  const reveal = useEditor((s) => s.reveal);
  const openDrawer = useEditor((s) => s.openDrawer);
  const notify = useEditor((s) => s.notify);
  const [sheet, setSheet] = useState<Sheet>('cables');
  const [filter, setFilter] = useState<StatusFilter>(ALL_STATUSES);
  const schedule = useMemo(
    () => (open ? SCHEDULE_SHEETS[sheet].build(doc, results) : null),
    [open, sheet, doc, results],
  );
  // Columns to be filled in on site print in the pack and the CSV; on screen they would be empty.
  const shown = useMemo(
    () => schedule && { ...schedule, columns: schedule.columns.filter((c) => !c.onSite) },
    [schedule],
  );
  if (!open || !schedule || !shown) return null;
  const note = SCHEDULE_SHEETS[sheet].note;

  const counts = FILTER_KEYS.map(
    (k) => [k, schedule.rows.filter((r) => (r.status ?? 'none') === k).length] as const,
  );
  return (
    <section className="dl-panel dl-drawer" data-testid="schedules-drawer" aria-label="Schedules">
      <header className="dl-drawer-head">
        <div className="dl-tabs" role="tablist" aria-label="Schedule">
          {SHEETS.map((s) => (
            <button
              key={s.id}
              type="button"
              role="tab"
              aria-selected={sheet === s.id}
              data-testid={`sheet-${s.id}`}
              onClick={() => setSheet(s.id)}
            >
              {s.label}
            </button>
          ))}
        </div>
        <fieldset className="dl-filter" aria-label="Show rows with status">
          {counts.map(([k, n]) => {
            const look = lookOf(k === 'none' ? null : k);
            return (
              <label key={k} style={{ color: look.colour }}>
                <input
                  type="checkbox"
                  checked={filter[k]}
                  data-testid={`filter-${k}`}
                  onChange={(e) => setFilter({ ...filter, [k]: e.target.checked })}
                />
                <span aria-hidden="true">{look.glyph}</span> {look.word} ({n})
              </label>
            );
          })}
        </fieldset>
        <button
          type="button"
          data-testid="schedule-csv"
          title="Download this schedule as a CSV file: every row, whatever the filter, with the project details, the data used and the cautions at the top."
          onClick={() => {
            const { title, statusLabel } = SCHEDULE_SHEETS[sheet];
            const name = scheduleFileName(doc, title);
            download(
              scheduleCsv(title, schedule, doc, results, statusLabel, SCHEDULE_SHEETS[sheet].note),
              name,
              'text/csv;charset=utf-8',
            );
            notify(`Downloaded ${name}.`);
          }}
        >
          Download CSV
        </button>
        <button type="button" onClick={() => openDrawer(null)} aria-label="Close the schedules">
          Close
        </button>
      </header>
      <div className="dl-drawer-body">
        {note && (
          <p className="dl-drawer-note" data-testid="schedule-note">
            {note}
          </p>
        )}
        <ScheduleTable
          key={sheet}
          schedule={shown}
          filter={filter}
          selection={selection}
          onPick={reveal}
          testId={`schedule-${sheet}`}
        />
      </div>
    </section>
  );
}
