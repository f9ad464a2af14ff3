import { jointsText, quantityText, type UnitSystem } from '@mainbrace/solver';
import type { Scene, SceneZone } from './planScene.js';
import { toScreen, type Viewport } from '../state/viewport.js';
import { PALETTE, LINE, TYPE } from './palette.js';
import type { LabelSpace } from './labelSpace.js';
import { label } from './drawRoute.js';
import { segmentOnScreen, textWidth } from './levelOfDetail.js';

type Ctx = CanvasRenderingContext2D;

/** px from the pipe's centreline to the dimension line, and the least screen length worth dimensioning. */
const OFFSET_PX = 16;
const MIN_DIMENSION_PX = 28;
/** Joints closer together than this on screen are not ticked one by one (the label still counts them). */
const MIN_TICK_GAP_PX = 5;

/**
 * Restrained zones our way: the pipe with a tick across it at every restrained joint, and a dimension
 * line beside it from the fitting to the end of the zone, closed by oblique strokes (not arrowheads,
 * which are the thrust's), labelled with the length and the joint count. All in the restraint colour.
 */
export function drawRestrainedZones(
  ctx: Ctx,
  v: Viewport,
  scene: Pick<Scene, 'zones'>,
  units: UnitSystem,
  space: LabelSpace,
) {
  for (const z of scene.zones) drawZone(ctx, v, z, units, space);
}

function drawZone(ctx: Ctx, v: Viewport, z: SceneZone, units: UnitSystem, space: LabelSpace) {
  const a = toScreen(v, z.at);
  const ux = z.direction.x,
    uy = -z.direction.y; // screen y is down
  // The plan's left of the leg, (−dy, dx), is (uy, −ux) on screen; `side` picks it or its opposite.
  const nx = uy * z.side,
    ny = -ux * z.side;
  const lengthPx = z.planLength * v.scale;
  const along = (d: number, off = 0) => ({ x: a.sx + ux * d + nx * off, y: a.sy + uy * d + ny * off });
  const end = along(lengthPx);
  if (lengthPx < 1.5) return; // too short to see: the schedule and the details panel give it
  if (!segmentOnScreen(a.sx, a.sy, end.x, end.y, space.width, space.height, OFFSET_PX + 20)) return;
  ctx.save();
  ctx.strokeStyle = PALETTE.restraint;
  ctx.fillStyle = PALETTE.restraint;
  ctx.lineCap = 'butt';

  // Ticks across the pipe at each joint; when they would merge, only the first and the last.
  const gapPx = z.jointsAt.length > 1 ? z.jointsAt[1]! * v.scale : Infinity;
  const ticks = gapPx >= MIN_TICK_GAP_PX ? z.jointsAt : [z.jointsAt[0] ?? 0, z.jointsAt.at(-1) ?? 0];
  ctx.lineWidth = LINE.joint;
  ctx.beginPath();
  for (const d of ticks) {
    const p = along(d * v.scale, -LINE.jointHalf),
      q = along(d * v.scale, LINE.jointHalf);
    ctx.moveTo(p.x, p.y);
    ctx.lineTo(q.x, q.y);
  }
  ctx.stroke();

  if (lengthPx < MIN_DIMENSION_PX) {
    ctx.restore();
    return;
  }
  // Extension lines from just off the pipe to just past the dimension line, then the line itself.
  ctx.lineWidth = LINE.dimension;
  ctx.beginPath();
  for (const d of [0, lengthPx]) {
    const p = along(d, LINE.jointHalf + 2),
      q = along(d, OFFSET_PX + 4);
    ctx.moveTo(p.x, p.y);
    ctx.lineTo(q.x, q.y);
  }
  const s = along(0, OFFSET_PX),
    e = along(lengthPx, OFFSET_PX);
  ctx.moveTo(s.x, s.y);
  ctx.lineTo(e.x, e.y);
  // Oblique terminators: 45° strokes through each end.
  for (const p of [s, e]) {
    const ox = (ux + nx) * 4,
      oy = (uy + ny) * 4;
    ctx.moveTo(p.x - ox, p.y - oy);
    ctx.lineTo(p.x + ox, p.y + oy);
  }
  ctx.stroke();
  ctx.restore();

  const h = 13;
  const mid = along(lengthPx / 2, OFFSET_PX + 9);
  // Beside the middle of the line on its outer side, else either end of it.
  const box = (p: { x: number; y: number }, w: number) => ({
    x: nx >= 0 ? p.x : p.x - w,
    y: ny >= 0 ? p.y : p.y - h,
    w,
    h,
  });
  const spots = (w: number) => [
    box(mid, w),
    { ...box(mid, w), x: mid.x - w / 2 },
    box(along(lengthPx * 0.8, OFFSET_PX + 9), w),
    box(along(lengthPx * 0.2, OFFSET_PX + 9), w),
  ];
  // No room even for the shortest such label ("3 m · 1 joint" is wider than 40 px): not formatted at all.
  if (!spots(40).some((r) => space.fits(r))) return;
  // The length as the schedule gives it (rounded up), so the plan and the sheet read the same.
  const text = `${quantityText(z.length, 'restrained', units)} · ${jointsText(z.joints)}`;
  const w = textWidth(ctx, TYPE.dimension, text) + 4;
  const spot = space.place(spots(w));
  if (spot) label(ctx, text, spot.x + 2, spot.y + h / 2, PALETTE.restraint, TYPE.dimension);
}
