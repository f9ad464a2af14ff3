import { CAUTIONS } from './cautions.js';
import { isDimensionKind, type ColumnKind } from './columnUnits.js';
import type { ScheduleView } from './scheduleView.js';

/**
 * RFC 4180 field: quoted when it holds a comma, quote or line break. Text that a spreadsheet would
 * run as a formula (= + - @ first) is prefixed with an apostrophe; numbers are left as they are.
 */
export function csvField(text: string, isNumber: boolean): string {
  const safe = !isNumber && /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/**
 * The cautions every result carries, as CSV records after a blank one: a spreadsheet shows them under the
 * table, and a reader of the table stops at the blank record.
 */
export const cautionRecords = (): string[] => ['', ...CAUTIONS.map((c) => csvField(`Caution: ${c}`, false))];

/** The schedule as CSV: every column of the view, one row per fitting in crew order, units in the header. */
export function scheduleCsv(view: ScheduleView): string {
  const numeric = (kind: ColumnKind) => kind !== 'text' && !isDimensionKind(kind);
  const header = view.columns.map((c) => csvField(c.heading, false)).join(',');
  const rows = view.rows.map((r) => view.columns.map((c) => csvField(r.cells[c.id]!, numeric(c.kind))).join(','));
  return [header, ...rows, ...cautionRecords()].join('\r\n') + '\r\n';
}
