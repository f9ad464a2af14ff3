import { hitTest } from '../plan/hitTest.js';
import { toPlan, type ScreenPoint } from '../state/viewport.js';
import type { Hit } from './hit.js';
import type { PlanInput, PointerKind } from './planInput.js';

/** The plan point under a screen point. */
export const planAt = (s: PlanInput, at: ScreenPoint) => toPlan(s.viewport, at);

/** What lies within `px` screen pixels of a screen point. */
export const hitAt = (s: PlanInput, at: ScreenPoint, px: number): Hit =>
  hitTest(s.project, planAt(s, at), px / s.viewport.scale);

export const distancePx = (a: ScreenPoint, b: ScreenPoint) => Math.hypot(a.sx - b.sx, a.sy - b.sy);

export const touchLike = (p: PointerKind) => p === 'touch' || p === 'pen';
