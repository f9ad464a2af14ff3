import { dot, norm, type Vec3 } from '../geometry/vector.js';
import type { Leg } from '../network/legs.js';

/** The part of a thrust one restrained pipe holds by the friction along it, N. */
export interface AxialShare {
  leg: Leg;
  force: number;
}

/** Share of the thrust across the first pipe below which that pipe is taken to hold it all (noise). */
const ACROSS_NOISE = 0.01;

/** The leg whose direction from the node points most nearly against `v`. */
export function mostOpposed(legs: readonly Leg[], v: Vec3): Leg {
  let best = legs[0]!;
  for (const leg of legs) if (dot(leg.direction, v) < dot(best.direction, v)) best = leg;
  return best;
}

/**
 * How the thrust at a fitting that is not a bend is shared between restrained pipes, each pulled along
 * its own axis (a pipe's joint friction acts along it, not across it). The pipe most nearly against the
 * thrust takes it; where the thrust leans off that pipe (a cross with unequal branches, a junction whose
 * run turns), the part across it goes to the pipe most nearly against that part, and the two forces are
 * those whose sum along the two pipes is the thrust (least squares: a thrust out of their plane keeps
 * its in-plane part). Where no second pipe pulls against it, or the two cannot make the thrust with
 * tension in both, the first pipe is given the whole thrust as before.
 */
export function axialShares(legs: readonly Leg[], thrust: Vec3): AxialShare[] {
  const t = norm(thrust);
  const a = mostOpposed(legs, thrust);
  const pa: Vec3 = [-a.direction[0], -a.direction[1], -a.direction[2]];
  const along = dot(thrust, pa);
  const across: Vec3 = [thrust[0] - along * pa[0], thrust[1] - along * pa[1], thrust[2] - along * pa[2]];
  if (!(along > 0) || norm(across) <= ACROSS_NOISE * t) return [{ leg: a, force: t }];
  const b = mostOpposed(
    legs.filter((l) => l !== a),
    across,
  );
  if (!b || !(dot(b.direction, across) < 0)) return [{ leg: a, force: t }];
  const pb: Vec3 = [-b.direction[0], -b.direction[1], -b.direction[2]];
  const aa = dot(pa, pa);
  const bb = dot(pb, pb);
  const ab = dot(pa, pb);
  const ta = along;
  const tb = dot(thrust, pb);
  const det = aa * bb - ab * ab;
  if (!(det > 1e-9)) return [{ leg: a, force: t }];
  const fa = (bb * ta - ab * tb) / det;
  const fb = (aa * tb - ab * ta) / det;
  if (!(fa > 0) || !(fb > 0)) return [{ leg: a, force: t }];
  return [
    { leg: a, force: fa },
    { leg: b, force: fb },
  ];
}
