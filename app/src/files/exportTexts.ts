// The schedule and quantities as files: loaded when an export is chosen (or once the first screen is
// drawn), not with the first screen (docs/performance.md).
import {
  analyse,
  scheduleCsv,
  scheduleJson,
  scheduleOf,
  takeOff,
  takeOffCsv,
  takeOffRows,
  type Project,
  type UnitSystem,
} from '@mainbrace/solver';
import { scheduleViewOf } from '../state/scheduleViewOf.js';

/** The schedule JSON, the same content as the command line's `schedule --format json`. */
export const scheduleJsonText = (p: Project) => scheduleJson(scheduleOf(analyse(p)), true);

/** The schedule CSV in the chosen display units, the same as `schedule --format csv --units`. */
export const scheduleCsvText = (p: Project, units: UnitSystem): string =>
  scheduleCsv(scheduleViewOf(analyse(p), units));

/** The quantities take-off as CSV, the same lines as `mainbrace quantities --format csv`. */
export const quantitiesCsvText = (p: Project, units: UnitSystem): string =>
  takeOffCsv(takeOffRows(takeOff(scheduleOf(analyse(p)).fittings, p, units), units));
