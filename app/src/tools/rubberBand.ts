import type { PlanPoint } from '../state/documentEdits.js';
import type { DrawState } from './drawTool.js';
import { signedTurn } from './snapping.js';

// The run being drawn as the plan shows it (plan/drawOverlay.ts), apart from the draw tool's steps
// (drawTool.ts), which load with the input tools on first use (docs/performance.md).

type Drawing = Extract<DrawState, { phase: 'drawing' }>;

export function lastPoint(s: Drawing): PlanPoint {
  return s.vertices.length ? s.vertices[s.vertices.length - 1]! : s.startPoint;
}

export function previousDirection(s: Drawing): PlanPoint | null {
  const pts = [s.startPoint, ...s.vertices];
  if (pts.length < 2) return null;
  const a = pts[pts.length - 2]!;
  const b = pts[pts.length - 1]!;
  return { x: b.x - a.x, y: b.y - a.y };
}

/** The rubber-band segment while drawing, with its live length (m) and turn from the previous segment (°). */
export function rubberBand(
  state: DrawState,
): { from: PlanPoint; to: PlanPoint; length: number; deflection: number | null } | null {
  if (state.phase !== 'drawing' || !state.cursor) return null;
  const from = lastPoint(state);
  const to = state.cursor;
  const d = { x: to.x - from.x, y: to.y - from.y };
  const prev = previousDirection(state);
  const length = Math.hypot(d.x, d.y);
  return { from, to, length, deflection: prev && length > 0 ? Math.abs(signedTurn(prev, d)) : null };
}
