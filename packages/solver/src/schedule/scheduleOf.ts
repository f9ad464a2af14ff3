import type { Analysis } from '../analysis/analyse.js';
import { diagnosticText } from '../diagnostics/wording.js';
import { scheduleRowAt, siWords, type Schedule } from './scheduleRows.js';

const schedules = new WeakMap<Analysis, Schedule>();

/**
 * The schedule of project-format.md from an analysis: one row per fitting that needs restraint, in
 * the analysis' run-and-chainage order. Memoised by the analysis, as `analyse` is by the document: the
 * table, the print and the exports share one schedule of one document. Callers must not change it.
 * The rows, and each row's words, are built when first read.
 */
export function scheduleOf(a: Analysis): Schedule {
  let s = schedules.get(a);
  if (!s) {
    const words = siWords(a, diagnosticText);
    s = {
      project: a.project.name,
      units: 'SI',
      warnings: a.diagnostics.map(words),
      diagnostics: a.diagnostics,
      // Built when first read, and kept.
      get fittings() {
        const rows = a.fittings.map((_, i) => scheduleRowAt(a, i, diagnosticText));
        Object.defineProperty(this, 'fittings', { value: rows, enumerable: true });
        return rows;
      },
    };
    schedules.set(a, s);
  }
  return s;
}
