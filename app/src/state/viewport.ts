import type { PlanPoint } from './documentEdits.js';

/** A point on the screen, CSS pixels from the plan canvas's top-left corner, y down. */
export interface ScreenPoint {
  sx: number;
  sy: number;
}

/**
 * The view of the plan: `scale` pixels per metre and the plan point at the canvas's top-left
 * corner. This module is the only bridge between plan metres (y north, up) and screen pixels (y down).
 */
export interface Viewport {
  scale: number;
  left: number;
  top: number;
}

export const toScreen = (v: Viewport, p: PlanPoint): ScreenPoint => ({
  sx: (p.x - v.left) * v.scale,
  sy: (v.top - p.y) * v.scale,
});

export const toPlan = (v: Viewport, s: ScreenPoint): PlanPoint => ({
  x: v.left + s.sx / v.scale,
  y: v.top - s.sy / v.scale,
});

/** Zooms by `factor` keeping the plan point under the screen point `at` where it is. */
export function zoomAt(v: Viewport, at: ScreenPoint, factor: number): Viewport {
  const scale = Math.min(2000, Math.max(0.005, v.scale * factor));
  const anchor = toPlan(v, at);
  return { scale, left: anchor.x - at.sx / scale, top: anchor.y + at.sy / scale };
}

/** The same scale, moved so that a plan point sits in the middle of a width × height canvas. */
export const centreOn = (v: Viewport, p: PlanPoint, width: number, height: number): Viewport => ({
  scale: v.scale,
  left: p.x - width / 2 / v.scale,
  top: p.y + height / 2 / v.scale,
});

/** Moves the view by a screen-pixel drag. */
export const panBy = (v: Viewport, dsx: number, dsy: number): Viewport => ({
  ...v,
  left: v.left - dsx / v.scale,
  top: v.top + dsy / v.scale,
});

/** The view that shows every point with a margin, for a canvas of width × height pixels. */
/** Margin around a fitted route, px: room for the longest thrust arrow (72 px) and its label. */
const FIT_MARGIN = 100;

export function fitView(points: readonly PlanPoint[], width: number, height: number, margin = FIT_MARGIN): Viewport {
  if (points.length === 0 || width <= 2 * margin || height <= 2 * margin) {
    // Nothing to fit: 250 m across the shorter side, centred on the plan origin.
    const scale = Math.max(0.05, Math.min(width, height) / 250);
    return { scale, left: -width / 2 / scale, top: height / 2 / scale };
  }
  let minX = Infinity,
    maxX = -Infinity,
    minY = Infinity,
    maxY = -Infinity;
  for (const p of points) {
    minX = Math.min(minX, p.x);
    maxX = Math.max(maxX, p.x);
    minY = Math.min(minY, p.y);
    maxY = Math.max(maxY, p.y);
  }
  const spanX = Math.max(maxX - minX, 10);
  const spanY = Math.max(maxY - minY, 10);
  const scale = Math.min((width - 2 * margin) / spanX, (height - 2 * margin) / spanY);
  const cx = (minX + maxX) / 2;
  const cy = (minY + maxY) / 2;
  return { scale, left: cx - width / 2 / scale, top: cy + height / 2 / scale };
}

/** Grid spacing in metres that keeps lines about `target` px apart: 1, 2, 5 × 10ⁿ. */
export function gridSpacing(scale: number, target = 60): number {
  const raw = target / scale;
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  for (const m of [1, 2, 5, 10]) if (m * power >= raw) return m * power;
  return 10 * power;
}
