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

export const RAD = Math.PI / 180;

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
