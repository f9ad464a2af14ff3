import { routeSummary } from './routeFigures.js';
import { analyse, analyseInSteps, type Analysis, type Project, type UnitSystem } from '@mainbrace/solver';
import { scheduleViewOf } from './scheduleViewOf.js';

/**
 * Fields of the document no result depends on: the file's identity, the project's name, the display
 * units and the drawing sheet (title block, how chainage is written). An edit of these alone keeps
 * the results as they were. Any other field, including one added later, counts as a result input.
 */
const NOT_RESULT_INPUTS: ReadonlySet<string> = new Set(['format', 'version', 'name', 'units', 'sheet']);

/** True when the two documents have the same result inputs (compared by identity, part by part). */
export function sameResultInputs(a: Project, b: Project): boolean {
  if (a === b) return true;
  const x = a as unknown as Record<string, unknown>;
  const y = b as unknown as Record<string, unknown>;
  for (const k in x) if (!NOT_RESULT_INPUTS.has(k) && x[k] !== y[k]) return false;
  for (const k in y) if (!NOT_RESULT_INPUTS.has(k) && !(k in x) && y[k] !== undefined) return false;
  return true;
}

let last: Analysis | null = null;

/**
 * The results of a document, derived from its result inputs only: renaming the project (every
 * keystroke of it) or switching units returns the same analysis object, so nothing downstream is
 * recomputed or redrawn. The analysis's own `project` is the document as of the last edit that could
 * change a result: equal to the current one in every result input, perhaps not in its name.
 */
export function resultsOf(project: Project): Analysis {
  if (last && sameResultInputs(last.project, project)) return last;
  // The solver's incremental path: from the analysis before, only what the edit changed is computed
  // (a pressure edit rescales every fitting's sums instead of walking the route again). It equals a
  // whole analysis (the solver's property test over random edit chains; results.test.ts here).
  last = analyse(project, last);
  return last;
}

/** Lets the browser run its other tasks (input, paint) before the next step. */
const nextTask = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

/** ms of work in one task before the browser gets the thread back (a long task is over 50 ms). */
const SLICE_MS = 40;

/**
 * Works out a document's results before it is shown, in tasks of about SLICE_MS: the analysis a step
 * at a time, then the schedule's view (both memoised), so that the document's first render only reads
 * them. Opening a 10,000-node route otherwise ran the analysis as one task of a third of a second.
 */
export async function prepareResults(project: Project, units: UnitSystem): Promise<void> {
  await nextTask();
  if (!(last && sameResultInputs(last.project, project))) {
    const steps = analyseInSteps(project);
    let start = performance.now();
    let step = steps.next();
    while (!step.done) {
      if (performance.now() - start > SLICE_MS) {
        await nextTask();
        start = performance.now();
      }
      step = steps.next();
    }
    last = step.value;
  }
  await nextTask();
  scheduleViewOf(last, units);
  await nextTask();
  routeSummary(last);
  await nextTask();
}
