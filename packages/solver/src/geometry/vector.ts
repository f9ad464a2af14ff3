/** A 3-D vector in project axes: x east, y north, z up. Units are the caller's (m, N, ...). */
export type Vec3 = readonly [number, number, number];

export const ZERO: Vec3 = [0, 0, 0];
export const add = (a: Vec3, b: Vec3): Vec3 => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
export const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
export const scale = (a: Vec3, k: number): Vec3 => [a[0] * k, a[1] * k, a[2] * k];
export const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
// Math.sqrt of the squares: Math.hypot is several times slower in V8. The project's hard limits
// (model/limits.ts) keep every coordinate, diameter and force far below where a square overflows.
export const norm = (a: Vec3): number => Math.sqrt(a[0] * a[0] + a[1] * a[1] + a[2] * a[2]);
export const horizontalNorm = (a: Vec3): number => Math.sqrt(a[0] * a[0] + a[1] * a[1]);
export const horizontal = (a: Vec3): Vec3 => [a[0], a[1], 0];
export const negate = (a: Vec3): Vec3 => [-a[0], -a[1], -a[2]];

/** Unit vector along a; the zero vector stays zero. */
export function unit(a: Vec3): Vec3 {
  const n = norm(a);
  return n === 0 ? ZERO : scale(a, 1 / n);
}

/** Angle between two vectors, degrees in [0, 180]; 0 when either is zero. */
export function angleBetween(a: Vec3, b: Vec3): number {
  const na = norm(a);
  const nb = norm(b);
  if (na === 0 || nb === 0) return 0;
  const c = Math.min(1, Math.max(-1, dot(a, b) / (na * nb)));
  return (Math.acos(c) * 180) / Math.PI;
}

/** Slope angle of a direction above the horizontal, degrees in [-90, 90]. */
/**
 * Degrees within which two angles count as equal when one is compared with a limit: the noise of an
 * angle worked out from coordinates (a survey's 6 decimals of a metre over a 50 m pipe turn it by some
 * 10⁻⁶°). A 90° bend from rounded coordinates is 90°, and a 0.5° one is 0.5°.
 */
export const ANGLE_NOISE = 1e-5;

export const slopeAngle = (a: Vec3): number => (Math.atan2(a[2], horizontalNorm(a)) * 180) / Math.PI;

/** Plan bearing of a direction, degrees clockwise from north in [0, 360). */
export function planBearing(a: Vec3): number {
  const deg = (Math.atan2(a[0], a[1]) * 180) / Math.PI;
  return (deg + 360) % 360;
}

/** Sum of vectors. */
export function sum(list: readonly Vec3[]): Vec3 {
  let x = 0;
  let y = 0;
  let z = 0;
  for (const v of list) {
    x += v[0];
    y += v[1];
    z += v[2];
  }
  return [x, y, z];
}
