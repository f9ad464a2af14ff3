import { panBy, type ScreenPoint } from '../state/viewport.js';
import { EMPTY_SELECTION } from '../state/slices.js';
import { distancePx } from './planGeometry.js';
import { IDLE_GESTURE, type PlanInput } from './planInput.js';

/** The pan tool and every drag of empty ground: the view follows the pointer. */
export function startPan(s: PlanInput, pointer: number, at: ScreenPoint, clearOnClick: boolean): PlanInput {
  return { ...s, gesture: { kind: 'pan', pointer, start: at, last: at, clearOnClick }, hover: { kind: 'none' } };
}

export function movePan(s: PlanInput, at: ScreenPoint): PlanInput {
  if (s.gesture.kind !== 'pan') return s;
  const g = s.gesture;
  return { ...s, viewport: panBy(s.viewport, at.sx - g.last.sx, at.sy - g.last.sy), gesture: { ...g, last: at } };
}

/** Ends a pan; a press that hardly moved on empty ground is a click there, which clears the selection. */
export function endPan(s: PlanInput, at: ScreenPoint, clickPx: number): PlanInput {
  if (s.gesture.kind !== 'pan') return s;
  const click = s.gesture.clearOnClick && distancePx(at, s.gesture.start) < clickPx;
  return { ...s, gesture: IDLE_GESTURE, ...(click ? { selection: EMPTY_SELECTION } : {}) };
}
