import type { SceneFitting } from './planScene.js';
import { PALETTE } from './palette.js';

/** A fitting's symbol, oriented along its first pipe: our own small glyph per kind. */
export function symbol(ctx: CanvasRenderingContext2D, f: SceneFitting, x: number, y: number) {
  const r = 6;
  const ax = f.axis.x,
    ay = -f.axis.y; // screen y is down
  const l = Math.hypot(ax, ay) || 1;
  const ux = ax / l,
    uy = ay / l,
    nx = -uy,
    ny = ux;
  ctx.lineWidth = 1.6;
  ctx.strokeStyle = PALETTE.ink;
  ctx.fillStyle = PALETTE.paper;
  ctx.beginPath();
  switch (f.kind) {
    case 'bend':
      ctx.arc(x, y, r * 0.8, 0, Math.PI * 2);
      ctx.fill();
      ctx.stroke();
      break;
    case 'reducer':
    case 'reducing-bend':
      ctx.moveTo(x + ux * r + nx * r * 0.45, y + uy * r + ny * r * 0.45);
      ctx.lineTo(x - ux * r + nx * r, y - uy * r + ny * r);
      ctx.lineTo(x - ux * r - nx * r, y - uy * r - ny * r);
      ctx.lineTo(x + ux * r - nx * r * 0.45, y + uy * r - ny * r * 0.45);
      ctx.closePath();
      ctx.fill();
      ctx.stroke();
      if (f.kind === 'reducing-bend') {
        ctx.beginPath();
        ctx.arc(x, y, 2, 0, Math.PI * 2);
        ctx.fillStyle = PALETTE.ink;
        ctx.fill();
      }
      break;
    case 'tee':
    case 'wye':
    case 'cross':
      ctx.rect(x - r, y - r, 2 * r, 2 * r);
      ctx.fill();
      ctx.stroke();
      ctx.beginPath();
      ctx.fillStyle = PALETTE.ink;
      ctx.font = 'bold 9px system-ui, sans-serif';
      ctx.textAlign = 'center';
      ctx.textBaseline = 'middle';
      ctx.fillText(f.kind === 'tee' ? 'T' : f.kind === 'wye' ? 'Y' : '+', x, y + 0.5);
      break;
    case 'dead-end':
      ctx.lineWidth = 3.2;
      ctx.moveTo(x + nx * r * 1.2, y + ny * r * 1.2);
      ctx.lineTo(x - nx * r * 1.2, y - ny * r * 1.2);
      ctx.stroke();
      break;
    case 'valve':
      ctx.moveTo(x - ux * r + nx * r * 0.8, y - uy * r + ny * r * 0.8);
      ctx.lineTo(x + ux * r - nx * r * 0.8, y + uy * r - ny * r * 0.8);
      ctx.lineTo(x + ux * r + nx * r * 0.8, y + uy * r + ny * r * 0.8);
      ctx.lineTo(x - ux * r - nx * r * 0.8, y - uy * r - ny * r * 0.8);
      ctx.closePath();
      ctx.fillStyle = PALETTE.ink;
      ctx.fill();
      break;
    default:
      ctx.arc(x, y, 3, 0, Math.PI * 2);
      ctx.fill();
      ctx.stroke();
  }
}
