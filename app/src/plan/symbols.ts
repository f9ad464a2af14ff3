import type { FittingKind } from '@mainbrace/solver';
import { LINE } from './palette.js';

/**
 * Mainbrace's fitting symbols (docs/visual-guide.md), drawn alike on the plan canvas, in the legend and
 * on the print. Paths are in px about the fitting, +x along the first pipe and y down; a symbol turns
 * with its pipe unless `turns` is false. Each kind has its own outline, so no kind needs colour.
 */
export interface Glyph {
  /** SVG path data */
  d: string;
  fill: 'paper' | 'ink' | 'none';
  /** px stroke; 0 for none */
  stroke: number;
  /** a filled ink dot at the centre, its radius px */
  dot?: number;
  /** a letter inside the outline */
  letter?: string;
  turns: boolean;
}

const SQUARE = 'M -6 -6 H 6 V 6 H -6 Z';
const TRAPEZOID = 'M -6 -6 L 6 -2.7 L 6 2.7 L -6 6 Z';

export const GLYPHS: Record<FittingKind, Glyph> = {
  bend: {
    d: 'M 4.8 0 A 4.8 4.8 0 1 1 -4.8 0 A 4.8 4.8 0 1 1 4.8 0 Z',
    fill: 'paper',
    stroke: LINE.symbol,
    turns: false,
  },
  reducer: { d: TRAPEZOID, fill: 'paper', stroke: LINE.symbol, turns: true },
  'reducing-bend': { d: TRAPEZOID, fill: 'paper', stroke: LINE.symbol, dot: 2, turns: true },
  tee: { d: SQUARE, fill: 'paper', stroke: LINE.symbol, letter: 'T', turns: true },
  wye: { d: SQUARE, fill: 'paper', stroke: LINE.symbol, letter: 'Y', turns: true },
  cross: { d: SQUARE, fill: 'paper', stroke: LINE.symbol, letter: '+', turns: true },
  'dead-end': { d: 'M 0 -7.2 V 7.2', fill: 'none', stroke: 3.2, turns: true },
  valve: { d: 'M -6 -4.8 L 6 4.8 L 6 -4.8 L -6 4.8 Z', fill: 'ink', stroke: 1, turns: true },
  'tie-in': { d: 'M 0 -5.5 L 5.5 0 L 0 5.5 L -5.5 0 Z', fill: 'paper', stroke: 1.3, turns: false },
  straight: { d: 'M 3 0 A 3 3 0 1 1 -3 0 A 3 3 0 1 1 3 0 Z', fill: 'ink', stroke: 1, turns: false },
  none: { d: 'M 3 0 A 3 3 0 1 1 -3 0 A 3 3 0 1 1 3 0 Z', fill: 'paper', stroke: 1.2, turns: false },
};

/** The kinds the legend explains, in the order a crew meets them most. */
export const LEGEND_KINDS: readonly FittingKind[] = [
  'bend',
  'tee',
  'wye',
  'cross',
  'reducer',
  'reducing-bend',
  'valve',
  'dead-end',
  'tie-in',
];
