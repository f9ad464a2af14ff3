import type { FittingKind } from '@mainbrace/solver';
import { PALETTE, TYPE } from './palette.js';
import { GLYPHS } from './symbols.js';

const paths = new Map<string, Path2D>();
const path2d = (d: string) => {
  let p = paths.get(d);
  if (!p) paths.set(d, (p = new Path2D(d)));
  return p;
};

/** A fitting's symbol at (x, y) px, turned to its first pipe's plan direction (`axis`, y north). */
export function symbol(
  ctx: CanvasRenderingContext2D,
  f: { kind: FittingKind; axis: { x: number; y: number } },
  x: number,
  y: number,
) {
  const g = GLYPHS[f.kind];
  ctx.save();
  ctx.translate(x, y);
  if (g.turns) ctx.rotate(Math.atan2(-f.axis.y, f.axis.x)); // screen y is down
  const p = path2d(g.d);
  if (g.fill !== 'none') {
    ctx.fillStyle = g.fill === 'ink' ? PALETTE.ink : PALETTE.paper;
    ctx.fill(p);
  }
  if (g.stroke > 0) {
    ctx.lineWidth = g.stroke;
    ctx.strokeStyle = PALETTE.ink;
    ctx.lineCap = 'butt';
    ctx.stroke(p);
  }
  if (g.dot) {
    ctx.beginPath();
    ctx.arc(0, 0, g.dot, 0, Math.PI * 2);
    ctx.fillStyle = PALETTE.ink;
    ctx.fill();
  }
  if (g.letter) {
    if (g.turns) ctx.rotate(-Math.atan2(-f.axis.y, f.axis.x)); // letters stay upright
    ctx.fillStyle = PALETTE.ink;
    ctx.font = TYPE.symbol;
    ctx.textAlign = 'center';
    ctx.textBaseline = 'middle';
    ctx.fillText(g.letter, 0, 0.5);
  }
  ctx.restore();
}
