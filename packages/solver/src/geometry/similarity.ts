/**
 * Placing an image on the plan: a similarity transform (uniform scale, rotation, shift; no shear) from
 * image pixels (u right, v down, from the top-left corner) to plan metres (x east, y north).
 *
 *   plan = (x, y) + s · R(θ) · (u, −v)
 *
 * Written with complex numbers, w = u − i·v and z = x + i·y, it is z = t + c·w with c = s·e^{iθ}:
 * two point pairs fix c and t, which is why two picked points calibrate an image.
 */

/** A point on the image, px from its top-left corner, v down. */
export interface ImagePoint {
  u: number;
  v: number;
}

/** A point on the plan, m. */
export interface PlanXY {
  x: number;
  y: number;
}

/** Where an image lies on the plan: its top-left corner, its scale and its rotation. */
export interface Placement {
  /** m, plan position of pixel (0, 0) */
  x: number;
  y: number;
  /** m per pixel, > 0 */
  metresPerPixel: number;
  /** degrees counterclockwise from plan east to the image's rows */
  rotation: number;
}

const RAD = Math.PI / 180;

/** c = s·e^{iθ} as its real and imaginary parts. */
const factor = (p: Placement) => ({
  re: p.metresPerPixel * Math.cos(p.rotation * RAD),
  im: p.metresPerPixel * Math.sin(p.rotation * RAD),
});

/** The plan point under an image pixel. */
export function imageToPlan(p: Placement, q: ImagePoint): PlanXY {
  const c = factor(p);
  const wr = q.u;
  const wi = -q.v;
  return { x: p.x + c.re * wr - c.im * wi, y: p.y + c.re * wi + c.im * wr };
}

/** The image pixel under a plan point (the inverse of imageToPlan). */
export function planToImage(p: Placement, z: PlanXY): ImagePoint {
  const c = factor(p);
  const dr = z.x - p.x;
  const di = z.y - p.y;
  const n = c.re * c.re + c.im * c.im;
  // w = (z − t) / c = (z − t)·conj(c) / |c|²
  const wr = (dr * c.re + di * c.im) / n;
  const wi = (di * c.re - dr * c.im) / n;
  return { u: wr, v: -wi };
}

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
