import { extentOf } from '../format/extent.js';

/**
 * Vertical exaggerations a long section is drawn at: round numbers, so the sheet can state one
 * ("vertical scale 20 × horizontal") and a reader can scale off it.
 */
const NICE = [1, 2, 2.5, 5];

/** The largest round exaggeration not above `raw` (at least 1 unless the raw one is below 1). */
export function niceExaggeration(raw: number): number {
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const decade = 10 ** Math.floor(Math.log10(raw));
  let best = decade;
  for (const n of NICE) if (n * decade <= raw * (1 + 1e-9)) best = n * decade;
  return best;
}

/**
 * The vertical window of a section: the levels in `zs` fit inside `plotHeight` px at a round
 * exaggeration of the horizontal scale `hScale` (px per m). Returns the exaggeration and the window.
 */
export function sectionWindow(
  zs: readonly number[],
  plotHeight: number,
  hScale: number,
): { exaggeration: number; z0: number; z1: number } {
  const [lo, hi] = extentOf(zs);
  const span = Math.max(hi - lo, 0.5) * 1.3;
  const exaggeration = niceExaggeration(plotHeight / span / hScale);
  const window = plotHeight / (exaggeration * hScale);
  const mid = (lo + hi) / 2;
  return { exaggeration, z0: mid - window / 2, z1: mid + window / 2 };
}
