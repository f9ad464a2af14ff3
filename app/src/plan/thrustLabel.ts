import type { UnitSystem } from '@mainbrace/solver';
import { showColumnForce } from '../format/quantity.js';

/** A part of the thrust under this share of the whole is left out of its label (a few pixels of arrow). */
const MINOR_PART = 0.02;

/**
 * The plan's label of a thrust: its horizontal part, then its vertical part with ↑ or ↓, each only where
 * it is more than a small share of the thrust, so that a crest straight in plan reads "↑ 40.6 kN", not
 * "0.000805 kN ↑ 40.6 kN". One force unit for the whole plan (kN, or kip in US units).
 */
export function thrustLabel(horizontal: number, vertical: number, units: UnitSystem): string {
  const total = Math.hypot(horizontal, vertical);
  const parts: string[] = [];
  if (horizontal > MINOR_PART * total) parts.push(showColumnForce(horizontal, units));
  if (Math.abs(vertical) > MINOR_PART * total)
    parts.push(`${vertical > 0 ? '↑' : '↓'} ${showColumnForce(Math.abs(vertical), units)}`);
  return parts.join('  ');
}
