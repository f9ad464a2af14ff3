import { scheduleView, type Analysis, type CodeMeanings, type ScheduleView, type UnitSystem } from '@mainbrace/solver';
import { importOrReload } from '../chrome/loadChunk.js';

let meanings: CodeMeanings | null = null;

/**
 * Loads the findings' meanings, which word a schedule note whose fittings' sentences differ. They are
 * not in the first load (docs/performance.md); the app starts loading them before anything else and
 * waits for them beside the kept project and the demo, before its first render.
 */
export const loadScheduleWords = (): Promise<void> =>
  importOrReload(() => import('@mainbrace/solver/meanings')).then((m) => {
    meanings = m.CODE_MEANINGS;
  });

/** The schedule's view (solver's scheduleView, memoised) once loadScheduleWords has resolved. */
export function scheduleViewOf(analysis: Analysis, units: UnitSystem): ScheduleView {
  if (!meanings) throw new Error('scheduleViewOf: the findings’ meanings are not loaded yet');
  return scheduleView(analysis, units, meanings);
}
