import { STANDARD_GRAVITY } from '../units/quantities.js';
import type { Leg } from '../network/legs.js';

/**
 * Weight of the water in a fitting's body, N, estimated as one inside diameter of pipe per opening
 * (an estimate of the body's size; fitting weights are the maker's). It acts in −z, helps against
 * uplift, and designs usually neglect it (common practice).
 *
 * @param density kg/m³
 */
export function waterWeightInFitting(legs: readonly Leg[], density: number): number {
  let volume = 0;
  for (const leg of legs) volume += leg.flowArea * leg.pipe.insideDiameter;
  return density * STANDARD_GRAVITY * volume;
}
