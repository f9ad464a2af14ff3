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

/** The analyses of the last documents asked for, the least recently used first (a Map keeps its order). */
const kept = new Map<Project, Analysis>();

/** The analysis kept for `project`, now the most recently used, or undefined. */
export function recentAnalysis(project: Project): Analysis | undefined {
  const found = kept.get(project);
  if (found) keepAnalysis(project, found);
  return found;
}

/** Keeps `analysis` for `project`, letting the least recently used go beyond RECENT_ANALYSES. */
export function keepAnalysis(project: Project, analysis: Analysis): void {
  kept.delete(project);
  kept.set(project, analysis);
  if (kept.size > RECENT_ANALYSES) kept.delete(kept.keys().next().value!);
}
