import type { Vec3 } from '../geometry/vector.js';
import { value, type CalcStep } from '../analysis/calcRecord.js';
import {
  ovesenAt,
  ovesenDepthTerm,
  ovesenDepthTerm3,
  ovesenFactor,
  passivePerWidth,
  passiveResistance,
  rankinePassiveCoefficient,
} from './passiveResistance.js';
import { VALUES } from '../provenance/registerValues.js';
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
  /**
   * m, the trench width where the face stands across the trench: below the tallest height the face
   * stays within it (cutting beyond the trench wall by hand is left for a face the cover keeps low)
   */
  trenchWidth?: number;
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
  /** N, ultimate passive resistance of the chosen face: Rankine 2-D × Ovesen's 3-D factor */
  passiveResistance: number;
  /** Ovesen's 3-D factor M applied to the 2-D resistance */
  shapeFactor: number;
  /** passive resistance over thrust */
  passiveRatio: number;
  /** m, depth below ground of the face's bottom */
  bottomDepth: number;
  /** N, horizontal thrust the face bears */
  thrust: number;
  /** N, upward thrust the block's weight holds (0 unless it is thickened to stand in for an anchor) */
  upwardThrust: number;
  /**
   * what set the face: the bearing area, the passive resistance (the face was deepened or widened
   * beyond the bearing area), or the least face (one OD each way)
   */
  governs: 'bearing' | 'passive' | 'minimum';
}

export interface BlockResult {
  /** the block, or null where none within the limits holds */
  block: BearingBlock | null;
  /** m², required bearing area SF·T/σ */
  bearingArea: number;
  steps: CalcStep[];
  diagnostics: Diagnostic[];
}

const DIPRA_AREA = 'A_b = T·S_f/S_b (DIPRA, Thrust Restraint Design for Ductile Iron Pipe; AWWA M23 Example 1)';
const FACE_RULE =
  'Face height at least the pipe OD and at most half the depth to the block bottom; width at most twice the height, wider only at the tallest face the cover allows (Mainbrace’s own rule: no published source states it)';

interface Face {
  width: number;
  height: number;
}

/**
 * Sizes a concrete bearing block against undisturbed soil (DIPRA bearing method, Rankine
 * passive resistance, DIPRA/AWWA M23 face proportions). The face
 * is centred on the pipe; every face the limits allow is a candidate — heights in whole steps from the
 * OD to the face rule's tallest (⅔ of the centreline depth), widths in whole steps up to twice the
 * height (and within the trench where the face stands across it), or up to the register's widest face at the tallest height, where the cover stops deepening.
 * The block built is the candidate of least face area that meets both the bearing-area rule
 * (b·h ≥ SF·T/σ) and the passive resistance (Rankine × Ovesen's 3-D factor ≥ SF·T), the squarer face on
 * a tie. The candidates do not depend on the thrust, and a larger thrust only removes candidates, so the
 * face never shrinks as the pressure rises. Where no candidate holds, no block is issued: an error.
 */
export function sizeBearingBlock(i: BearingBlockInput): BlockResult {
  const diagnostics: Diagnostic[] = [];
  const area = (i.safetyFactor * i.thrust) / i.allowableBearing;
  const centreDepth = i.cover + i.outsideDiameter / 2;
  const limits = VALUES['block.face-limits'];
  // Face centred on the pipe: h ≤ (centreDepth + h/2)/2 gives h ≤ 2/3 of the centreline depth.
  const ruleTallest = roundDownTo((2 * centreDepth) / 3, i.step);
  const shortest = roundUpTo(i.outsideDiameter, i.step);
  const tallest = Math.max(shortest, ruleTallest);
  if (ruleTallest < shortest) {
    diagnostics.push(
      diagnostic('block.taller-than-cover', {}, { faceHeight: shortest, bottomDepth: 2 * shortest, centreDepth }),
    );
  }
  const widest = (h: number) =>
    h >= tallest - 1e-9
      ? roundDownTo(Math.min(limits.widest * h, limits.widestMetres), i.step)
      : Math.min(limits.wide * h, i.trenchWidth ?? Infinity);
  const faceDepths = (h: number) => ({ top: centreDepth - h / 2, bottom: centreDepth + h / 2 });
  const resistance = (f: Face) => {
    const { top, bottom } = faceDepths(f.height);
    const twoD = passiveResistance({
      width: f.width,
      top,
      bottom,
      unitWeight: i.soil.unitWeight,
      frictionAngle: i.soil.frictionAngle,
      cohesion: i.soil.cohesion,
      waterDepth: i.waterDepth,
      waterUnitWeight: i.waterUnitWeight,
    });
    const shape = ovesenFactor({ frictionAngle: i.soil.frictionAngle, top, bottom, width: f.width });
    return { twoD, shape, total: twoD * shape };
  };
  const needed = i.safetyFactor * i.thrust;
  // The search below weighs many faces of one soil and depth: Kp, √Kp and (Kp − Ka)^⅔ once per block,
  // the depth terms once per height, then a few operations per width — the arithmetic of
  // passiveResistance × ovesenFactor in the same order, so `resistance` gives the same numbers.
  const kp = rankinePassiveCoefficient(i.soil.frictionAngle);
  const sqrtKp = Math.sqrt(kp);
  const d = kp - 1 / kp;
  const d23 = d ** (2 / 3);
  const better = (aw: number, ah: number, bw: number, bh: number) =>
    aw < 0 ||
    bw * bh < aw * ah - 1e-12 ||
    (Math.abs(bw * bh - aw * ah) <= 1e-12 && Math.abs(Math.log(bw / bh)) < Math.abs(Math.log(aw / ah)));
  // Faces as two numbers each (−1: none yet): a block is sized at every fitting on every edit.
  let bearingW = -1;
  let bearingH = -1;
  let chosenW = -1;
  let chosenH = -1;
  const heights = Math.round((tallest - shortest) / i.step);
  const heightAt = (k: number) => shortest + k * i.step;
  for (let k = 0; k <= heights; k++) {
    const height = heightAt(k);
    const wMax = widest(height);
    const wBearing = Math.max(shortest, roundUpTo(area / height, i.step));
    if (wBearing > wMax + 1e-9) continue;
    if (better(bearingW, bearingH, wBearing, height)) {
      bearingW = wBearing;
      bearingH = height;
    }
    // No wider face at this height can beat the best found so far.
    if (chosenW >= 0 && wBearing * height > chosenW * chosenH + 1e-12) continue;
    // The passive resistance grows with the width: find the narrowest face that holds.
    const top = centreDepth - height / 2;
    const bottom = centreDepth + height / 2;
    const perWidth = passivePerWidth(
      kp,
      sqrtKp,
      top,
      bottom,
      i.soil.unitWeight,
      i.soil.cohesion,
      i.waterDepth,
      i.waterUnitWeight,
    );
    const h = bottom - Math.max(0, top);
    const flat = !(h > 0) || d <= 0;
    const e = 1 - h / bottom;
    const term4 = flat ? 0 : ovesenDepthTerm(e);
    const term3 = flat ? 0 : ovesenDepthTerm3(d, e);
    const steps = Math.floor((wMax - wBearing) / i.step + 1e-9);
    const holds = (n: number) => {
      const width = wBearing + n * i.step;
      const shape = flat || !(width > 0) ? 1 : ovesenAt(d23, term4, term3, h, width);
      return width * perWidth * shape >= needed;
    };
    let lo = 0;
    if (!holds(0)) {
      if (!holds(steps)) continue;
      lo = 1;
      let hi = steps;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        if (holds(mid)) hi = mid;
        else lo = mid + 1;
      }
    }
    const width = wBearing + lo * i.step;
    if (better(chosenW, chosenH, width, height)) {
      chosenW = width;
      chosenH = height;
    }
  }
  const byBearing: Face | null = bearingW < 0 ? null : { width: bearingW, height: bearingH };
  const chosen: Face | null = chosenW < 0 ? null : { width: chosenW, height: chosenH };
  if (!chosen) {
    // The strongest face within the limits, for the message.
    let strongest = { face: { width: widest(shortest), height: shortest }, resistance: 0 };
    for (let k = 0; k <= heights; k++) {
      const face = { width: widest(heightAt(k)), height: heightAt(k) };
      const r = resistance(face).total;
      if (r > strongest.resistance) strongest = { face, resistance: r };
    }
    diagnostics.push(
      diagnostic(
        'block.not-adequate',
        {},
        {
          thrust: i.thrust,
          ratio: strongest.resistance / i.thrust,
          safetyFactor: i.safetyFactor,
          bearingArea: area,
          faceWidth: strongest.face.width,
          faceHeight: strongest.face.height,
        },
      ),
    );
    return { block: null, bearingArea: area, steps: [], diagnostics };
  }
  const { width, height } = chosen;
  const governs =
    byBearing && byBearing.width === width && byBearing.height === height
      ? width === shortest && height === shortest && shortest * shortest > area
        ? 'minimum'
        : 'bearing'
      : 'passive';
  if (width > 2 * height + 1e-9) {
    diagnostics.push(diagnostic('block.wide-face', {}, { faceWidth: width, faceHeight: height }));
  }
  const { top, bottom } = faceDepths(height);
  const passive = resistance(chosen);
  const passiveRatio = passive.total / i.thrust;
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
          formula:
            'least b·h with b·h ≥ A and R_p ≥ SF·T_h;  OD ≤ h ≤ ⅔·(H + OD/2);  b ≤ 2h (wider only at the tallest h); whole steps',
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
            governs === 'passive'
              ? 'enlarged beyond the bearing area for the passive resistance'
              : governs === 'minimum'
                ? 'the least face, one OD each way'
                : 'set by the bearing area',
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
          formula:
            'R_p = M · b·[½·γ·Kp·(z₂² − z₁²) + 2·c·√Kp·(z₂ − z₁)];  M = 1 + (Kp − Ka)^⅔·[1.1E⁴ + 1.6/(1 + 5b/h) + 0.4(Kp − Ka)E³/(1 + 0.05b/h)], E = z₁/z₂',
          inputs: [
            value('z₁', 'depth of face top', top, 'length', 'computed'),
            value('z₂', 'depth of face bottom', bottom, 'length', 'computed'),
            value('γ', 'soil unit weight', i.soil.unitWeight, 'unitWeight', 'soil'),
            value('φ', 'soil friction angle', i.soil.frictionAngle, 'angle', 'soil'),
            value('c', 'soil cohesion', i.soil.cohesion, 'stress', 'soil'),
            value('M', 'Ovesen 3-D factor', passive.shape, 'ratio', 'computed'),
          ],
          result: value(
            'R_p',
            'ultimate passive resistance',
            passive.total,
            'force',
            `${passiveRatio.toFixed(2)} × the thrust (2-D ${passive.twoD.toFixed(0)} N × M)`,
          ),
          reference:
            'Rankine passive earth pressure with cohesion, submerged unit weight below the water table; Ovesen (1964) 3-D factor as restated by Duncan & Mokwa (2001) — not verified against the paper',
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
      passiveResistance: passive.total,
      shapeFactor: passive.shape,
      passiveRatio,
      bottomDepth: bottom,
      thrust: i.thrust,
      upwardThrust: 0,
      governs,
    },
    bearingArea: area,
    steps,
    diagnostics,
  };
}
