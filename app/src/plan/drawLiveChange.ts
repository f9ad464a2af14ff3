import { toScreen, type ScreenPoint, type Viewport } from '../state/viewport.js';
import { label } from './drawRoute.js';
import { PALETTE, TYPE } from './palette.js';
import type { ScenePolygon } from './planScene.js';
import type { LiveChange } from './liveChange.js';
import type { LabelSpace } from './labelSpace.js';
import { MIN_POLYGON_PX, Occupancy, SYMBOL_CELL_PX, onScreen, segmentOnScreen, textWidth } from './levelOfDetail.js';

/** Height of a change label, px (12.5 px type with its halo). */
const LABEL_H = 15;
/** The narrowest change label ("A1 +1%"), px: a label is formatted only where this much has room. */
const NARROWEST_PX = 40;

/** Where a change label may stand, px from its fitting: its left (right, for dx < 0) end and middle. */
const SPOTS: readonly (readonly [number, number])[] = [
  [12, 22],
  [-12, 22],
  [12, -22],
  [-12, -22],
  [12, 38],
  [-12, 38],
  [12, -38],
  [-12, -38],
];

/**
 * The screen outline of every ghost large enough to see and on screen (by the plan's level of detail:
 * none under MIN_POLYGON_PX across, none off the canvas); trench pads have no ghost.
 */
export function ghostOutlines(
  ghosts: readonly ScenePolygon[],
  v: Viewport,
  width: number,
  height: number,
): ScreenPoint[][] {
  const out: ScreenPoint[][] = [];
  for (const g of ghosts) {
    if (g.kind === 'pad') continue;
    let x0 = Infinity,
      x1 = -Infinity,
      y0 = Infinity,
      y1 = -Infinity;
    const s = g.points.map((p) => toScreen(v, p));
    for (const p of s) {
      x0 = Math.min(x0, p.sx);
      x1 = Math.max(x1, p.sx);
      y0 = Math.min(y0, p.sy);
      y1 = Math.max(y1, p.sy);
    }
    if (Math.max(x1 - x0, y1 - y0) < MIN_POLYGON_PX || !segmentOnScreen(x0, y0, x1, y1, width, height)) continue;
    out.push(s);
  }
  return out;
}

/** The ghosts' outlines as one path, per ghost list (fixed for a gesture: the blocks before it) and view. */
const ghostPaths = new WeakMap<
  readonly ScenePolygon[],
  { v: Viewport; width: number; height: number; path: Path2D | null }
>();

/**
 * The slider redraws the overlay at every step while the ghosts and the view stay the same: their path
 * is made once per gesture and view instead of projecting every block again at each step.
 */
function ghostPath(ghosts: readonly ScenePolygon[], v: Viewport, width: number, height: number): Path2D | null {
  const known = ghostPaths.get(ghosts);
  if (known && known.v === v && known.width === width && known.height === height) return known.path;
  const outlines = ghostOutlines(ghosts, v, width, height);
  let path: Path2D | null = null;
  if (outlines.length > 0) {
    path = new Path2D();
    for (const s of outlines) {
      s.forEach((p, i) => (i === 0 ? path!.moveTo(p.sx, p.sy) : path!.lineTo(p.sx, p.sy)));
      path.closePath();
    }
  }
  ghostPaths.set(ghosts, { v, width, height, path });
  return path;
}

/**
 * While the test pressure is dragged: each block's footprint from before the drag as a dashed ghost,
 * its growth as a percentage, and a mark where another case now governs (words, not colour alone).
 * By the plan's level of detail (levelOfDetail.ts): a ghost under MIN_POLYGON_PX or off screen is not
 * drawn, one change is marked per symbol cell, and a label goes to the first corner of its fitting
 * where it overprints no other change label (`space`; tested at its narrowest before it is worded
 * and measured). Drawn over the marks, as the overlay it is.
 */
export function drawLiveChange(
  ctx: CanvasRenderingContext2D,
  v: Viewport,
  ghosts: readonly ScenePolygon[],
  changes: readonly LiveChange[],
  caseName: (id: string) => string,
  space: LabelSpace,
) {
  const { width, height } = space;
  ctx.save();
  ctx.strokeStyle = PALETTE.ink;
  ctx.lineWidth = 1.2;
  ctx.setLineDash([4, 3]);
  const path = ghostPath(ghosts, v, width, height);
  if (path) ctx.stroke(path);
  ctx.setLineDash([]);
  const cells = new Occupancy(SYMBOL_CELL_PX);
  for (const c of changes) {
    const s = toScreen(v, c.at);
    if (!onScreen(s.sx, s.sy, width, height) || !cells.take(s.sx, s.sy)) continue;
    if (c.governing) {
      // a ring with a diamond: the governing case changed here
      ctx.strokeStyle = PALETTE.thrust;
      ctx.lineWidth = 2;
      ctx.beginPath();
      ctx.moveTo(s.sx, s.sy - 13);
      ctx.lineTo(s.sx + 13, s.sy);
      ctx.lineTo(s.sx, s.sy + 13);
      ctx.lineTo(s.sx - 13, s.sy);
      ctx.closePath();
      ctx.stroke();
    }
    // Below right of the fitting (where it always stood), else the other corners, else further out.
    const room = (w: number) =>
      SPOTS.map(([dx, dy]) => ({ x: dx >= 0 ? s.sx + dx : s.sx + dx - w, y: s.sy + dy - LABEL_H / 2, w, h: LABEL_H }));
    if (!room(NARROWEST_PX).some((r) => space.fits(r))) continue;
    const parts: string[] = [];
    if (c.growth !== null) parts.push(`${c.growth >= 0 ? '+' : '−'}${Math.abs(Math.round(c.growth * 100))}%`);
    if (c.governing) parts.push(`now ${caseName(c.governing.to)}`);
    const text = `${c.mark} ${parts.join(' · ')}`;
    const spot = space.place(room(textWidth(ctx, TYPE.mark, text) + 4));
    if (spot) label(ctx, text, spot.x + 2, spot.y + LABEL_H / 2, PALETTE.ink);
  }
  ctx.restore();
}
