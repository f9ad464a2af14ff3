import type { UnitSystem } from '../units/conversions.js';
import { quantityText } from './columnUnits.js';

/**
 * Joints to restrain along a leg of restrained length `length` (m) when pipes are `layingLength` (m)
 * long and the first joint is at the fitting: every joint closer to the fitting than the restrained
 * length, ⌈L/ℓ⌉ of them (the last pipe reaches past L). None for no restrained length.
 */
export function restrainedJointCount(length: number, layingLength: number): number {
  if (!(length > 0) || !(layingLength > 0)) return 0;
  // A length a rounding hair above a whole number of pipes needs no extra joint.
  return Math.max(1, Math.ceil(length / layingLength - 1e-9));
}

/** m from the fitting along the pipe of each joint to restrain: 0, ℓ, 2ℓ … */
export function restrainedJointPositions(length: number, layingLength: number): number[] {
  return Array.from({ length: restrainedJointCount(length, layingLength) }, (_, k) => k * layingLength);
}

/**
 * The laying length as every output words it ("19.7 ft", "6.0 m"): a length along the line, shown as
 * the chainage column shows one (columnUnits.ts), to the nearest tenth. Not rounded up as a restrained
 * length is: the joints sit a pipe's true length apart, and a 6 m pipe called "20 ft" places them wrongly.
 */
export const layingLengthText = (layingLength: number, units: UnitSystem): string =>
  quantityText(layingLength, 'chainage', units);
