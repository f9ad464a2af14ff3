import { readsZero, type UnitSystem } from '@mainbrace/solver';
import { showColumnForce } from '../format/quantity.js';

/** A part of the thrust under this share of the whole is left out of its label (a few pixels of arrow). */
const MINOR_PART = 0.02;

/**
 * The plan's label of a thrust: its horizontal part, then its vertical part with ↑ or ↓, each only where
 * it is more than a small share of the thrust, so that a crest straight in plan reads "↑ 40.6 kN", not
 * "0.000805 kN ↑ 40.6 kN", and a part that reads as nothing at the force column's precision is left out too.
 * One force unit and precision for the plan, the panel and the schedule (columnUnits.ts).
 */
export function thrustLabel(horizontal: number, vertical: number, units: UnitSystem): string {
  const total = Math.hypot(horizontal, vertical);
  const parts: string[] = [];
  const shown = (part: number) => part > MINOR_PART * total && !readsZero(part, 'force', units);
  if (shown(horizontal)) parts.push(showColumnForce(horizontal, units));
  if (shown(Math.abs(vertical)))
    parts.push(`${vertical > 0 ? '↑' : '↓'} ${showColumnForce(Math.abs(vertical), units)}`);
  return parts.join('  ');
}
