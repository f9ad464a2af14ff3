import { planToImage } from '@mainbrace/solver';
import type { ScreenPoint } from '../state/viewport.js';
import { planAt } from './planGeometry.js';
import type { PlanInput } from './planInput.js';

/** Picking two points on the site plan to calibrate it: a tool state entered from the Site plan tab. */
export const picking = (s: PlanInput): boolean =>
  s.underlayPick !== null && s.underlayPick.length < 2 && s.project.underlay !== undefined;

/** A click while picking: the image pixel under it is kept (so it stays on the image's feature). */
export function pickUnderlayPoint(s: PlanInput, at: ScreenPoint): PlanInput {
  const u = s.project.underlay;
  if (!u || !s.underlayPick || s.underlayPick.length >= 2) return s;
  return { ...s, underlayPick: [...s.underlayPick, planToImage(u, planAt(s, at))] };
}
