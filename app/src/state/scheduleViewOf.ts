import { scheduleView, type Analysis, type ScheduleView, type UnitSystem, type Wording } from '@mainbrace/solver';
import { importOrReload } from '../chrome/loadChunk.js';

let wording: Wording | null = null;

/**
 * Loads the findings' words: each finding's sentence, and the meanings that word a schedule note whose
 * fittings' sentences differ. They are not in the first load (docs/performance.md); the app starts
 * loading them before anything else and waits for them beside the kept project and the demo, before its
 * first render.
 */
export const loadScheduleWords = (): Promise<void> =>
  importOrReload(() => import('@mainbrace/solver/meanings')).then((m) => {
    wording = m.WORDING;
  });

/** The findings' words, once loadScheduleWords has resolved. */
export function loadedWording(): Wording {
  if (!wording) throw new Error('the findings’ words are not loaded yet');
  return wording;
}

/** The schedule's view (solver's scheduleView, memoised) once loadScheduleWords has resolved. */
export function scheduleViewOf(analysis: Analysis, units: UnitSystem): ScheduleView {
  return scheduleView(analysis, units, loadedWording());
}
