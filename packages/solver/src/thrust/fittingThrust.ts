import { horizontalNorm, norm, type Vec3 } from '../geometry/vector.js';
import type { Leg } from '../network/legs.js';
import type { FittingKind } from '../network/fittingKind.js';
import type { LoadCase, ProjectNode } from '../model/projectSchema.js';
import { pressureAt } from '../pressure/nodePressure.js';
import { momentumBalance, type ThrustParts } from './momentumBalance.js';

/** The thrust of one load case at one fitting. */
export interface CaseThrust extends ThrustParts {
  caseId: string;
  /** gauge pressure at the node, Pa */
  pressure: number;
}

/**
 * Which pipe ends carry pressure. A closed in-line valve is a dead end on its pressurised side
 * (project-format.md): the side with the larger thrust area, else the upstream side (the pipe the
 * flow arrives by), else the first pipe. Everything else is open on every leg.
 */
export function pressurisedLegs(kind: FittingKind, legs: readonly Leg[]): boolean[] | undefined {
  if (kind !== 'valve' || legs.length !== 2) return undefined;
  const [a, b] = [legs[0]!, legs[1]!];
  let first: boolean;
  if (Math.abs(a.thrustArea - b.thrustArea) > 1e-9 * Math.max(a.thrustArea, b.thrustArea)) {
    first = a.thrustArea > b.thrustArea;
  } else if (a.outflow !== b.outflow) {
    first = a.outflow < b.outflow;
  } else first = true;
  return [first, !first];
}

/**
 * Thrust at a fitting for every load case. A closed valve stops the flow, so its cases carry no
 * momentum term.
 *
 * @param density water density, kg/m³
 */
export function fittingThrust(
  node: ProjectNode,
  kind: FittingKind,
  legs: readonly Leg[],
  loadCases: readonly LoadCase[],
  density: number,
): CaseThrust[] {
  const pressurised = pressurisedLegs(kind, legs);
  return loadCases.map((c) => {
    const pressure = pressureAt(c, node.elevation, density);
    const flowFactor = pressurised ? 0 : c.flowFactor;
    const t = momentumBalance(legs, pressure, density, flowFactor, pressurised);
    return { caseId: c.id, pressure, static: t.static, dynamic: t.dynamic, total: t.total };
  });
}

/** The largest force of one kind over the cases, N, and the case it comes from. */
export interface Extreme {
  force: number;
  caseId: string | null;
}

export interface ThrustEnvelope {
  /** the case with the largest |total| (project-format.md) */
  governing: CaseThrust;
  /** largest horizontal component, with its plan direction (unit vector, z = 0) */
  horizontal: Extreme & { direction: Vec3 };
  /** largest upward (+z) component */
  upward: Extreme;
  /** largest downward (−z) component, as a positive number */
  downward: Extreme;
  /** highest gauge pressure at the node over the cases, Pa */
  pressure: number;
}

/** Envelope of the cases at one fitting. `cases` must not be empty. */
export function thrustEnvelope(cases: readonly CaseThrust[]): ThrustEnvelope {
  let governing = cases[0]!;
  let horizontal: Extreme & { direction: Vec3 } = { force: 0, caseId: null, direction: [0, 0, 0] };
  let upward: Extreme = { force: 0, caseId: null };
  let downward: Extreme = { force: 0, caseId: null };
  let pressure = -Infinity;
  let largest = -1;
  for (const c of cases) {
    const t = c.total;
    const size = norm(t);
    if (size > largest) {
      largest = size;
      governing = c;
    }
    const h = horizontalNorm(t);
    if (h > horizontal.force) horizontal = { force: h, caseId: c.caseId, direction: [t[0] / h, t[1] / h, 0] };
    if (t[2] > upward.force) upward = { force: t[2], caseId: c.caseId };
    if (-t[2] > downward.force) downward = { force: -t[2], caseId: c.caseId };
    if (c.pressure > pressure) pressure = c.pressure;
  }
  return { governing, horizontal, upward, downward, pressure };
}
