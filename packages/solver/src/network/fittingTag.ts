import type { FittingKind } from './fittingKind.js';

/** Letter codes of the fitting tags: short enough for a plan, distinct, and our own scheme. */
export const TAG_CODES: Record<FittingKind, string> = {
  bend: 'B',
  'reducing-bend': 'RB',
  reducer: 'R',
  tee: 'T',
  wye: 'Y',
  cross: 'X',
  'dead-end': 'E',
  valve: 'V',
  'tie-in': 'TI',
  straight: 'J',
  none: '',
};

/**
 * A fitting's tag: kind code plus the node's own number, so adding or removing other nodes never
 * renumbers it ("n12" bend → "B12"; an id without a trailing number keeps the whole id: "B-crest").
 */
export function fittingTag(kind: FittingKind, nodeId: string): string {
  const digits = /(\d+)$/.exec(nodeId);
  const code = TAG_CODES[kind];
  return digits ? `${code}${digits[1]}` : `${code}-${nodeId}`;
}
