import { panBy, zoomAt, type ScreenPoint } from '../state/viewport.js';
import { distancePx } from './planGeometry.js';
import type { PlanInput } from './planInput.js';

const mid = (a: ScreenPoint, b: ScreenPoint): ScreenPoint => ({ sx: (a.sx + b.sx) / 2, sy: (a.sy + b.sy) / 2 });

/**
 * Two fingers: the view zooms by the change of their spread about where they started and follows
 * their midpoint. Whatever the first finger had begun (a drag, a box) is dropped without effect.
 */
export function startPinch(s: PlanInput, a: number, b: number): PlanInput {
  const pa = s.touches[a]!;
  const pb = s.touches[b]!;
  return {
    ...s,
    gesture: {
      kind: 'pinch',
      a,
      b,
      startDistance: Math.max(1, distancePx(pa, pb)),
      startMid: mid(pa, pb),
      startViewport: s.viewport,
    },
    dragPreview: null,
    selectBox: null,
    hover: { kind: 'none' },
  };
}

export function movePinch(s: PlanInput): PlanInput {
  if (s.gesture.kind !== 'pinch') return s;
  const g = s.gesture;
  const pa = s.touches[g.a];
  const pb = s.touches[g.b];
  if (!pa || !pb) return s;
  const m = mid(pa, pb);
  const zoomed = zoomAt(g.startViewport, g.startMid, distancePx(pa, pb) / g.startDistance);
  return { ...s, viewport: panBy(zoomed, m.sx - g.startMid.sx, m.sy - g.startMid.sy) };
}
