import type { Vec3 } from '../geometry/vector.js';
import { value, type CalcStep } from '../analysis/calcRecord.js';
import {
  ovesenAt,
  ovesenDepthTerm,
  ovesenDepthTerm3,
  ovesenFactor,
  passivePerWidth,
  passiveConstants,
  passiveResistance,
} from './passiveResistance.js';
import { VALUES } from '../provenance/registerValues.js';
import { roundDownTo, roundUpTo } from './rounding.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';

export interface BearingBlockInput {
  /** N, largest horizontal thrust over the cases */
  thrust: number;
  /** unit plan vector of that thrust: the block bears on the soil in this direction */
  direction: Vec3;
  /** m², outside area of the pipes that run through the face, where the soil does not bear */
  pipeThroughFace: number;
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
  /**
   * the fitting's terms per face height from an earlier sizing, kept by a caller that sizes the same
   * fitting again for another thrust (a load-case edit); filled and checked here (`faceTerms`)
   */
  faces?: FaceTerms | undefined;
}

/**
 * The parts of the face search that do not depend on the thrust, per face height: the passive
 * resistance per metre of width and Ovesen's two depth terms. A pressure change sizes every block
 * again for a new thrust over the same heights, soil and depths; these were a third of that. Each
 * entry is worked out by the same arithmetic as the search itself, so the blocks are the same.
 */
export interface FaceTerms {
  centreDepth: number;
  step: number;
  shortest: number;
  heights: number;
  soil: BearingBlockInput['soil'] | null;
  unitWeight: number;
  frictionAngle: number;
  cohesion: number;
  waterDepth: number | null;
  waterUnitWeight: number;
  /** per height k: resistance per width, 1.1·E⁴, 0.4·(Kp − Ka)·E³ (NaN: not yet worked out) */
  terms: Float64Array;
}

/** An empty table for `BearingBlockInput.faces`: the first sizing fills it. */
export const faceTerms = (): FaceTerms => ({
  centreDepth: NaN,
  step: NaN,
  shortest: NaN,
  heights: -1,
  soil: null,
  unitWeight: NaN,
  frictionAngle: NaN,
  cohesion: NaN,
  waterDepth: null,
  waterUnitWeight: NaN,
  terms: new Float64Array(0),
});

/** `t`, emptied for other inputs unless it was filled for these (a kept table never answers for others). */
function termsFor(
  t: FaceTerms,
  i: BearingBlockInput,
  centreDepth: number,
  shortest: number,
  heights: number,
): Float64Array {
  const s = i.soil;
  if (
    t.centreDepth === centreDepth &&
    t.step === i.step &&
    t.shortest === shortest &&
    t.heights === heights &&
    t.soil === s &&
    t.unitWeight === s.unitWeight &&
    t.frictionAngle === s.frictionAngle &&
    t.cohesion === s.cohesion &&
    t.waterDepth === i.waterDepth &&
    t.waterUnitWeight === i.waterUnitWeight
  )
    return t.terms;
  t.centreDepth = centreDepth;
  t.step = i.step;
  t.shortest = shortest;
  t.heights = heights;
  t.soil = s;
  t.unitWeight = s.unitWeight;
  t.frictionAngle = s.frictionAngle;
  t.cohesion = s.cohesion;
  t.waterDepth = i.waterDepth;
  t.waterUnitWeight = i.waterUnitWeight;
  if (t.terms.length < 3 * (heights + 1)) t.terms = new Float64Array(3 * (heights + 1));
  t.terms.fill(NaN);
  return t.terms;
}

export interface BearingBlock {
  /** m², required face area: SF·T/σ, and the area of any pipe that runs through the face */
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
  /** m², required face area: SF·T/σ, and the area of any pipe that runs through the face */
  bearingArea: number;
  steps: CalcStep[];
  diagnostics: Diagnostic[];
}

const DIPRA_AREA = 'A_b = T·S_f/S_b (DIPRA, Thrust Restraint Design for Ductile Iron Pipe; AWWA M23 Example 1)';
const FACE_RULE =
  'Face height from the pipe OD to half the depth to the block bottom; height and width each at most twice the other, but taller in a narrower trench and wider at the tallest face the cover allows (Mainbrace’s own rule)';

interface Face {
  width: number;
  height: number;
}

/**
 * The better of two faces: less area, or as much and squarer (−1: no face yet). Squarer by more than
 * rounding: 0.75 × 0.60 and 0.60 × 0.75 are as square, and the first found (the lower face) is kept
 * whichever way the last bit of their ratio falls.
 */
function better(aw: number, ah: number, bw: number, bh: number): boolean {
  return (
    aw < 0 ||
    bw * bh < aw * ah - 1e-12 ||
    (Math.abs(bw * bh - aw * ah) <= 1e-12 && Math.abs(Math.log(bw / bh)) < Math.abs(Math.log(aw / ah)) - 1e-9)
  );
}

/** The widest face the rule allows at height `h` (within the trench where the face stands across it). */
function widestAt(
  h: number,
  tallest: number,
  limits: (typeof VALUES)['block.face-limits'],
  step: number,
  trenchWidth: number | undefined,
): number {
  return h >= tallest - 1e-9
    ? roundDownTo(Math.min(limits.widest * h, limits.widestMetres), step)
    : Math.min(limits.wide * h, trenchWidth ?? Infinity);
}

/** Ovesen's 3-D factor of a face `width` wide at that height (1 on a flat search or an empty face). */
const faceShape = (width: number, flat: boolean, d23: number, term4: number, term3: number, h: number): number =>
  flat || !(width > 0) ? 1 : ovesenAt(d23, term4, term3, h, width);

/**
 * A face `width` wide, at a height whose resistance per width and Ovesen depth terms are given, holds
 * `needed` (SF·T): the arithmetic of passiveResistance × ovesenFactor, in the same order.
 */
function faceHolds(
  width: number,
  perWidth: number,
  flat: boolean,
  d23: number,
  term4: number,
  term3: number,
  h: number,
  needed: number,
): boolean {
  return width * perWidth * faceShape(width, flat, d23, term4, term3, h) >= needed;
}

/** A face's passive resistance: Rankine in 2-D, Ovesen's factor, and their product. */
function faceResistance(i: BearingBlockInput, centreDepth: number, f: Face) {
  const top = centreDepth - f.height / 2;
  const bottom = centreDepth + f.height / 2;
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
}

/**
 * Sizes a concrete bearing block against undisturbed soil (DIPRA bearing method, Rankine
 * passive resistance, DIPRA/AWWA M23 face proportions). The face
 * is centred on the pipe; every face the limits allow is a candidate — heights in whole steps from the
 * OD to the face rule's tallest (⅔ of the centreline depth), widths in whole steps from half the height
 * (or the trench's width, where the face stands across a narrower trench) up to twice the height (and
 * within the trench where the face stands across it), or up to the register's widest face at the
 * tallest height, where the cover stops deepening.
 * The block built is the candidate of least face area that meets both the bearing-area rule
 * (b·h ≥ SF·T/σ) and the passive resistance (Rankine × Ovesen's 3-D factor ≥ SF·T), the squarer face on
 * a tie. The candidates do not depend on the thrust, and a larger thrust only removes candidates, so the
 * face never shrinks as the pressure rises. Where no candidate holds, no block is issued, and the finding says why (joints are sized instead).
 */
export function sizeBearingBlock(i: BearingBlockInput): BlockResult {
  const diagnostics: Diagnostic[] = [];
  const area = (i.safetyFactor * i.thrust) / i.allowableBearing + i.pipeThroughFace;
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
  const needed = i.safetyFactor * i.thrust;
  // The search below weighs many faces of one soil and depth: Kp, √Kp and (Kp − Ka)^⅔ once per block,
  // the depth terms once per height, then a few operations per width — the arithmetic of
  // passiveResistance × ovesenFactor in the same order, so `resistance` gives the same numbers.
  const { kp, sqrtKp, d, d23 } = passiveConstants(i.soil.frictionAngle);
  // Faces as two numbers each (−1: none yet): a block is sized at every fitting on every edit.
  let bearingW = -1;
  let bearingH = -1;
  let chosenW = -1;
  let chosenH = -1;
  const heights = Math.round((tallest - shortest) / i.step);
  // The loop below makes no closure and no object: it runs for every block on every edit, and what a
  // closure in it captured (a context per height, each number in it boxed) was most of the garbage
  // an analysis made.
  const kept = i.faces ? termsFor(i.faces, i, centreDepth, shortest, heights) : null;
  // the chosen face's resistance per width and Ovesen factor, as `resistance` would give them
  let chosenPerWidth = 0;
  let chosenShape = 1;
  for (let k = 0; k <= heights; k++) {
    const height = shortest + k * i.step;
    const wMax = widestAt(height, tallest, limits, i.step, i.trenchWidth);
    // At most `tall` × as high as wide, unless the trench holds the face narrower (wMax).
    const wLeast = Math.min(roundUpTo(height / limits.tall, i.step), wMax);
    const wBearing = Math.max(shortest, wLeast, roundUpTo(area / height, i.step));
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
    const h = bottom - Math.max(0, top);
    const flat = !(h > 0) || d <= 0;
    let perWidth: number;
    let term4: number;
    let term3: number;
    if (kept && !Number.isNaN(kept[3 * k]!)) {
      perWidth = kept[3 * k]!;
      term4 = kept[3 * k + 1]!;
      term3 = kept[3 * k + 2]!;
    } else {
      perWidth = passivePerWidth(
        kp,
        sqrtKp,
        top,
        bottom,
        i.soil.unitWeight,
        i.soil.cohesion,
        i.waterDepth,
        i.waterUnitWeight,
      );
      const e = 1 - h / bottom;
      term4 = flat ? 0 : ovesenDepthTerm(e);
      term3 = flat ? 0 : ovesenDepthTerm3(d, e);
      if (kept) {
        kept[3 * k] = perWidth;
        kept[3 * k + 1] = term4;
        kept[3 * k + 2] = term3;
      }
    }
    const steps = Math.floor((wMax - wBearing) / i.step + 1e-9);
    const step = i.step;
    let lo = 0;
    if (!faceHolds(wBearing, perWidth, flat, d23, term4, term3, h, needed)) {
      if (!faceHolds(wBearing + steps * step, perWidth, flat, d23, term4, term3, h, needed)) continue;
      lo = 1;
      let hi = steps;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        if (faceHolds(wBearing + mid * step, perWidth, flat, d23, term4, term3, h, needed)) hi = mid;
        else lo = mid + 1;
      }
    }
    const width = wBearing + lo * i.step;
    if (better(chosenW, chosenH, width, height)) {
      chosenW = width;
      chosenH = height;
      chosenPerWidth = perWidth;
      chosenShape = faceShape(width, flat, d23, term4, term3, h);
    }
  }
  if (chosenW < 0) {
    // The strongest face within the limits, for the message.
    const widest = (h: number) => widestAt(h, tallest, limits, i.step, i.trenchWidth);
    let strongest = { face: { width: widest(shortest), height: shortest }, resistance: 0 };
    let largestFace = 0;
    for (let k = 0; k <= heights; k++) {
      const face = { width: widest(shortest + k * i.step), height: shortest + k * i.step };
      const r = faceResistance(i, centreDepth, face).total;
      if (r > strongest.resistance) strongest = { face, resistance: r };
      largestFace = Math.max(largestFace, face.width * face.height);
    }
    diagnostics.push(
      diagnostic(
        'block.none-holds',
        {},
        {
          thrust: i.thrust,
          ratio: strongest.resistance / i.thrust,
          safetyFactor: i.safetyFactor,
          bearingArea: area,
          largestFace,
          faceWidth: strongest.face.width,
          faceHeight: strongest.face.height,
        },
      ),
    );
    return { block: null, bearingArea: area, steps: [], diagnostics };
  }
  const width = chosenW;
  const height = chosenH;
  const governs =
    bearingW >= 0 && bearingW === width && bearingH === height
      ? width === shortest && height === shortest && shortest * shortest > area
        ? 'minimum'
        : 'bearing'
      : 'passive';
  if (width > 2 * height + 1e-9) {
    diagnostics.push(diagnostic('block.wide-face', {}, { faceWidth: width, faceHeight: height }));
  }
  const top = centreDepth - height / 2;
  const bottom = centreDepth + height / 2;
  // `resistance(chosen)`, from the terms the search used for the chosen face (the same arithmetic)
  const twoD = width * chosenPerWidth;
  const passive = { twoD, shape: chosenShape, total: twoD * chosenShape };
  const passiveRatio = passive.total / i.thrust;
  const concreteVolume = width * height * i.blockDepth;
  const steps: CalcStep[] = !i.record
    ? []
    : [
        {
          title: 'Required bearing area',
          formula: `A = SF · T_h / σ_b${i.pipeThroughFace > 0 ? ' + A_p' : ''}`,
          inputs: [
            value('T_h', 'largest horizontal thrust', i.thrust, 'force', 'momentum balance'),
            value('SF', 'bearing safety factor', i.safetyFactor, 'ratio', 'project design'),
            value('σ_b', 'allowable horizontal bearing', i.allowableBearing, 'stress', 'soil'),
            ...(i.pipeThroughFace > 0
              ? [value('A_p', 'pipe in the face, π·OD²/4', i.pipeThroughFace, 'area', 'pipes')]
              : []),
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
            'face as sized',
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
            'R_p = M · b·[½·γ·Kp·(z₂² − z₁²) + 2·c·√Kp·(z₂ − z₁)];  M = 1 + (Kp − Ka)^⅔·[1.1E⁴ + 1.6B/(1 + 5b/h) + 0.4(Kp − Ka)E³B²/(1 + 0.05b/h)], E = z₁/z₂, B = 1 (a single block)',
          inputs: [
            value('z₁', 'depth of face top', top, 'length', 'computed'),
            value('z₂', 'depth of face bottom', bottom, 'length', 'computed'),
            value('γ', 'soil unit weight', i.soil.unitWeight, 'unitWeight', 'soil'),
            value('φ', 'soil friction angle', i.soil.frictionAngle, 'angle', 'soil'),
            value('c', 'soil cohesion', i.soil.cohesion, 'stress', 'soil'),
            value('M', 'Ovesen 3-D factor', passive.shape, 'ratio', 'computed'),
            value('R₂D', '2-D passive resistance, b·[…]', passive.twoD, 'force', 'computed'),
          ],
          result: value(
            'R_p',
            'ultimate passive resistance',
            passive.total,
            'force',
            `${passiveRatio.toFixed(2)} × the thrust: R₂D × M`,
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
