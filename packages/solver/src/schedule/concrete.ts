import type { UnitSystem } from '../units/conversions.js';
import { shownValue } from './columnUnits.js';
import { anchorBox, padThickness } from './settingOut.js';

/** The pieces of concrete the take-off counts, in the order it lists them. */
export type ConcreteElement = 'block' | 'reverseBlock' | 'anchor' | 'pad';

type Pieces = {
  block: { concreteVolume: number } | null;
  reverseBlock: { concreteVolume: number } | null;
  anchor: object | null;
  trenchBottom: { width: number; length: number } | null;
};

/**
 * The concrete a crew pours for one fitting, m³ a piece: blocks face × thickness, an anchor its built box
 * (dimensions rounded up, not the volume required), a trench-bottom pad its width × length × the pad
 * thickness of the register (pad.thickness) for the project's dimension step.
 */
export function concretePieces(r: Pieces, step: number): { element: ConcreteElement; volume: number }[] {
  const out: { element: ConcreteElement; volume: number }[] = [];
  if (r.block) out.push({ element: 'block', volume: r.block.concreteVolume });
  if (r.reverseBlock) out.push({ element: 'reverseBlock', volume: r.reverseBlock.concreteVolume });
  if (r.anchor) {
    const box = anchorBox(r.anchor);
    out.push({ element: 'anchor', volume: box.length * box.width * box.height });
  }
  if (r.trenchBottom)
    out.push({ element: 'pad', volume: r.trenchBottom.width * r.trenchBottom.length * padThickness(step) });
  return out;
}

/** Concrete in a fitting's restraint, m³: blocks, anchor and trench-bottom pad. */
export const restraintConcrete = (r: Pieces, step: number): number =>
  concretePieces(r, step).reduce((v, p) => v + p.volume, 0);

/**
 * The same concrete as the sheet prints it in `units`, m³: each piece rounded up as its own line shows it
 * (crew sheet, take-off), then added, so that a row, the column's total, the take-off and the route
 * summary all agree with the pieces listed.
 */
export const shownConcrete = (r: Pieces, units: UnitSystem, step: number): number =>
  concretePieces(r, step).reduce((v, p) => v + shownValue(p.volume, 'volume', units), 0);
