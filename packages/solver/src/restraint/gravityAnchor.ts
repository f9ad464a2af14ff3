import { value, type CalcStep } from '../analysis/calcRecord.js';
import { roundUpTo } from './rounding.js';
import { concreteWeight, type FittingSite } from './site.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { VALUES } from '../provenance/registerValues.js';

export interface GravityAnchorInput {
  /** N, largest upward thrust over the states */
  upward: number;
  /**
   * N, horizontal thrust the anchor must also hold by base friction (0 when a bearing block takes it):
   * the anchor is then enlarged until the friction on what is left of its weight holds SF × this.
   */
  horizontal: number;
  /** safety factor on the uplift */
  safetyFactor: number;
  /** safety factor on sliding (the bearing safety factor) */
  slidingSafetyFactor: number;
  /** N/m³, unit weight of the concrete */
  concreteUnitWeight: number;
  site: FittingSite;
  /** build the calculation record too */
  record?: boolean;
}

export interface GravityAnchor {
  /** m³, concrete as built, length × width × height: at least the required volume */
  concreteVolume: number;
  /** m³, required concrete volume: the larger of the uplift and the sliding requirement */
  requiredVolume: number;
  /** m, built plan length (along the pipe), rounded up to the step */
  length: number;
  /** m, built plan width (across the pipe), rounded up to the step */
  width: number;
  /** m, built height, rounded up to the step */
  height: number;
  /** m, side of the cube the anchor is built as (length = width = height) */
  side: number;
  /** N/m³, unit weight used (submerged where groundwater reaches the block) */
  unitWeight: number;
  submerged: boolean;
  /** N, upward thrust the anchor holds by its weight */
  upwardThrust: number;
  /** N, horizontal thrust the anchor holds by base friction (0 when a bearing block holds it) */
  horizontalThrust: number;
  /** N, base friction (W′ − T_up)·tan(⅔φ) of the required volume: the uplift lifts part of the weight */
  baseFriction: number;
  /** which requirement set the volume */
  governs: 'uplift' | 'sliding';
}

export type AnchorResult =
  | { anchor: GravityAnchor; steps: CalcStep[]; diagnostics: Diagnostic[] }
  | { anchor: null; steps: CalcStep[]; diagnostics: Diagnostic[] };

/** tan δ of concrete cast on the soil, δ = ⅔·φ (register: anchor.base-friction). */
export const baseFrictionCoefficient = (frictionAngle: number): number =>
  Math.tan((VALUES['anchor.base-friction'] * frictionAngle * Math.PI) / 180);

/**
 * Dead-weight anchor for an upward thrust (DIPRA gravity thrust block; the form V = S_f·T_v/W_m is
 * recalled, not read). Statics of the block: vertically W′ ≥ SF·T_up; horizontally, where base friction
 * is to hold the horizontal thrust too, the normal force on the base is what the uplift leaves of the
 * weight, N = W′ − T_up, so (W′ − T_up)·tan δ ≥ SF·T_h, i.e. W′ ≥ T_up + SF·T_h/tan δ. The block hangs
 * below the pipe and counts as submerged (γc − γw) when the highest groundwater stands above its
 * bottom. Where the submerged weight is not positive, no dead weight can hold: an error, never a
 * negative volume.
 */
export function sizeGravityAnchor(i: GravityAnchorInput): AnchorResult {
  const { site } = i;
  // Its weight bears on the soil under it, as a trench-bottom pad does: none where that soil has none.
  if (!((site.soil.verticalBearing ?? site.soil.bearing) > 0))
    return { anchor: null, steps: [], diagnostics: [diagnostic('pad.no-bearing', { soil: site.soil.id })] };
  const mu = baseFrictionCoefficient(site.soil.frictionAngle);
  const sliding = i.horizontal > 0;
  /** N, the weight the anchor needs: the uplift rule, and the sliding rule where friction is to hold */
  const upliftWeight = i.safetyFactor * i.upward;
  const slidingWeight = sliding ? (mu > 0 ? i.upward + (i.slidingSafetyFactor * i.horizontal) / mu : Infinity) : 0;
  const weight = Math.max(upliftWeight, slidingWeight);
  const governs = slidingWeight > upliftWeight ? 'sliding' : 'uplift';
  if (!Number.isFinite(weight)) return { anchor: null, steps: [], diagnostics: [] };
  const drySide = roundUpTo(Math.cbrt(weight / i.concreteUnitWeight), site.step);
  const submerged = site.groundwater !== null && site.groundwater > site.invert - drySide;
  const unitWeight = concreteWeight(i.concreteUnitWeight, site, submerged);
  if (!(unitWeight > 0)) {
    return {
      anchor: null,
      steps: [],
      diagnostics: [
        diagnostic(
          'anchor.no-weight',
          {},
          { concreteUnitWeight: i.concreteUnitWeight, waterUnitWeight: site.waterUnitWeight, upward: i.upward },
        ),
      ],
    };
  }
  const requiredVolume = weight / unitWeight;
  const side = roundUpTo(Math.cbrt(requiredVolume), site.step);
  const concreteVolume = side ** 3;
  const baseFriction = Math.max(0, unitWeight * requiredVolume - i.upward) * mu;
  const diagnostics = submerged ? [diagnostic('anchor.submerged', {}, { unitWeight })] : [];
  const gammaInput = value(
    'γ',
    submerged ? 'submerged unit weight of concrete' : 'unit weight of concrete',
    unitWeight,
    'unitWeight',
    'project design',
  );
  const steps: CalcStep[] = !i.record
    ? []
    : [
        {
          title: 'Gravity anchor: weight against the uplift',
          formula: submerged ? 'V_up = SF · T_up / (γc − γw)' : 'V_up = SF · T_up / γc',
          inputs: [
            value('T_up', 'largest upward thrust', i.upward, 'force', 'momentum balance'),
            value('SF', 'uplift safety factor', i.safetyFactor, 'ratio', 'project design'),
            gammaInput,
          ],
          result: value('V_up', 'concrete volume for the uplift', upliftWeight / unitWeight, 'volume', 'computed'),
          reference:
            'Weight ≥ SF × upward thrust (vertical equilibrium; DIPRA gravity block, unverified); submerged weight γc − γw below groundwater',
        },
        ...(sliding
          ? [
              {
                title: 'Gravity anchor: base friction against the horizontal thrust',
                formula: '(γ·V − T_up)·tan(⅔φ) ≥ SF · T_h  ⇒  V_sl = (T_up + SF·T_h / tan(⅔φ)) / γ',
                inputs: [
                  value('T_h', 'horizontal thrust held by friction', i.horizontal, 'force', 'momentum balance'),
                  value('SF', 'sliding (bearing) safety factor', i.slidingSafetyFactor, 'ratio', 'project design'),
                  value('φ', 'soil friction angle', site.soil.frictionAngle, 'angle', 'soil'),
                  gammaInput,
                ],
                result: value('V_sl', 'concrete volume for sliding', slidingWeight / unitWeight, 'volume', 'computed'),
                reference:
                  'Horizontal equilibrium: the normal force on the base is the weight less the uplift, W′ − T_up (statics); δ = ⅔φ for concrete cast on soil (common practice)',
              },
            ]
          : []),
        {
          title: 'Gravity anchor sized',
          formula: 'V_req = max(V_up, V_sl);  side = ∛V_req rounded up to the step;  V = side³',
          inputs: [
            value('V_req', 'concrete volume required', requiredVolume, 'volume', `${governs} governs`),
            value('step', 'construction step', site.step, 'length', 'project design'),
            value('side', 'side of the cube', side, 'length', 'computed'),
          ],
          result: value('V', 'cube as sized', concreteVolume, 'volume', 'computed'),
          reference: 'A cube of at least the required volume (length × width × height)',
        },
      ];
  return {
    anchor: {
      concreteVolume,
      requiredVolume,
      length: side,
      width: side,
      height: side,
      side,
      unitWeight,
      submerged,
      upwardThrust: i.upward,
      horizontalThrust: i.horizontal,
      baseFriction,
      governs,
    },
    steps,
    diagnostics,
  };
}
