import type { UnitSystem } from '../units/conversions.js';
import { SCHEDULE_COLUMNS, columnHeading, columnValue } from './scheduleColumns.js';
import type { Schedule } from './scheduleRows.js';

/**
 * RFC 4180 field: quoted when it holds a comma, quote or line break. Text that a spreadsheet would
 * run as a formula (= + - @ first) is prefixed with an apostrophe; numbers are left as they are.
 */
function csvField(text: string, isNumber: boolean): string {
  const safe = !isNumber && /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** The schedule as CSV, one row per fitting, display units in the header. */
export function scheduleCsv(s: Schedule, units: UnitSystem, caseLabel: (id: string) => string): string {
  const header = SCHEDULE_COLUMNS.map((c) => csvField(columnHeading(c, units), false)).join(',');
  const rows = s.fittings.map((f) =>
    SCHEDULE_COLUMNS.map((c) => csvField(columnValue(c, f, units, caseLabel), c.dimension !== undefined)).join(','),
  );
  return [header, ...rows].join('\r\n') + '\r\n';
}
