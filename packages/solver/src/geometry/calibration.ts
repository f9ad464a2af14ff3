import { imageToPlan, RAD, type ImagePoint, type Placement, type PlanXY } from './similarity.js';

// Calibrating a site plan from picked points (the Site plan tab), apart from the transform itself
// (similarity.ts), which the plan draws with: the app loads the tab on first use (docs/performance.md).

const fromFactor = (re: number, im: number, t: PlanXY): Placement => {
  const rotation = Math.atan2(im, re) / RAD;
  return { x: t.x, y: t.y, metresPerPixel: Math.hypot(re, im), rotation: Object.is(rotation, -0) ? 0 : rotation };
};

export type CalibrationResult = { ok: true; placement: Placement } | { ok: false; message: string };

/** Two picked pixels closer than this cannot set a scale worth having. */
const MIN_PICK_PX = 2;

/**
 * The placement that puts image points a and b on plan points A and B: c = (B − A)/(b − a), t = A − c·a.
 */
export function fromTwoPoints(a: ImagePoint, b: ImagePoint, A: PlanXY, B: PlanXY): CalibrationResult {
  const wr = b.u - a.u;
  const wi = -(b.v - a.v);
  const n = wr * wr + wi * wi;
  if (Math.sqrt(n) < MIN_PICK_PX) return { ok: false, message: 'pick two points farther apart on the image' };
  const zr = B.x - A.x;
  const zi = B.y - A.y;
  if (Math.hypot(zr, zi) === 0) return { ok: false, message: 'the two coordinates must be different points' };
  // c = z / w = z·conj(w) / |w|²
  const re = (zr * wr + zi * wi) / n;
  const im = (zi * wr - zr * wi) / n;
  // t = A − c·a, with a as the complex number u − i·v
  const t = { x: A.x - (re * a.u + im * a.v), y: A.y - (-re * a.v + im * a.u) };
  return { ok: true, placement: fromFactor(re, im, t) };
}

/**
 * The placement that puts image points a and b `distance` m apart, keeping the rotation and the plan
 * position of a as they were in `current`.
 */
export function fromDistance(current: Placement, a: ImagePoint, b: ImagePoint, distance: number): CalibrationResult {
  const px = Math.hypot(b.u - a.u, b.v - a.v);
  if (px < MIN_PICK_PX) return { ok: false, message: 'pick two points farther apart on the image' };
  if (!(distance > 0) || !Number.isFinite(distance)) return { ok: false, message: 'the distance must be more than 0' };
  const A = imageToPlan(current, a);
  const next: Placement = { ...current, metresPerPixel: distance / px };
  const moved = imageToPlan(next, a);
  return { ok: true, placement: { ...next, x: next.x + A.x - moved.x, y: next.y + A.y - moved.y } };
}

/** Plan distance, m, between two image pixels under a placement. */
export const planDistance = (p: Placement, a: ImagePoint, b: ImagePoint): number =>
  p.metresPerPixel * Math.hypot(b.u - a.u, b.v - a.v);
