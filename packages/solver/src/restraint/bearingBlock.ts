import type { Vec3 } from '../geometry/vector.js';
import { value, type CalcStep } from '../analysis/calcRecord.js';
import { passiveResistance } from './passiveResistance.js';
import { roundDownTo, roundUpTo } from './rounding.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';

export interface BearingBlockInput {
  /** N, largest horizontal thrust over the cases */
  thrust: number;
  /** unit plan vector of that thrust: the block bears on the soil in this direction */
  direction: Vec3;
  /** Pa, allowable horizontal bearing at the face centroid */
  allowableBearing: number;
  safetyFactor: number;
  /** m, largest outside diameter at the fitting */
  outsideDiameter: number;
  /** m, ground surface to top of pipe */
  cover: number;
  /** m, the practical dimension step */
  step: number;
  /** m, block thickness from the fitting to the bearing face */
  blockDepth: number;
  soil: { unitWeight: number; frictionAngle: number; cohesion: number };
  /** m below ground of the water table, or null */
  waterDepth: number | null;
  /** N/m³, ρ·g of the groundwater */
  waterUnitWeight: number;
  /** build the calculation record too (only when someone reads it) */
  record?: boolean;
}

export interface BearingBlock {
  /** m², required bearing area SF·T/σ */
  bearingArea: number;
  /** m, horizontal width of the bearing face, normal to the thrust */
  faceWidth: number;
  /** m, vertical height of the bearing face */
  faceHeight: number;
  /** m³, face × block depth */
  concreteVolume: number;
  /** m, thickness from fitting to face (the design setting) */
  depth: number;
  /** unit plan vector the block bears toward */
  direction: Vec3;
  /** N, ultimate Rankine passive resistance of the chosen face */
  passiveResistance: number;
  /** passive resistance over thrust */
  passiveRatio: number;
  /** m, depth below ground of the face's bottom */
  bottomDepth: number;
}

export interface BlockResult {
  block: BearingBlock;
  steps: CalcStep[];
  diagnostics: Diagnostic[];
}

const DIPRA_AREA = 'A_b = T·S_f/S_b (DIPRA, Thrust Restraint Design for Ductile Iron Pipe; AWWA M23 Example 1)';
const FACE_RULE =
  'Face height at least the pipe OD and at most half the depth to the block bottom; width 1–2 × height where possible (Mainbrace’s own rule: no published source states it)';

/**
 * Sizes a concrete bearing block against undisturbed soil (domain reference §4.1, §4.7): the area
 * from the bearing strength, a face centred on the pipe, dimensions rounded up to the step so that
 * width × height ≥ the area, and a Rankine passive check of the chosen face (§4.6).
 */
export function sizeBearingBlock(i: BearingBlockInput): BlockResult {
  const diagnostics: Diagnostic[] = [];
  const area = (i.safetyFactor * i.thrust) / i.allowableBearing;
  const centreDepth = i.cover + i.outsideDiameter / 2;
  // Face centred on the pipe: h ≤ (centreDepth + h/2)/2 gives h ≤ 2/3 of the centreline depth.
  const tallest = roundDownTo((2 * centreDepth) / 3, i.step);
  const shortest = roundUpTo(i.outsideDiameter, i.step);
  let height = Math.max(shortest, Math.min(roundUpTo(Math.sqrt(area), i.step), tallest));
  if (tallest < shortest) {
    height = shortest;
    diagnostics.push(
      diagnostic('block.taller-than-cover', {}, { faceHeight: height, bottomDepth: 2 * height, centreDepth }),
    );
  }
  const width = Math.max(roundUpTo(area / height, i.step), shortest);
  if (width > 8 * height || width > 10) {
    diagnostics.push(diagnostic('block.impractical', {}, { faceWidth: width, faceHeight: height }));
  } else if (width > 2 * height + 1e-9) {
    diagnostics.push(diagnostic('block.wide-face', {}, { faceWidth: width, faceHeight: height }));
  }
  const top = centreDepth - height / 2;
  const bottom = centreDepth + height / 2;
  const passive = passiveResistance({
    width,
    top,
    bottom,
    unitWeight: i.soil.unitWeight,
    frictionAngle: i.soil.frictionAngle,
    cohesion: i.soil.cohesion,
    waterDepth: i.waterDepth,
    waterUnitWeight: i.waterUnitWeight,
  });
  const passiveRatio = passive / i.thrust;
  if (passiveRatio < i.safetyFactor) {
    diagnostics.push(diagnostic('block.passive-short', {}, { ratio: passiveRatio, safetyFactor: i.safetyFactor }));
  }
  const concreteVolume = width * height * i.blockDepth;
  const steps: CalcStep[] = !i.record
    ? []
    : [
        {
          title: 'Required bearing area',
          formula: 'A = SF · T_h / σ_b',
          inputs: [
            value('T_h', 'largest horizontal thrust', i.thrust, 'force', 'momentum balance'),
            value('SF', 'bearing safety factor', i.safetyFactor, 'ratio', 'project design'),
            value('σ_b', 'allowable horizontal bearing', i.allowableBearing, 'stress', 'soil'),
          ],
          result: value('A', 'required bearing area', area, 'area', 'computed'),
          reference: DIPRA_AREA,
        },
        {
          title: 'Bearing face',
          formula: 'OD ≤ h ≤ ⅔·(H + OD/2);  h ≈ √A;  b = A/h, both rounded up to the step',
          inputs: [
            value('OD', 'largest outside diameter', i.outsideDiameter, 'diameter', 'pipes'),
            value('H', 'cover to top of pipe', i.cover, 'length', 'node'),
            value('step', 'construction step', i.step, 'length', 'project design'),
          ],
          result: value(
            'b × h',
            'face provided',
            width * height,
            'area',
            'width × height, each rounded up to the step',
          ),
          reference: FACE_RULE,
        },
        {
          title: 'Concrete volume',
          formula: 'V = b · h · d',
          inputs: [value('d', 'block depth to the bearing face', i.blockDepth, 'length', 'project design')],
          result: value('V', 'concrete volume', concreteVolume, 'volume', 'computed'),
          reference: 'Prism of the face area and the stated block depth; the fitting’s own volume is not deducted',
        },
        {
          title: 'Passive resistance of the face',
          formula: 'R_p = b·[½·γ·Kp·(z₂² − z₁²) + 2·c·√Kp·(z₂ − z₁)],  Kp = tan²(45° + φ/2)',
          inputs: [
            value('z₁', 'depth of face top', top, 'length', 'computed'),
            value('z₂', 'depth of face bottom', bottom, 'length', 'computed'),
            value('γ', 'soil unit weight', i.soil.unitWeight, 'unitWeight', 'soil'),
            value('φ', 'soil friction angle', i.soil.frictionAngle, 'angle', 'soil'),
            value('c', 'soil cohesion', i.soil.cohesion, 'stress', 'soil'),
          ],
          result: value(
            'R_p',
            'ultimate passive resistance',
            passive,
            'force',
            `${passiveRatio.toFixed(2)} × the thrust`,
          ),
          reference: 'Rankine passive earth pressure with cohesion; submerged unit weight below the water table',
        },
      ];
  return {
    block: {
      bearingArea: area,
      faceWidth: width,
      faceHeight: height,
      concreteVolume,
      depth: i.blockDepth,
      direction: i.direction,
      passiveResistance: passive,
      passiveRatio,
      bottomDepth: bottom,
    },
    steps,
    diagnostics,
  };
}
