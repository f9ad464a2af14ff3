import type { Project } from '../model/projectSchema.js';
import type { Analysis } from './analyse.js';

/**
 * How many documents' analyses `analyse` keeps: the one shown, the one a slider gesture started from,
 * and the few an undo or a redo steps back to. A memo keyed weakly by the document kept the analysis of
 * every document the undo history holds — about 1 MB per edit at 1,000 fittings, 200 edits deep — and
 * every collection the browser made marked all of it. An older document's analysis is made again from
 * the current one if it comes back (`analyseNext`: the same numbers).
 */
export const RECENT_ANALYSES = 8;

/** The analyses of the last `RECENT_ANALYSES` documents asked for, the least recently used going first. */
export class RecentAnalyses {
  readonly #kept = new Map<Project, Analysis>();

  get(project: Project): Analysis | undefined {
    const found = this.#kept.get(project);
    if (found) {
      // most recently used last, so that the oldest entry is the first the map iterates
      this.#kept.delete(project);
      this.#kept.set(project, found);
    }
    return found;
  }

  set(project: Project, analysis: Analysis): void {
    this.#kept.delete(project);
    this.#kept.set(project, analysis);
    if (this.#kept.size > RECENT_ANALYSES) this.#kept.delete(this.#kept.keys().next().value!);
  }
}
