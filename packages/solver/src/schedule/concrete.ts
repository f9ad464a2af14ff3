import type { UnitSystem } from '../units/conversions.js';
import { shownValue } from './columnUnits.js';

type Pieces = {
  block: { concreteVolume: number } | null;
  reverseBlock: { concreteVolume: number } | null;
  anchor: { concreteVolume: number } | null;
};

/** Concrete in a fitting's restraint, m³: its bearing blocks and its gravity anchor (trench pads are bearing, not volume). */
export function restraintConcrete(r: Pieces): number {
  return (r.block?.concreteVolume ?? 0) + (r.reverseBlock?.concreteVolume ?? 0) + (r.anchor?.concreteVolume ?? 0);
}

/**
 * The same concrete as the sheet prints it in `units`, m³: each piece rounded up as its own line shows it
 * (crew sheet, take-off), then added, so that a row, the column's total, the take-off and the route
 * summary all agree with the pieces listed.
 */
export function shownConcrete(r: Pieces, units: UnitSystem): number {
  let v = 0;
  for (const piece of [r.block, r.reverseBlock, r.anchor])
    if (piece) v += shownValue(piece.concreteVolume, 'volume', units);
  return v;
}
