import { ANGLE_NOISE, angleBetween, horizontal, negate, slopeAngle, type Vec3 } from '../geometry/vector.js';
import type { Leg } from './legs.js';
import type { ProjectNode } from '../model/projectSchema.js';
import { VALUES } from '../provenance/registerValues.js';

/** What stands at a node, as the schedule names it; plus the two kinds the schedule leaves out. */
export type FittingKind =
  | 'bend'
  | 'reducer'
  | 'reducing-bend'
  | 'tee'
  | 'wye'
  | 'cross'
  | 'dead-end'
  | 'valve'
  | 'tie-in'
  | 'straight'
  | 'none';

/** Two pipes deflecting less than this are a straight-through joint (project-format.md), degrees. */
export const STRAIGHT_TOLERANCE = VALUES['fitting.straight-tolerance'];
/** A run through a tee or cross may deviate this much from straight and still be a run, degrees. */
export const RUN_TOLERANCE = VALUES['fitting.run-tolerance'];
/** A branch within this of square to its run is a tee; otherwise a wye, degrees. */
export const TEE_TOLERANCE = VALUES['fitting.tee-tolerance'];
/** Standard bend angles, degrees (register: fitting.standard-bends, not verified). */
const STANDARD_BENDS = VALUES['fitting.standard-bends'];

/** The standard bend closest to a deflection, degrees; 0 where it is under half the smallest (a joint's). */
export function nearestStandardBend(angle: number): number {
  let nearest = 0;
  for (const b of STANDARD_BENDS) if (Math.abs(b - angle) < Math.abs(nearest - angle)) nearest = b;
  return nearest;
}

/**
 * The standard bend a deflection is made with, degrees: the nearest one when the joints take up the rest
 * (the straight-joint tolerance; a 90° bend on a grade change turns 89.97°), else null.
 */
export function standardBendFor(angle: number): number | null {
  const nearest = nearestStandardBend(angle);
  return nearest > 0 && Math.abs(nearest - angle) <= STRAIGHT_TOLERANCE ? nearest : null;
}

/** Relative difference below which two areas count as equal. */
const AREA_TOLERANCE = 1e-6;

export interface FittingGeometry {
  kind: FittingKind;
  /** degrees, angle between the flow directions of the two pipes (two-pipe nodes), else null */
  deflection: number | null;
  /** degrees, change of plan bearing (two-pipe nodes), else null */
  horizontalDeflection: number | null;
  /** degrees, change of slope, positive where the line turns upward (two-pipe nodes), else null */
  verticalDeflection: number | null;
  /** degrees, angle between the branch and the run for tees and wyes, else null */
  branchAngle: number | null;
  /** index into the node's legs of the branch (tee, wye), else null */
  branchLeg: number | null;
}

const sameArea = (a: number, b: number) => Math.abs(a - b) <= AREA_TOLERANCE * Math.max(a, b);

/** Plan angle between two directions' horizontal projections, degrees; 0 if either is vertical. */
function planAngle(a: Vec3, b: Vec3): number {
  return angleBetween(horizontal(a), horizontal(b));
}

function twoPipeGeometry(node: ProjectNode, a: Leg, b: Leg): FittingGeometry {
  // Flow-wise: in along −n_a, out along n_b.
  const inward = negate(a.direction);
  const deflection = angleBetween(inward, b.direction);
  const horizontalDeflection = planAngle(inward, b.direction);
  const verticalDeflection = slopeAngle(b.direction) - slopeAngle(inward);
  const equal = sameArea(a.thrustArea, b.thrustArea) && sameArea(a.flowArea, b.flowArea);
  let kind: FittingKind;
  if (node.valve) kind = 'valve';
  else if (deflection < STRAIGHT_TOLERANCE - ANGLE_NOISE) kind = equal ? 'straight' : 'reducer';
  else kind = equal ? 'bend' : 'reducing-bend';
  return { kind, deflection, horizontalDeflection, verticalDeflection, branchAngle: null, branchLeg: null };
}

/**
 * Degrees the run through a three-pipe junction (the two legs other than the branch) turns from
 * straight; null for any other fitting.
 */
export function runTurn(legs: readonly Leg[], g: FittingGeometry): number | null {
  if (g.branchLeg === null || legs.length !== 3) return null;
  const [a, b] = [0, 1, 2].filter((i) => i !== g.branchLeg) as [number, number];
  return 180 - angleBetween(legs[a]!.direction, legs[b]!.direction);
}

function threePipeGeometry(legs: readonly Leg[]): FittingGeometry {
  // The run is the most nearly opposite pair; the third leg is the branch.
  let best = { i: 0, j: 1, angle: -1 };
  for (let i = 0; i < 3; i++) {
    for (let j = i + 1; j < 3; j++) {
      const angle = angleBetween(legs[i]!.direction, legs[j]!.direction);
      if (angle > best.angle) best = { i, j, angle };
    }
  }
  const branchLeg = 3 - best.i - best.j;
  const branch = legs[branchLeg]!.direction;
  const runAxis = legs[best.i]!.direction;
  // Angle of the branch to the run line, folded into [0, 90].
  const raw = angleBetween(branch, runAxis);
  const branchAngle = Math.min(raw, 180 - raw);
  // Named by its branch alone: a run that turns is a finding of its own (fitting.bent-run), built as
  // this tee or wye and a bend, so the plan's mark shows the fitting to order.
  const kind: FittingKind = Math.abs(branchAngle - 90) <= TEE_TOLERANCE ? 'tee' : 'wye';
  return { kind, deflection: null, horizontalDeflection: null, verticalDeflection: null, branchAngle, branchLeg };
}

const geometryOf = (kind: FittingKind): FittingGeometry => ({
  kind,
  deflection: null,
  horizontalDeflection: null,
  verticalDeflection: null,
  branchAngle: null,
  branchLeg: null,
});

/** Names the fitting at a node from the pipes that meet there and the node's end and valve flags. */
export function fittingGeometry(node: ProjectNode, legs: readonly Leg[]): FittingGeometry {
  switch (legs.length) {
    case 0:
      return geometryOf('none');
    case 1:
      return geometryOf(node.end === 'tie-in' ? 'tie-in' : 'dead-end');
    case 2:
      return twoPipeGeometry(node, legs[0]!, legs[1]!);
    case 3:
      return threePipeGeometry(legs);
    default:
      return geometryOf('cross');
  }
}

/** True for the kinds the schedule lists (project-format.md: all but straight joints and tie-ins). */
export const needsRestraint = (kind: FittingKind): boolean =>
  kind !== 'straight' && kind !== 'tie-in' && kind !== 'none';
