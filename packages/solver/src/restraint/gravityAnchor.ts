import { value, type CalcStep } from '../analysis/calcRecord.js';
import { roundUpTo } from './rounding.js';
import { concreteWeight, type FittingSite } from './site.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';

export interface GravityAnchorInput {
  /** N, largest upward thrust over the states */
  upward: number;
  /** N, largest horizontal thrust, which the anchor's base friction can also take */
  horizontal: number;
  safetyFactor: number;
  /** N/m³, unit weight of the concrete */
  concreteUnitWeight: number;
  site: FittingSite;
  /** build the calculation record too */
  record?: boolean;
}

export interface GravityAnchor {
  /** m³, required concrete volume SF·T_up/γ */
  concreteVolume: number;
  /** m, side of a cube of at least that volume, rounded up to the step (for drawing and ordering) */
  side: number;
  /** N/m³, unit weight used (submerged where groundwater reaches the block) */
  unitWeight: number;
  submerged: boolean;
  /** N, horizontal thrust at the same fitting */
  horizontalThrust: number;
  /** N, base friction W′·tan(⅔φ) of the required volume */
  baseFriction: number;
}

/**
 * Dead-weight anchor for an upward thrust (domain reference §5.2, DIPRA form V = S_f·T_v/W_m, from
 * memory). The block hangs below the pipe: it counts as submerged (γc − γw, §5.3) when the highest
 * groundwater stands above its bottom. Base friction uses tan(⅔φ) for concrete cast on soil (common
 * practice).
 */
export function sizeGravityAnchor(i: GravityAnchorInput): {
  anchor: GravityAnchor;
  steps: CalcStep[];
  diagnostics: Diagnostic[];
} {
  const { site } = i;
  const volumeAt = (unitWeight: number) => (i.safetyFactor * i.upward) / unitWeight;
  const drySide = roundUpTo(Math.cbrt(volumeAt(i.concreteUnitWeight)), site.step);
  const submerged = site.groundwater !== null && site.groundwater > site.invert - drySide;
  const unitWeight = concreteWeight(i.concreteUnitWeight, site, submerged);
  const concreteVolume = volumeAt(unitWeight);
  const side = roundUpTo(Math.cbrt(concreteVolume), site.step);
  const baseFriction = unitWeight * concreteVolume * Math.tan(((2 / 3) * site.soil.frictionAngle * Math.PI) / 180);
  const diagnostics = submerged ? [diagnostic('anchor.submerged', {}, { unitWeight })] : [];
  const steps: CalcStep[] = !i.record
    ? []
    : [
        {
          title: 'Gravity anchor volume',
          formula: submerged ? 'V = SF · T_up / (γc − γw)' : 'V = SF · T_up / γc',
          inputs: [
            value('T_up', 'largest upward thrust', i.upward, 'force', 'momentum balance'),
            value('SF', 'uplift safety factor', i.safetyFactor, 'ratio', 'project design'),
            value(
              'γ',
              submerged ? 'submerged unit weight of concrete' : 'unit weight of concrete',
              unitWeight,
              'unitWeight',
              'project design',
            ),
          ],
          result: value('V', 'concrete volume', concreteVolume, 'volume', 'computed'),
          reference:
            'Weight ≥ SF × upward thrust (DIPRA gravity block, unverified); submerged weight γc − γw below groundwater',
        },
        {
          title: 'Horizontal thrust at the anchor',
          formula: 'F_f = W′ · tan(⅔·φ)',
          inputs: [
            value('T_h', 'largest horizontal thrust', i.horizontal, 'force', 'momentum balance'),
            value('φ', 'soil friction angle', site.soil.frictionAngle, 'angle', 'soil'),
          ],
          result: value('F_f', 'base friction of the anchor', baseFriction, 'force', 'computed'),
          reference: 'Sliding resistance of a cast-in-place base (common practice)',
        },
      ];
  return {
    anchor: { concreteVolume, side, unitWeight, submerged, horizontalThrust: i.horizontal, baseFriction },
    steps,
    diagnostics,
  };
}
