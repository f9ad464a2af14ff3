import type { ScheduleView, ViewRow } from '../schedule/scheduleView.js';
import { escapeControls, escapeStrings } from './terminalText.js';

/** A row's cells with every text escaped; the same object when none needs it. */
function escapedCells(cells: Record<string, string>): Record<string, string> {
  let out: Record<string, string> | null = null;
  for (const id in cells) {
    const text = cells[id]!;
    const safe = escapeControls(text);
    if (safe !== text) (out ??= { ...cells })[id] = safe;
  }
  return out ?? cells;
}

/**
 * The schedule view with every text the table and the CSV print escaped — headings, cells, notes — so
 * that a table measures what it prints. The data behind a row (its fitting and the numbers for
 * sorting) is passed on as it is, unread: escaping every string of every fitting as well (escapeStrings
 * over the whole view) cost seconds at 10,000 fittings for nothing that is printed.
 */
export function escapedView(view: ScheduleView): ScheduleView {
  return {
    ...view,
    columns: view.columns.map((c) => ({ ...c, heading: escapeControls(c.heading) })),
    rows: view.rows.map((r): ViewRow => ({
      get fitting() {
        return r.fitting;
      },
      cells: escapedCells(r.cells),
      values: r.values,
    })),
    notes: escapeStrings(view.notes),
  };
}
