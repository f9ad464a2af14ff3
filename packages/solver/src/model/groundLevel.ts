import type { Project, ProjectNode } from './projectSchema.js';

/**
 * Ground, cover and pipe level at a node (project-format.md, "Ground levels"). A node without a
 * ground level keeps the cover it states and the ground follows from it. A node with a ground level
 * holds its pipe centreline (`elevation`) fixed: the cover is what lies between, ground − top of pipe,
 * so that a survey's ground stays where it was measured whatever pipe is chosen later.
 */

/** m, the largest outside diameter meeting at each node (0 for a node no pipe reaches). */
export function nodeOutsideDiameters(project: Project): Map<string, number> {
  const od = new Map<string, number>();
  for (const n of project.nodes) od.set(n.id, 0);
  // both ends by hand: a two-element list per pipe was garbage on every analysis
  for (const p of project.pipes) {
    od.set(p.from, Math.max(od.get(p.from) ?? 0, p.outsideDiameter));
    od.set(p.to, Math.max(od.get(p.to) ?? 0, p.outsideDiameter));
  }
  return od;
}

/** m, ground surface to top of pipe: from the ground level where the node has one, else as stated. */
export const nodeCover = (node: ProjectNode, od: number): number =>
  node.groundLevel === undefined ? node.cover : node.groundLevel - node.elevation - od / 2;

/** m, ground surface elevation: as surveyed where the node has one, else pipe centreline + OD/2 + cover. */
export const nodeGround = (node: ProjectNode, od: number): number =>
  node.groundLevel ?? node.elevation + od / 2 + node.cover;

/** m, the pipe centreline that gives `cover` below `ground`: ground − cover − OD/2. */
export const pipeLevelFor = (ground: number, cover: number, od: number): number => ground - cover - od / 2;

/** m, the cover over a pipe centreline at `pipe` below `ground`: ground − pipe − OD/2. */
export const coverFor = (ground: number, pipe: number, od: number): number => ground - pipe - od / 2;
