import type { Project } from './projectSchema.js';
import { nodeCover, nodeOutsideDiameters } from './groundLevel.js';

// The route rules both checks of a document share: the schema's (crossChecks.ts, which words every
// refusal) and the check by hand that opens a valid document without the schema library (quickParse.ts).

/** Minimum distance between a pipe's two ends, m: below this the pipe has no direction. */
export const MIN_PIPE_LENGTH = 0.001;

export type Add = (path: (string | number)[], message: string) => void;

/** Two pipes leaving a node closer than this in direction lie on top of each other, degrees. */
export const OVERLAP_ANGLE = 0.5;

/** A node with a ground level must have its pipe below it: the derived cover is not negative. */
export function pipeBelowGround(p: Project, add: Add) {
  if (!p.nodes.some((n) => n.groundLevel !== undefined)) return;
  const od = nodeOutsideDiameters(p);
  p.nodes.forEach((n, i) => {
    if (n.groundLevel === undefined) return;
    const d = od.get(n.id) ?? 0;
    const cover = nodeCover(n, d);
    if (cover < 0)
      add(
        ['nodes', i, 'groundLevel'],
        `must be at or above the top of the pipe (elevation ${n.elevation} m + OD/2 ${d / 2} m): the pipe would stand ${Math.round(-cover * 1000) / 1000} m out of the ground`,
      );
  });
}
