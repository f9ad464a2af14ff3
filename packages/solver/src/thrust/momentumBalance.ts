import type { Vec3 } from '../geometry/vector.js';
import type { Leg } from '../network/legs.js';

/** Force of the water on a fitting for one load case, N, split as the schedule reports it. */
export interface ThrustParts {
  /** Σ −p·A_i·n_i, N */
  static: Vec3;
  /** Σ −ρ·Q_i²/a_i·n_i, N */
  dynamic: Vec3;
  /** static + dynamic, N */
  total: Vec3;
}

/**
 * Steady momentum balance on a control volume around a fitting (any fluid-mechanics text,
 * e.g. White, "Fluid Mechanics", ch. 3, linear momentum with gauge pressures):
 *
 *   F = − Σ_i ( p·A_i + ρ·Q_i²/a_i ) · n_i
 *
 * n_i points from the node along pipe i, A_i is the area the pressure acts on, a_i the flow area and
 * Q_i the outflow. The momentum flux ρ·Q²/a pushes outward along −n_i at inlets and outlets alike.
 *
 * @param legs the pipe ends at the node; only those with `pressurised[i] !== false` carry pressure
 * @param pressure gauge pressure at the node, Pa
 * @param density water density, kg/m³
 * @param flowFactor multiplies every leg's outflow (0 = no flow)
 */
/**
 * A sum of vectors that cancel (the opposite branches of a cross, a straight joint) keeps rounding
 * crumbs of about 1e-16 × the magnitudes added; a component below 1e-12 × them is that rounding, not
 * a thrust, and is taken as 0, so that a balanced fitting is given nothing to hold.
 *
 * @param scale the sum of the magnitudes added
 */
export const cancelled = (component: number, scale: number): number =>
  Math.abs(component) <= 1e-12 * scale ? 0 : component;

export function momentumBalance(
  legs: readonly Leg[],
  pressure: number,
  density: number,
  flowFactor: number,
  pressurised?: readonly boolean[],
): ThrustParts {
  let sx = 0,
    sy = 0,
    sz = 0;
  let dx = 0,
    dy = 0,
    dz = 0;
  let pressureScale = 0,
    fluxScale = 0;
  for (let i = 0; i < legs.length; i++) {
    if (pressurised && !pressurised[i]) continue;
    const leg = legs[i]!;
    const n = leg.direction;
    const pressureForce = pressure * leg.thrustArea;
    const q = leg.outflow * flowFactor;
    const momentumFlux = (density * q * q) / leg.flowArea;
    sx -= pressureForce * n[0];
    sy -= pressureForce * n[1];
    sz -= pressureForce * n[2];
    dx -= momentumFlux * n[0];
    dy -= momentumFlux * n[1];
    dz -= momentumFlux * n[2];
    pressureScale += Math.abs(pressureForce);
    fluxScale += momentumFlux;
  }
  const st: Vec3 = [cancelled(sx, pressureScale), cancelled(sy, pressureScale), cancelled(sz, pressureScale)];
  const dyn: Vec3 = [cancelled(dx, fluxScale), cancelled(dy, fluxScale), cancelled(dz, fluxScale)];
  return { static: st, dynamic: dyn, total: [st[0] + dyn[0], st[1] + dyn[1], st[2] + dyn[2]] };
}
