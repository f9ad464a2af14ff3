import {
  fromDistance,
  fromTwoPoints,
  type ImagePoint,
  type Placement,
  type PlanXY,
  type Underlay,
} from '@mainbrace/solver';
import { toPlan, type Viewport } from './viewport.js';

/** What the user gives for a calibration besides the two picked points. */
export type CalibrationInput =
  { method: 'distance'; distance: number } | { method: 'coordinates'; coordinates: [PlanXY, PlanXY] };

export type Calibrated = { ok: true; underlay: Underlay } | { ok: false; message: string };

const placementOf = (u: Underlay): Placement => ({
  x: u.x,
  y: u.y,
  metresPerPixel: u.metresPerPixel,
  rotation: u.rotation,
});

/**
 * The underlay calibrated from two picked image points: by the distance between them (scale only;
 * the first point and the rotation stay) or by their plan coordinates (scale, rotation and position).
 */
export function calibrate(u: Underlay, picks: readonly ImagePoint[], input: CalibrationInput): Calibrated {
  if (u.locked) return { ok: false, message: 'the underlay is locked: unlock it to calibrate' };
  const [a, b] = picks;
  if (!a || !b) return { ok: false, message: 'pick two points on the image first' };
  const r =
    input.method === 'distance'
      ? fromDistance(placementOf(u), a, b, input.distance)
      : fromTwoPoints(a, b, input.coordinates[0], input.coordinates[1]);
  if (!r.ok) return r;
  const points: [ImagePoint, ImagePoint] = [
    { u: a.u, v: a.v },
    { u: b.u, v: b.v },
  ];
  return {
    ok: true,
    underlay: {
      ...u,
      ...r.placement,
      calibration:
        input.method === 'distance'
          ? { method: 'distance', points, distance: input.distance }
          : { method: 'coordinates', points, coordinates: input.coordinates },
    },
  };
}

/** Where a newly loaded image goes before calibration: centred in the view, filling 80 % of it. */
export function firstPlacement(
  width: number,
  height: number,
  view: Viewport,
  canvas: { width: number; height: number },
): Placement {
  const metresPerPixel = (0.8 * Math.min(canvas.width / width, canvas.height / height)) / view.scale;
  const centre = toPlan(view, { sx: canvas.width / 2, sy: canvas.height / 2 });
  return {
    x: centre.x - (width / 2) * metresPerPixel,
    y: centre.y + (height / 2) * metresPerPixel,
    metresPerPixel,
    rotation: 0,
  };
}
