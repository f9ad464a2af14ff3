import { FOOT } from '@mainbrace/solver';
import type { ScreenPoint } from '../state/viewport.js';
import { drawStep, type DrawContext, type DrawEvent } from './drawTool.js';
import { hitAt, planAt } from './planGeometry.js';
import { ATTACH_PX, HIT_PX, type PlanInput, type PlanIntent, type PointerKind } from './planInput.js';

const context = (s: PlanInput, free: boolean): DrawContext => ({
  snapping: s.snapping && !free,
  lengthStep: s.units === 'us' ? 5 * FOOT : 1,
  samePoint: 3 / s.viewport.scale,
});

/** What a click at this screen point would join: a node or pipe within the attach tolerance (when snapping). */
export function attachHit(s: PlanInput, at: ScreenPoint, pointer: PointerKind, free: boolean) {
  // With snapping off, only a click on a node or pipe (the select tool's reach) joins it.
  const kind = pointer === 'mouse' ? 'mouse' : 'touch';
  const px = s.snapping && !free ? ATTACH_PX[kind] : HIT_PX[kind];
  return hitAt(s, at, px);
}

/** One step of the draw tool, with its commit turned into an edit of the design. */
export function drawWith(s: PlanInput, event: DrawEvent, free = false): { state: PlanInput; intents: PlanIntent[] } {
  const out = drawStep(s.draw, event, context(s, free));
  const intents: PlanIntent[] = out.commit ? [{ kind: 'addRun', ...out.commit }] : [];
  return { state: { ...s, draw: out.state }, intents };
}

/** A click of the draw tool at a screen point: start, add a bend, or join a node or pipe and finish. */
export function drawClick(s: PlanInput, at: ScreenPoint, pointer: PointerKind, free: boolean) {
  const hit = attachHit(s, at, pointer, free);
  const r = drawWith(s, { type: 'click', at: planAt(s, at), hit }, free);
  return { ...r, state: { ...r.state, hover: hit } };
}

/** The pointer moving with the draw tool: the rubber band follows, and what it would join is shown. */
export function drawHover(s: PlanInput, at: ScreenPoint, pointer: PointerKind, free: boolean): PlanInput {
  const hit = attachHit(s, at, pointer, free);
  const next = s.draw.phase === 'drawing' ? drawWith(s, { type: 'move', at: planAt(s, at), hit }, free).state : s;
  return { ...next, hover: hit };
}
