import { toScreen, type Viewport } from '../state/viewport.js';
import { label } from './drawRoute.js';
import { PALETTE } from './palette.js';
import type { ScenePolygon } from './planScene.js';
import type { LiveChange } from './liveChange.js';

/**
 * While the test pressure is dragged: each block's footprint from before the drag as a dashed ghost,
 * its growth as a percentage, and a mark where another case now governs (words, not colour alone).
 */
export function drawLiveChange(
  ctx: CanvasRenderingContext2D,
  v: Viewport,
  ghosts: readonly ScenePolygon[],
  changes: readonly LiveChange[],
  caseName: (id: string) => string,
) {
  ctx.save();
  ctx.strokeStyle = PALETTE.ink;
  ctx.lineWidth = 1.2;
  ctx.setLineDash([4, 3]);
  for (const g of ghosts) {
    if (g.kind === 'pad') continue;
    ctx.beginPath();
    g.points.forEach((p, i) => {
      const s = toScreen(v, p);
      if (i === 0) ctx.moveTo(s.sx, s.sy);
      else ctx.lineTo(s.sx, s.sy);
    });
    ctx.closePath();
    ctx.stroke();
  }
  ctx.setLineDash([]);
  for (const c of changes) {
    const s = toScreen(v, c.at);
    const parts: string[] = [];
    if (c.growth !== null) parts.push(`${c.growth >= 0 ? '+' : '−'}${Math.abs(Math.round(c.growth * 100))}%`);
    if (c.governing) parts.push(`now ${caseName(c.governing.to)}`);
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
    label(ctx, `${c.mark} ${parts.join(' · ')}`, s.sx + 14, s.sy + 22, PALETTE.ink);
  }
  ctx.restore();
}
