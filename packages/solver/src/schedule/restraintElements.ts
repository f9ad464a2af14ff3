import type { UnitSystem } from '../units/conversions.js';
import { quantityText } from './columnUnits.js';
import { anchorText, blockText, padText, restrainedLegText } from './restraintText.js';
import type { ScheduleFitting } from './scheduleRows.js';

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
}

/** The restraint of one schedule row as separate elements, each named by the fitting's mark. */
export function restraintElements(f: ScheduleFitting, units: UnitSystem, step: number): RestraintElement[] {
  const r = f.restraint;
  const vol = (v: number) => quantityText(v, 'volume', units);
  const out: RestraintElement[] = [];
  const add = (kind: RestraintElementKind, text: string) => out.push({ kind, name: elementName(f.mark, kind), text });
  if (r.block) add('block', `${blockText(r.block, units)}, ${vol(r.block.concreteVolume)}`);
  if (r.reverseBlock) add('reverseBlock', `${blockText(r.reverseBlock, units)}, ${vol(r.reverseBlock.concreteVolume)}`);
  if (r.anchor) add('anchor', `${anchorText(r.anchor, units)}, ${vol(r.anchor.concreteVolume)}`);
  if (r.trenchBottom) add('trenchBottom', padText(r.trenchBottom, step, units));
  for (const leg of r.restrainedLegs) add('joints', restrainedLegText(leg, units));
  return out;
}
