import type { Project } from './projectSchema.js';

/** A load case as people read it: its label, else its id. */
export const caseLabel = (project: Project, id: string): string =>
  project.loadCases.find((c) => c.id === id)?.label ?? id;
