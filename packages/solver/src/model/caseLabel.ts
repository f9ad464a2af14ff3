import type { LoadCase, Project } from './projectSchema.js';

/** A load case as people read it, and as no other case of the project may be named: its label, else its id. */
export const caseName = (c: Pick<LoadCase, 'id' | 'label'>): string => c.label ?? c.id;

/** The name of the project's case `id` (the id itself if there is no such case). */
export const caseLabel = (project: Project, id: string): string => {
  const c = project.loadCases.find((x) => x.id === id);
  return c ? caseName(c) : id;
};
