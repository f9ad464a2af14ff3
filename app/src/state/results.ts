import { analyse, scheduleView, type Analysis, type Project, type UnitSystem } from '@mainbrace/solver';

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
 * The results of a document, derived from its result inputs only, incrementally from the last ones: renaming the project (every
 * keystroke of it) or switching units returns the same analysis object, so nothing downstream is
 * recomputed or redrawn. The analysis's own `project` is the document as of the last edit that could
 * change a result: equal to the current one in every result input, perhaps not in its name.
 */
export function resultsOf(project: Project): Analysis {
  if (last && sameResultInputs(last.project, project)) return last;
  // Given the analysis before the edit, the solver computes only what the edit can change (a pressure
  // rescales every fitting's sums; a moved node recomputes the fittings next to it).
  last = analyse(project, last);
  return last;
}

/** Lets the browser run its other tasks (input, paint) before the next step. */
const nextTask = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

/**
 * Works out a document's results before it is shown, one step per task: the analysis, then the
 * schedule's cells (both memoised), so that the document's first render only reads them. Opening a
 * 10,000-node route otherwise ran parse, analysis, schedule and drawing as one task of seconds.
 */
export async function prepareResults(project: Project, units: UnitSystem): Promise<void> {
  await nextTask();
  const a = resultsOf(project);
  await nextTask();
  scheduleView(a, units);
  await nextTask();
}
