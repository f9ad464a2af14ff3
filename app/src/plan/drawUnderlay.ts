import type { Placement, PlanXY } from '@mainbrace/solver';
import type { Viewport } from '../state/viewport.js';
import { toScreen } from '../state/viewport.js';
import { PALETTE } from './palette.js';

/**
 * The canvas matrix [a, b, c, d, e, f] that draws image pixels where the placement puts them on the
 * screen: screen = toScreen(imageToPlan(placement, pixel)). With k px/m, s m/px and rotation θ:
 * sx = (x − left)k + ks(cos θ·u + sin θ·v), sy = (top − y)k − ks(sin θ·u − cos θ·v).
 */
export function underlayMatrix(v: Viewport, p: Placement): [number, number, number, number, number, number] {
  const ks = v.scale * p.metresPerPixel;
  const c = Math.cos((p.rotation * Math.PI) / 180);
  const s = Math.sin((p.rotation * Math.PI) / 180);
  const corner = toScreen(v, { x: p.x, y: p.y });
  return [ks * c, -ks * s, ks * s, ks * c, corner.sx, corner.sy];
}

/** The site-plan image under the route, at its opacity. */
export function drawUnderlay(
  ctx: CanvasRenderingContext2D,
  v: Viewport,
  placement: Placement & { opacity: number },
  image: CanvasImageSource,
) {
  ctx.save();
  ctx.globalAlpha = placement.opacity;
  ctx.transform(...underlayMatrix(v, placement));
  ctx.imageSmoothingQuality = 'high';
  ctx.drawImage(image, 0, 0);
  ctx.restore();
}

/** Points picked on the image for its calibration: a numbered cross at each. */
export function drawPicks(ctx: CanvasRenderingContext2D, v: Viewport, picks: readonly PlanXY[]) {
  ctx.save();
  ctx.lineWidth = 1.5;
  ctx.strokeStyle = PALETTE.rubber;
  ctx.fillStyle = PALETTE.rubber;
  ctx.font = '600 12px system-ui, sans-serif';
  picks.forEach((p, i) => {
    const s = toScreen(v, p);
    ctx.beginPath();
    ctx.moveTo(s.sx - 9, s.sy);
    ctx.lineTo(s.sx + 9, s.sy);
    ctx.moveTo(s.sx, s.sy - 9);
    ctx.lineTo(s.sx, s.sy + 9);
    ctx.stroke();
    ctx.beginPath();
    ctx.arc(s.sx, s.sy, 5, 0, 2 * Math.PI);
    ctx.stroke();
    ctx.fillText(String(i + 1), s.sx + 7, s.sy - 7);
  });
  if (picks.length === 2) {
    const a = toScreen(v, picks[0]!);
    const b = toScreen(v, picks[1]!);
    ctx.setLineDash([6, 4]);
    ctx.beginPath();
    ctx.moveTo(a.sx, a.sy);
    ctx.lineTo(b.sx, b.sy);
    ctx.stroke();
  }
  ctx.restore();
}
