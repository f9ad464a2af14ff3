import type { UnitSystem } from '../units/conversions.js';
import { planBearing } from '../geometry/vector.js';
import { quantityText } from './columnUnits.js';
import {
  anchorForceText,
  anchorText,
  baseDownOf,
  blockForceText,
  blockText,
  padForceText,
  padText,
  restrainedLegText,
} from './restraintText.js';
import type { ScheduleFitting } from './scheduleRows.js';
import { anchorConcrete, blockConcrete } from './concrete.js';

/** What a fitting is held by, one element each; a fitting may need several. */
export type RestraintElementKind = 'block' | 'reverseBlock' | 'anchor' | 'trenchBottom' | 'joints';

/** Words for each element after the fitting's mark: "A4 block", "A4 anchor". */
export const ELEMENT_WORD: Record<RestraintElementKind, string> = {
  block: 'block',
  reverseBlock: 'opposite block',
  anchor: 'anchor',
  trenchBottom: 'bottom pad',
  joints: 'joints',
};

/**
 * The name of a restraint element where it is listed on its own: the mark of the fitting it holds
 * and what it is ("A4 block", "A4 anchor"). The element has no number of its own, so a crew finds
 * it by the fitting.
 */
export const elementName = (mark: string, kind: RestraintElementKind): string => `${mark} ${ELEMENT_WORD[kind]}`;

export interface RestraintElement {
  kind: RestraintElementKind;
  /** "A4 block" */
  name: string;
  /** what to build, in display units */
  text: string;
  /** N, the force the element takes (the thrust part it holds; null for joints, which take the whole) */
  force: number | null;
  /** which way it bears: a plan bearing for a block, "up" for an anchor, "down" for a pad */
  bears: 'up' | 'down' | number | null;
  /** the force and its way, in words: "bears 113° SE, 2.48 kN", "holds 16.5 kN up" */
  forceText: string;
}

/** The restraint of one schedule row as separate elements, each named by the fitting's mark. */
export function restraintElements(f: ScheduleFitting, units: UnitSystem, step: number): RestraintElement[] {
  const r = f.restraint;
  const vol = (v: number) => quantityText(v, 'volume', units);
  const out: RestraintElement[] = [];
  const add = (
    kind: RestraintElementKind,
    text: string,
    force: number | null,
    bears: RestraintElement['bears'],
    forceText: string,
  ) => out.push({ kind, name: elementName(f.mark, kind), text, force, bears, forceText });
  if (r.block)
    add(
      'block',
      `${blockText(r.block, units)}, ${vol(blockConcrete(r.block, units))}`,
      r.block.thrust,
      planBearing(r.block.direction),
      blockForceText(r.block, units, baseDownOf(f)),
    );
  if (r.reverseBlock)
    add(
      'reverseBlock',
      `${blockText(r.reverseBlock, units)}, ${vol(blockConcrete(r.reverseBlock, units))}`,
      r.reverseBlock.thrust,
      planBearing(r.reverseBlock.direction),
      blockForceText(r.reverseBlock, units),
    );
  if (r.anchor)
    add(
      'anchor',
      `${anchorText(r.anchor, units)}, ${vol(anchorConcrete(r.anchor, units))}`,
      r.anchor.upwardThrust,
      'up',
      anchorForceText(r.anchor, units),
    );
  if (r.trenchBottom)
    add(
      'trenchBottom',
      padText(r.trenchBottom, step, units),
      f.downwardThrust,
      'down',
      padForceText(f.downwardThrust, units),
    );
  for (const leg of r.restrainedLegs) add('joints', restrainedLegText(leg, units), null, null, '');
  return out;
}
