import { dot, horizontalNorm, norm, type Vec3 } from '../geometry/vector.js';
import { value, type CalcStep } from '../analysis/calcRecord.js';
import type { Leg } from '../network/legs.js';
import type { FittingKind } from '../network/fittingKind.js';
import type { Soil } from '../model/projectSchema.js';
import { formatSi } from '../units/format.js';
import type { UnitSystem } from '../units/conversions.js';
import { pipeSoilResistance } from './pipeSoilResistance.js';
import type { FittingSite } from './site.js';

export interface RestrainedLeg {
  pipe: string;
  /** m, restrained length along this pipe from the fitting */
  length: number;
}

export interface RestrainedLengthInput {
  kind: FittingKind;
  legs: readonly Leg[];
  /** N, governing thrust vector */
  thrust: Vec3;
  /** degrees, deflection of a two-pipe bend */
  deflection: number | null;
  soil: Soil;
  cover: number;
  safetyFactor: number;
  units: UnitSystem;
  site: Pick<FittingSite, 'waterDepth' | 'waterUnitWeight'>;
  record?: boolean;
}

const BEND_REFERENCE =
  'L = S_f·P·A·tan(θ/2)/(F_s + ½·R_s), DIPRA "Thrust Restraint Design for Ductile Iron Pipe" (form not yet verified against the manual)';
const AXIAL_REFERENCE =
  'L = S_f·P·A/F_s for dead ends, tees, reducers and closed valves, DIPRA (form not yet verified against the manual)';
const UPLIFT_REFERENCE =
  'Upward-thrust bend: the bearing term replaced by the weight holding the pipe down (form derived here by analogy with the horizontal bend — verify against the manual)';

/**
 * Restrained joint length each side of a fitting (domain reference §6.1). Bends, written with the
 * resultant T = 2·P·A·sin(θ/2) so that reducing bends and dynamic thrust are covered:
 * L = S_f·T/(2·cos(θ/2)·(F_s + ½·R)), R = R_s, or the hold-down weight where the thrust is mainly
 * upward. Every other fitting: L = S_f·|T|/F_s along the pipe the thrust pulls on (the leg pointing
 * most nearly against the thrust: the branch of a tee, the large end of a reducer, the capped pipe).
 */
export function restrainedLength(i: RestrainedLengthInput): {
  legs: RestrainedLeg[];
  steps: CalcStep[];
  warnings: string[];
} {
  const warnings: string[] = [];
  const t = norm(i.thrust);
  const steps: CalcStep[] = [];
  const out: RestrainedLeg[] = [];
  const isBend = (i.kind === 'bend' || i.kind === 'reducing-bend') && i.deflection !== null;
  const upward = i.thrust[2] > horizontalNorm(i.thrust);
  const legsToRestrain = isBend ? i.legs : [mostOpposed(i.legs, i.thrust)];
  for (const leg of legsToRestrain) {
    const r = pipeSoilResistance(leg.pipe, i.soil, i.cover, i.site);
    let length: number;
    let formula: string;
    if (isBend) {
      const half = ((i.deflection as number) * Math.PI) / 360;
      const lateral = upward ? r.uplift : r.bearing;
      length = (i.safetyFactor * t) / (2 * Math.cos(half) * (r.friction + lateral / 2));
      formula = upward ? 'L = S_f·T / (2·cos(θ/2)·(F_s + ½·W_u))' : 'L = S_f·T / (2·cos(θ/2)·(F_s + ½·R_s))';
    } else {
      length = (i.safetyFactor * t) / r.friction;
      formula = 'L = S_f·T / F_s';
    }
    if (!Number.isFinite(length) || length <= 0) {
      warnings.push(
        `No friction or bearing along ${leg.pipe.id}: the soil (φ = ${i.soil.frictionAngle}°, c = ${formatSi(i.soil.cohesion, 'stress', i.units)}) cannot hold restrained joints; use a block, piles or soil replacement.`,
      );
      continue;
    }
    out.push({ pipe: leg.pipe.id, length });
    if (i.record)
      steps.push({
        title: `Restrained length along ${leg.pipe.id}`,
        formula,
        inputs: [
          value('T', 'governing thrust', t, 'force', 'momentum balance'),
          ...(isBend ? [value('θ', 'deflection', i.deflection as number, 'angle', 'geometry')] : []),
          value('S_f', 'restraint safety factor', i.safetyFactor, 'ratio', 'project design'),
          ...r.inputs,
          ...(isBend && upward
            ? [value('W_u', 'hold-down weight W_p + W_w − B + W_e', r.uplift, 'forcePerLength', 'computed')]
            : []),
        ],
        result: value('L', 'restrained length', length, 'length', 'computed'),
        reference: isBend ? (upward ? UPLIFT_REFERENCE : BEND_REFERENCE) : AXIAL_REFERENCE,
      });
    if (length > leg.length) {
      warnings.push(
        `Restrained length ${formatSi(length, 'length', i.units)} along ${leg.pipe.id} runs past the next node (${formatSi(leg.length, 'length', i.units)} away): the restrained zones of neighbouring fittings encroach and must be designed together.`,
      );
    }
    if (leg.pipe.material === 'hdpe') {
      warnings.push(
        `${leg.pipe.id} is HDPE: fused PE is end-load bearing; restraint is needed at transitions to gasketed pipe and for thermal and Poisson loads.`,
      );
    } else if (leg.pipe.material !== 'ductile-iron') {
      warnings.push(
        `${leg.pipe.id} is not ductile iron: the restrained-length method is the ductile-iron manual's; use friction values for ${leg.pipe.material} from the restrained-joint maker.`,
      );
    }
  }
  if (isBend && (i.deflection as number) > 90) {
    warnings.push(
      'Bend sharper than 90°: restrained lengths grow quickly and the method is uncertain; consider a block or a different layout.',
    );
  }
  warnings.push(
    'Restrained lengths use coefficients recalled from the ductile-iron design manual (trench K_n, friction and adhesion ratios, encasement 0.7): verify them against the manual before construction.',
  );
  return { legs: out, steps, warnings };
}

/** The leg whose direction from the node points most nearly against the thrust. */
function mostOpposed(legs: readonly Leg[], thrust: Vec3): Leg {
  let best = legs[0]!;
  for (const leg of legs) if (dot(leg.direction, thrust) < dot(best.direction, thrust)) best = leg;
  return best;
}
