import { cautionLines } from './cautions.js';
import { TABLE_COLUMNS } from './scheduleColumns.js';
import { pickColumns, type ScheduleView } from './scheduleView.js';
import { noteAfterHeading } from './scheduleNotes.js';

const SEVERITY_MARK = { error: '!! NOT ADEQUATE', warning: '!', info: '·' } as const;

/** The schedule as a readable fixed-width table for a terminal: the view's compact columns, notes once, cautions. */
export function scheduleTable(
  view: ScheduleView,
  project: string,
  positions: readonly string[] = ['chainage'],
): string {
  // The position along the run in the project's style (chainage, stations or both) where the chainage stands.
  const ids = TABLE_COLUMNS.flatMap((id) => (id === 'chainage' ? positions : [id]));
  const columns = pickColumns(view, ids);
  const head = columns.map((c) => c.heading);
  const rows = view.rows.map((r) => columns.map((c) => r.cells[c.id]!));
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const numeric = columns.map((c) => c.kind !== 'text');
  const line = (cells: string[]) =>
    cells
      .map((c, i) => (numeric[i] ? c.padStart(widths[i]!) : c.padEnd(widths[i]!)))
      .join('  ')
      .trimEnd();
  const out = [
    `Fitting schedule — ${project}`,
    '',
    line(head),
    line(widths.map((w) => '-'.repeat(w))),
    ...rows.map(line),
  ];
  if (view.notes.length) {
    out.push('', 'Notes');
    for (const n of view.notes)
      out.push(
        `  ${n.number}. ${SEVERITY_MARK[n.severity]} ${noteAfterHeading(n)}${n.marks.length ? ` (${n.marks.join(', ')})` : ''}`,
      );
  }
  out.push('', ...cautionLines());
  return out.join('\n') + '\n';
}
