import { horizontalNorm, norm, type Vec3 } from '../geometry/vector.js';
import { value, type SizingStep } from '../analysis/calcRecord.js';
import type { Leg } from '../network/legs.js';
import type { FittingKind } from '../network/fittingKind.js';
import type { Soil } from '../model/projectSchema.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { pipeSoilResistance, type PipeSoilResistance } from './pipeSoilResistance.js';
import { axialShares } from './axialShares.js';
import { jointMaterialBasis } from './jointMaterial.js';
import type { FittingSite } from './site.js';

/**
 * Degrees from which a bend is sharper than 90°: a bend is named to a hundredth of a degree
 * (fittingNames.ts), and one named 90° is not sharper (nodes typed or kept to the millimetre turn a
 * drawn right angle by a few thousandths of a degree).
 */
const SHARP_FROM = 90.005;

export interface RestrainedLeg {
  pipe: string;
  /** m, restrained length along this pipe from the fitting */
  length: number;
  /** which equation gave it: a horizontal bend, a bend with upward thrust, or an axial thrust */
  form: 'bend' | 'uplift' | 'axial';
}

/**
 * N/m that a metre of restrained pipe holds in each form of the length: F_s along the pipe, and on a
 * bend F_s + ½R with R the lateral bearing R_s, or the hold-down weight W_u where the thrust is upward.
 */
export const holdingPerMetre = (r: PipeSoilResistance, form: RestrainedLeg['form']): number =>
  form === 'axial' ? r.friction : r.friction + (form === 'uplift' ? r.uplift : r.bearing) / 2;

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
  /** the fitting's node, which the diagnostics name */
  node: string;
  site: Pick<FittingSite, 'waterDepth' | 'waterUnitWeight'>;
  record?: boolean;
}

/**
 * Restrained joint length each side of a fitting (DIPRA method, as AWWA M41 adopts
 * it; equation bodies from memory, register `joints.bend-equation`). Bends, written with the
 * resultant T = 2·P·A·sin(θ/2) so that reducing bends and dynamic thrust are covered:
 * L = S_f·T/(2·cos(θ/2)·(F_s + ½·R)), R = R_s, or the hold-down weight where the thrust is mainly
 * upward. Every other fitting: L = S_f·T/F_s along the pipe the thrust pulls on (the leg pointing
 * most nearly against the thrust: the branch of a tee, the large end of a reducer, the capped pipe),
 * with a thrust that leans off that pipe shared with a second one (axialShares.ts).
 */
export function restrainedLength(i: RestrainedLengthInput): {
  legs: RestrainedLeg[];
  steps: SizingStep[];
  diagnostics: Diagnostic[];
} {
  const diagnostics: Diagnostic[] = [];
  const t = norm(i.thrust);
  const steps: SizingStep[] = [];
  const out: RestrainedLeg[] = [];
  const isBend = (i.kind === 'bend' || i.kind === 'reducing-bend') && i.deflection !== null;
  const upward = i.thrust[2] > horizontalNorm(i.thrust);
  const shares = isBend ? i.legs.map((leg) => ({ leg, force: t })) : axialShares(i.legs, i.thrust);
  for (const { leg, force } of shares) {
    const material = jointMaterialBasis(leg.pipe, i.soil, i.node);
    diagnostics.push(...material.diagnostics);
    if (!material.usable) continue;
    const r = pipeSoilResistance(leg.pipe, i.soil, i.cover, i.site);
    let length: number;
    let formula: string;
    const form = isBend ? (upward ? 'uplift' : 'bend') : 'axial';
    if (isBend) {
      const half = ((i.deflection as number) * Math.PI) / 360;
      length = (i.safetyFactor * t) / (2 * Math.cos(half) * holdingPerMetre(r, form));
      formula = upward ? 'L = S_f·T / (2·cos(θ/2)·(F_s + ½·W_u))' : 'L = S_f·T / (2·cos(θ/2)·(F_s + ½·R_s))';
    } else {
      length = (i.safetyFactor * force) / holdingPerMetre(r, form);
      formula = 'L = S_f·T / F_s';
    }
    if (!Number.isFinite(length) || length <= 0) {
      diagnostics.push(
        diagnostic(
          'joints.no-resistance',
          { node: i.node, pipe: leg.pipe.id },
          { frictionAngle: i.soil.frictionAngle, cohesion: i.soil.cohesion },
        ),
      );
      continue;
    }
    out.push({ pipe: leg.pipe.id, length, form });
    if (i.record)
      steps.push({
        title: `Restrained length along ${leg.pipe.id}`,
        formula,
        inputs: [
          // a bend's legs each take the whole thrust; a thrust shared between pipes gives each its part
          value(
            'T',
            !isBend && shares.length > 1 ? 'thrust along this pipe' : 'governing thrust',
            force,
            'force',
            'momentum balance',
          ),
          ...(isBend ? [value('θ', 'deflection', i.deflection as number, 'angle', 'geometry')] : []),
          value('S_f', 'restraint safety factor', i.safetyFactor, 'ratio', 'project design'),
          ...r.inputs,
          ...(isBend && upward
            ? [value('W_u', 'hold-down weight W_p + W_w − B + W_e', r.uplift, 'forcePerLength', 'computed')]
            : []),
        ],
        result: value('L', 'restrained length', length, 'length', 'computed'),
        basis: `joints.${form}-equation`,
      });
    if (length > leg.length) {
      diagnostics.push(
        diagnostic('joints.encroach', { node: i.node, pipe: leg.pipe.id }, { length, legLength: leg.length }),
      );
    }
  }
  if (isBend && (i.deflection as number) >= SHARP_FROM) {
    diagnostics.push(diagnostic('joints.sharp-bend', {}, { deflection: i.deflection as number }));
  }
  return { legs: out, steps, diagnostics };
}
