import type { UnitSystem } from '../units/conversions.js';
import { shownDimension } from '../units/format.js';
import { shownValue } from './columnUnits.js';
import { anchorBox, padThickness } from './settingOut.js';

/** The pieces of concrete the take-off counts, in the order it lists them. */
export type ConcreteElement = 'block' | 'reverseBlock' | 'anchor' | 'pad';

type Block = { faceWidth: number; faceHeight: number; depth: number };
type Pieces = {
  block: Block | null;
  reverseBlock: Block | null;
  anchor: object | null;
  trenchBottom: { width: number; length: number } | null;
};

/**
 * m³, a box as a crew builds it from the sheet in `units`: each dimension as shown (rounded up to the
 * centimetre, or to the inch in US units), then multiplied. In SI on the usual steps it is the sized box.
 */
const builtBox = (a: number, b: number, c: number, units: UnitSystem): number =>
  shownDimension(a, units) * shownDimension(b, units) * shownDimension(c, units);

/** m³, a bearing block's concrete as built in `units`: face width × face height × thickness. */
export const blockConcrete = (b: Block, units: UnitSystem): number =>
  builtBox(b.faceWidth, b.faceHeight, b.depth, units);

/** m³, a gravity anchor's concrete as built in `units`: its box (dimensions rounded up, not the volume required). */
export function anchorConcrete(anchor: object, units: UnitSystem): number {
  const box = anchorBox(anchor);
  return builtBox(box.length, box.width, box.height, units);
}

/**
 * The concrete a crew pours for one fitting, m³ a piece, as built from the sheet in `units`: blocks face ×
 * thickness, an anchor its built box, a trench-bottom pad its width × length × the pad thickness of the
 * register (pad.thickness) for the project's dimension step.
 */
export function concretePieces(
  r: Pieces,
  step: number,
  units: UnitSystem,
): { element: ConcreteElement; volume: number }[] {
  const out: { element: ConcreteElement; volume: number }[] = [];
  if (r.block) out.push({ element: 'block', volume: blockConcrete(r.block, units) });
  if (r.reverseBlock) out.push({ element: 'reverseBlock', volume: blockConcrete(r.reverseBlock, units) });
  if (r.anchor) out.push({ element: 'anchor', volume: anchorConcrete(r.anchor, units) });
  if (r.trenchBottom)
    out.push({
      element: 'pad',
      volume: builtBox(r.trenchBottom.width, r.trenchBottom.length, padThickness(step), units),
    });
  return out;
}

/** Concrete in a fitting's restraint, m³ as built in SI: blocks, anchor and trench-bottom pad. */
export const restraintConcrete = (r: Pieces, step: number): number =>
  concretePieces(r, step, 'si').reduce((v, p) => v + p.volume, 0);

/**
 * The same concrete as the sheet prints it in `units`, m³: each piece rounded up as its own line shows it
 * (crew sheet, take-off), then added, so that a row, the column's total, the take-off and the route
 * summary all agree with the pieces listed.
 */
export const shownConcrete = (r: Pieces, units: UnitSystem, step: number): number =>
  concretePieces(r, step, units).reduce((v, p) => v + shownValue(p.volume, 'volume', units), 0);
