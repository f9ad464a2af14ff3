import type { PlanPoint } from '../state/documentEdits.js';

/** The standard bend deflections a drawn turn snaps to, degrees (11¼°, 22½°, 45°, 90° fittings). */
export const STANDARD_DEFLECTIONS = [0, 11.25, 22.5, 45, 90] as const;
/** Turns sharper than this are left free: no standard bend is near. */
const LARGEST_SNAPPED_TURN = 100;
/** Without a previous segment, the direction snaps to multiples of this, degrees. */
const FREE_BEARING_STEP = 11.25;

const deg = (r: number) => (r * 180) / Math.PI;
const rad = (d: number) => (d * Math.PI) / 180;

/** Signed turn from direction a to direction b, degrees in (−180, 180], counter-clockwise positive. */
export function signedTurn(a: PlanPoint, b: PlanPoint): number {
  return deg(Math.atan2(a.x * b.y - a.y * b.x, a.x * b.x + a.y * b.y));
}

function nearestStandard(turn: number): number {
  const sign = Math.sign(turn) || 1;
  let best = 0;
  for (const d of STANDARD_DEFLECTIONS) if (Math.abs(Math.abs(turn) - d) < Math.abs(Math.abs(turn) - best)) best = d;
  return sign * best;
}

/**
 * The end of a segment drawn from `from` toward `raw`: its turn from the previous segment snapped to
 * the nearest standard bend (or, for a first segment, its direction to 11¼° steps), and its length
 * to a whole number of `step` metres.
 */
export function snapSegment(from: PlanPoint, previous: PlanPoint | null, raw: PlanPoint, step: number): PlanPoint {
  const d = { x: raw.x - from.x, y: raw.y - from.y };
  const length = Math.hypot(d.x, d.y);
  if (length === 0) return raw;
  let angle = Math.atan2(d.y, d.x);
  if (previous) {
    const turn = signedTurn(previous, d);
    if (Math.abs(turn) <= LARGEST_SNAPPED_TURN) angle = Math.atan2(previous.y, previous.x) + rad(nearestStandard(turn));
  } else {
    angle = rad(Math.round(deg(angle) / FREE_BEARING_STEP) * FREE_BEARING_STEP);
  }
  const snappedLength = Math.max(step, Math.round(length / step) * step);
  return { x: from.x + snappedLength * Math.cos(angle), y: from.y + snappedLength * Math.sin(angle) };
}
