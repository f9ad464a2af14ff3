import { actionForKey } from '../chrome/actionTable.js';
import { panBy, zoomAt } from '../state/viewport.js';
import { drawClick, drawHover, drawWith } from './drawPointer.js';
import { endPan, movePan, startPan } from './panGesture.js';
import { movePinch, startPinch } from './pinchGesture.js';
import { planCommand } from './planCommands.js';
import { resized } from './planView.js';
import { distancePx, hitAt, touchLike } from './planGeometry.js';
import { selectDown, selectMove, selectUp } from './selectPointer.js';
import { pickUnderlayPoint, picking } from './calibratePick.js';
import { typedEnter, typedKey } from './typedTool.js';
import {
  DRAG_PX,
  HIT_PX,
  IDLE_GESTURE,
  type PlanDerived,
  type PlanEvent,
  type PlanInput,
  type PlanIntent,
} from './planInput.js';

export interface DispatchResult {
  state: PlanInput;
  intents: PlanIntent[];
  /** the event was used (the page should not also act on it: scroll, tab to the next control…) */
  handled: boolean;
}

const NO_DERIVED: PlanDerived = { fittingOrder: () => [] };

const withTouch = (s: PlanInput, id: number, at: PlanEvent & { at: { sx: number; sy: number } }) => ({
  ...s,
  touches: { ...s.touches, [id]: at.at },
});

function withoutTouch(s: PlanInput, id: number): PlanInput {
  if (!(id in s.touches)) return s;
  const touches = { ...s.touches };
  delete touches[id];
  return { ...s, touches };
}

/**
 * The plan's one input handler: a pure function from the plan state and an event to the next state
 * and the edits it asks for. Pointer, wheel, key and command events all come here, whatever the tool;
 * tools are states of it (select, draw, pan) with their own small files.
 */
export function dispatch(s: PlanInput, e: PlanEvent, derived: PlanDerived = NO_DERIVED): DispatchResult {
  const done = (state: PlanInput, intents: PlanIntent[] = []): DispatchResult => ({ state, intents, handled: true });
  switch (e.type) {
    case 'resize':
      return done(resized(s, e.width, e.height));
    case 'pointerDown': {
      let t = s;
      if (touchLike(e.pointer)) {
        t = withTouch(s, e.id, e);
        const ids = Object.keys(t.touches).map(Number);
        if (ids.length >= 2) return done(startPinch({ ...t, draw: t.draw }, ids[0]!, ids[1]!));
      }
      if (e.button === 1 || t.tool === 'pan' || t.spaceHeld) return done(startPan(t, e.id, e.at, false));
      if (e.button !== 0) return { state: t, intents: [], handled: false };
      // Calibrating the site plan: a click picks a point on the image, whatever the tool.
      if (picking(t)) return done(pickUnderlayPoint(t, e.at));
      if (t.tool === 'draw') {
        if (touchLike(e.pointer))
          return done({
            ...t,
            gesture: { kind: 'drawPress', pointer: e.id, start: e.at, last: e.at, panning: false, alt: e.alt },
          });
        const r = drawClick(t, e.at, e.pointer, e.alt);
        return done(r.state, r.intents);
      }
      return done(selectDown(t, e.id, e.pointer, e.at, e.shift));
    }
    case 'pointerMove': {
      const t = e.id in s.touches ? withTouch(s, e.id, e) : s;
      const g = t.gesture;
      switch (g.kind) {
        case 'pinch':
          return done(movePinch(t));
        case 'pan':
          return done(g.pointer === e.id ? movePan(t, e.at) : t);
        case 'drawPress': {
          if (g.pointer !== e.id) return done(t);
          const panning = g.panning || distancePx(e.at, g.start) >= DRAG_PX.touch;
          const viewport = panning ? panBy(t.viewport, e.at.sx - g.last.sx, e.at.sy - g.last.sy) : t.viewport;
          return done({ ...t, viewport, gesture: { ...g, panning, last: e.at } });
        }
        case 'select':
          return done(g.pointer === e.id ? selectMove(t, e.pointer, e.at) : t);
        case 'spent':
          return done(t);
        case 'idle':
          // Hover: what a click here would select or join. Touch has no hover.
          if (touchLike(e.pointer)) return done(t);
          if (t.tool === 'draw') return done(drawHover(t, e.at, e.pointer, e.alt));
          if (t.tool === 'select') return done({ ...t, hover: hitAt(t, e.at, HIT_PX.mouse) });
          return done(t);
      }
      return done(t);
    }
    case 'pointerUp': {
      const t = withoutTouch(s, e.id);
      const g = t.gesture;
      const fingersLeft = Object.keys(t.touches).length;
      switch (g.kind) {
        case 'pinch':
          return done({ ...t, gesture: fingersLeft ? { kind: 'spent' } : IDLE_GESTURE });
        case 'spent':
          return done(fingersLeft ? t : { ...t, gesture: IDLE_GESTURE });
        case 'pan':
          return done(g.pointer === e.id ? endPan(t, e.at, DRAG_PX[e.pointer === 'mouse' ? 'mouse' : 'touch']) : t);
        case 'drawPress': {
          if (g.pointer !== e.id) return done(t);
          const idle = { ...t, gesture: IDLE_GESTURE };
          if (g.panning) return done(idle);
          const r = drawClick(idle, g.start, e.pointer, g.alt);
          return done(r.state, r.intents);
        }
        case 'select': {
          if (g.pointer !== e.id) return done(t);
          const r = selectUp(t, e.pointer, e.at);
          return done(r.state, r.intents);
        }
        default:
          return done(t);
      }
    }
    case 'pointerCancel': {
      const t = withoutTouch(s, e.id);
      return done({ ...t, gesture: IDLE_GESTURE, dragPreview: null, selectBox: null });
    }
    case 'pointerLeave': {
      if (s.gesture.kind !== 'idle') return done(s);
      // A pointer off the plan (or over its typed-entry box) aims nowhere: a bare typed length goes straight on.
      const draw = s.draw.phase === 'drawing' ? { ...s.draw, cursor: null } : s.draw;
      return done({ ...s, hover: { kind: 'none' }, draw });
    }
    case 'doubleClick': {
      if (s.tool !== 'draw') return { state: s, intents: [], handled: false };
      const r = drawWith(s, { type: 'finish' });
      return done(r.state, r.intents);
    }
    case 'wheel':
      return done({ ...s, viewport: zoomAt(s.viewport, e.at, Math.exp(-e.deltaY * 0.0015)) });
    case 'key': {
      const typing = typedKey(s, e.key, e.ctrl || e.meta || e.alt);
      if (typing) return done(typing.state, typing.intents);
      if (e.key === ' ' && !e.ctrl && !e.meta) return done({ ...s, spaceHeld: true });
      if (e.key === 'Escape' && s.underlayPick) return done({ ...s, underlayPick: null });
      const action = actionForKey(e);
      if (!action || (action.scope === 'plan' && !e.planFocused)) return { state: s, intents: [], handled: false };
      // Enter on a plan with nothing to finish or open is left to the page.
      const r = planCommand(s, action.name, derived);
      return { ...r, handled: action.name !== 'finish' || r.state !== s || r.intents.length > 0 };
    }
    case 'keyUp':
      return e.key === ' ' ? done({ ...s, spaceHeld: false }) : { state: s, intents: [], handled: false };
    case 'typedText':
      return done({ ...s, typed: e.text, typedError: null });
    case 'typedEnter': {
      const r = typedEnter(s);
      return done(r.state, r.intents);
    }
    case 'command': {
      const r = planCommand(s, e.name, derived);
      return done(r.state, r.intents);
    }
  }
}
