import type { Project } from '@mainbrace/solver';

/** An empty route that keeps the current cases, soils, design settings and units. */
export function newProject(from: Project): Project {
  return { ...from, name: 'Untitled main', nodes: [], pipes: [] };
}
