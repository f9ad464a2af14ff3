import { horizontalNorm, norm, type Vec3 } from '../geometry/vector.js';
import type { Leg } from '../network/legs.js';
import type { FittingKind } from '../network/fittingKind.js';
import type { LoadCase, ProjectNode } from '../model/projectSchema.js';
import { pressureAt } from '../pressure/nodePressure.js';
import { momentumBalance, type ThrustParts } from './momentumBalance.js';

/** The thrust of one load state at one fitting: a load case, and for a valve whether and how it is closed. */
export interface CaseThrust extends ThrustParts {
  caseId: string;
  /** gauge pressure at the node, Pa */
  pressure: number;
  /** for a closed valve: the pipe whose side holds the pressure; null when the fitting is open */
  closedAgainst: string | null;
}

/**
 * Every load state of a fitting. Most fittings have one per case. A valve has three per case: open
 * (a plain joint or bend, with flow), and closed with the pressure on either side — a dead end on that
 * side, with no flow (project-format.md) — so that its restraint holds the thrust in both directions.
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
  const out: CaseThrust[] = [];
  for (const c of loadCases) {
    const pressure = pressureAt(c, node.elevation, density);
    const open = momentumBalance(legs, pressure, density, c.flowFactor);
    out.push({
      caseId: c.id,
      pressure,
      static: open.static,
      dynamic: open.dynamic,
      total: open.total,
      closedAgainst: null,
    });
    if (kind !== 'valve' || legs.length !== 2) continue;
    for (let side = 0; side < 2; side++) {
      const closed = momentumBalance(legs, pressure, density, 0, [side === 0, side === 1]);
      out.push({
        caseId: c.id,
        pressure,
        static: closed.static,
        dynamic: closed.dynamic,
        total: closed.total,
        closedAgainst: legs[side]!.pipe.id,
      });
    }
  }
  return out;
}

/** One state per case for the schedule: the one with the largest thrust. */
export function worstPerCase(states: readonly CaseThrust[]): CaseThrust[] {
  const best = new Map<string, CaseThrust>();
  for (const s of states) {
    const b = best.get(s.caseId);
    if (!b || norm(s.total) > norm(b.total)) best.set(s.caseId, s);
  }
  return [...best.values()];
}

/** The largest force of one kind over the states, N, and the case it comes from. */
export interface Extreme {
  force: number;
  caseId: string | null;
}

export interface ThrustEnvelope {
  /** the state with the largest |total| (project-format.md) */
  governing: CaseThrust;
  /** largest horizontal component, with its plan direction (unit vector, z = 0) */
  horizontal: Extreme & { direction: Vec3 };
  /**
   * the largest horizontal thrust that points against the main one (more than 90° from it), when the
   * thrust reverses between states — a closed valve, or a pressure that changes sign; a second block
   * must bear on the other side
   */
  reverse: (Extreme & { direction: Vec3; state: CaseThrust }) | null;
  /** largest upward (+z) component */
  upward: Extreme;
  /** largest downward (−z) component, as a positive number */
  downward: Extreme;
  /** highest gauge pressure at the node over the cases, Pa */
  pressure: number;
}

/** Envelope of the states at one fitting. `states` must not be empty. */
export function thrustEnvelope(states: readonly CaseThrust[]): ThrustEnvelope {
  let governing = states[0]!;
  let largest = -1;
  let horizontal: Extreme & { direction: Vec3 } = { force: 0, caseId: null, direction: [0, 0, 0] };
  let upward: Extreme = { force: 0, caseId: null };
  let downward: Extreme = { force: 0, caseId: null };
  let pressure = -Infinity;
  for (const c of states) {
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
  let reverse: ThrustEnvelope['reverse'] = null;
  const d = horizontal.direction;
  for (const c of states) {
    const t = c.total;
    const h = horizontalNorm(t);
    // Opposed by more than 90°, and more than floating-point noise of the main thrust.
    if (h > 1e-7 * horizontal.force && t[0] * d[0] + t[1] * d[1] < 0 && h > (reverse?.force ?? 0)) {
      reverse = { force: h, caseId: c.caseId, direction: [t[0] / h, t[1] / h, 0], state: c };
    }
  }
  return { governing, horizontal, reverse, upward, downward, pressure };
}
