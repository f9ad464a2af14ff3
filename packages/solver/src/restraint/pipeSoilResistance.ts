import { value, type RecordValue } from '../analysis/calcRecord.js';
import { pipeWeightPerLength } from '../catalog/materialDensity.js';
import type { Pipe, Soil } from '../model/projectSchema.js';
import { VALUES } from '../provenance/registerValues.js';
import { effectiveStress, rankinePassiveCoefficient } from './passiveResistance.js';
import type { FittingSite } from './site.js';

/** Trench-type coefficient K_n for laying conditions 1–5 of AWWA C150/C151 (register: unverified). */
export const TRENCH_COEFFICIENT: Readonly<Record<number, number>> = VALUES['joints.trench-coefficient'];
/** Laying condition assumed when a pipe states none. */
export const DEFAULT_TRENCH_TYPE = VALUES['joints.default-trench-type'];
/** f_φ: pipe friction angle over soil friction angle (register: unverified). */
export const DEFAULT_FRICTION_RATIO = VALUES['joints.friction-ratio'];
/** f_c: pipe adhesion over soil cohesion (register: unverified). */
export const DEFAULT_ADHESION_RATIO = VALUES['joints.adhesion-ratio'];
/** Friction on polyethylene-encased pipe relative to bare pipe, adhesion neglected (register: unverified). */
export const ENCASED_FRICTION_FACTOR = VALUES['joints.encasement-factor'];

export interface PipeSoilResistance {
  /** N/m, unit frictional resistance F_s along the pipe */
  friction: number;
  /** N/m, unit lateral bearing resistance R_s = K_n·P_p·D */
  bearing: number;
  /** N/m, weight holding the pipe down against uplift: pipe and water, less buoyancy, and the soil prism above */
  uplift: number;
  inputs: RecordValue[];
}

/**
 * Pipe–soil resistance per metre of restrained pipe (DIPRA, "Thrust Restraint Design for Ductile
 * Iron Pipe"; AWWA M41;
 * equation bodies from memory): F_s = A_p·C_p + W·tan δ with A_p = π·D, W = 2·W_e + W_p + W_w,
 * W_e = γ·H·D (the prism load, on top and bottom), C_p = f_c·c, δ = f_φ·φ; encased pipe 0.7·W·tan δ.
 * R_s = K_n·P_p·D, P_p = Rankine passive pressure at the pipe centreline σ'v(H_c)·Kp + 2c·√Kp; none in
 * a soil with no shear strength.
 * Below the water table the soil weighs γ − γw and the pipe is buoyed by γw·π/4·D² (effective
 * stresses under groundwater).
 *
 * @param cover m, ground to top of pipe
 */
export function pipeSoilResistance(
  pipe: Pipe,
  soil: Soil,
  cover: number,
  site: Pick<FittingSite, 'waterDepth' | 'waterUnitWeight'>,
): PipeSoilResistance {
  const d = pipe.outsideDiameter;
  const gw = site.waterUnitWeight;
  const pipeWeight = pipe.weightPerLength ?? pipeWeightPerLength(pipe.material, d, pipe.insideDiameter);
  const waterWeight = (gw * Math.PI * pipe.insideDiameter ** 2) / 4;
  const centreDepth = cover + d / 2;
  const buoyed = site.waterDepth !== null && site.waterDepth <= centreDepth;
  const buoyancy = buoyed ? (gw * Math.PI * d * d) / 4 : 0;
  const earthLoad = effectiveStress(cover, soil.unitWeight, site.waterDepth, gw) * d;
  const normal = Math.max(0, 2 * earthLoad + pipeWeight + waterWeight - buoyancy);
  const frictionRatio = soil.pipeFrictionRatio ?? DEFAULT_FRICTION_RATIO;
  const adhesionRatio = soil.pipeAdhesionRatio ?? DEFAULT_ADHESION_RATIO;
  const tanDelta = Math.tan((frictionRatio * soil.frictionAngle * Math.PI) / 180);
  const encased = pipe.encasement === 'polyethylene';
  const friction = encased
    ? ENCASED_FRICTION_FACTOR * normal * tanDelta
    : Math.PI * d * adhesionRatio * soil.cohesion + normal * tanDelta;
  const trenchType = pipe.trenchType ?? DEFAULT_TRENCH_TYPE;
  const kn = TRENCH_COEFFICIENT[trenchType] ?? TRENCH_COEFFICIENT[DEFAULT_TRENCH_TYPE]!;
  const kp = rankinePassiveCoefficient(soil.frictionAngle);
  const passivePressure =
    effectiveStress(centreDepth, soil.unitWeight, site.waterDepth, gw) * kp + 2 * soil.cohesion * Math.sqrt(kp);
  // A soil with no shear strength (φ = 0, c = 0) pushes back on the moving side no harder than it pushes
  // on the other (Kp = Ka = 1): it resists nothing, though the formula's gross passive pressure is σ'v.
  const shearless = !(soil.frictionAngle > 0) && !(soil.cohesion > 0);
  const bearing = shearless ? 0 : kn * passivePressure * d;
  const uplift = Math.max(0, pipeWeight + waterWeight - buoyancy + earthLoad);
  const given = (v: unknown) => (v === undefined ? 'default (unverified)' : 'project');
  return {
    friction,
    bearing,
    uplift,
    inputs: [
      value('D', `outside diameter of ${pipe.id}`, d, 'diameter', 'pipe'),
      value('H', 'cover to top of pipe', cover, 'length', 'node'),
      value(
        'W_p',
        'pipe weight',
        pipeWeight,
        'forcePerLength',
        pipe.weightPerLength === undefined ? 'material density × wall area' : 'project',
      ),
      value('W_w', 'water weight', waterWeight, 'forcePerLength', 'computed'),
      value('W_e', "earth prism load σ'v(H)·D", earthLoad, 'forcePerLength', 'computed'),
      ...(buoyed ? [value('B', 'buoyancy γw·π/4·D²', buoyancy, 'forcePerLength', 'groundwater')] : []),
      value('f_φ', 'pipe/soil friction ratio', frictionRatio, 'ratio', given(soil.pipeFrictionRatio)),
      value('f_c', 'pipe/soil adhesion ratio', adhesionRatio, 'ratio', given(soil.pipeAdhesionRatio)),
      value(
        'K_n',
        `trench type ${trenchType} coefficient`,
        kn,
        'ratio',
        pipe.trenchType === undefined ? 'default type 3 (common practice), K_n unverified' : 'K_n unverified',
      ),
      value(
        'F_s',
        encased ? 'unit friction, PE-encased (0.7·W·tan δ)' : 'unit friction A_p·C_p + W·tan δ',
        friction,
        'forcePerLength',
        'computed',
      ),
      value(
        'R_s',
        'unit bearing K_n·P_p·D',
        bearing,
        'forcePerLength',
        shearless ? 'none: the soil has no shear strength (φ = 0, c = 0)' : 'computed',
      ),
    ],
  };
}
