import { FOOT, type UnitSystem } from '@mainbrace/solver';
import { gridSpacing, toPlan, toScreen, type Viewport } from '../state/viewport.js';
import { PALETTE, TYPE } from './palette.js';
import { unitOf } from '../format/quantity.js';

/** Grid spacing in metres for the view, in round numbers of the display unit (m, or ft). */
export function gridStep(v: Viewport, units: UnitSystem): number {
  if (units === 'si') return gridSpacing(v.scale);
  return gridSpacing(v.scale * FOOT) * FOOT;
}

/** The light plan grid, every fifth line stronger and labelled in plan coordinates. */
export function drawGrid(ctx: CanvasRenderingContext2D, v: Viewport, width: number, height: number, units: UnitSystem) {
  const step = gridStep(v, units);
  const unit = units === 'si' ? 1 : FOOT;
  const topLeft = toPlan(v, { sx: 0, sy: 0 });
  const bottomRight = toPlan(v, { sx: width, sy: height });
  ctx.fillStyle = PALETTE.paper;
  ctx.fillRect(0, 0, width, height);
  ctx.lineWidth = 1;
  ctx.font = TYPE.grid;
  ctx.fillStyle = PALETTE.gridLabel;
  const i0 = Math.floor(topLeft.x / step),
    i1 = Math.ceil(bottomRight.x / step);
  const j0 = Math.floor(bottomRight.y / step),
    j1 = Math.ceil(topLeft.y / step);
  // every coordinate with its unit: "E 500 m"
  const fmt = (m: number) => `${Math.round((m / unit) * 100) / 100} ${unitOf('length', units)}`;
  for (let i = i0; i <= i1; i++) {
    const sx = Math.round(toScreen(v, { x: i * step, y: 0 }).sx) + 0.5;
    ctx.strokeStyle = i % 5 === 0 ? PALETTE.gridMajor : PALETTE.gridMinor;
    ctx.beginPath();
    ctx.moveTo(sx, 0);
    ctx.lineTo(sx, height);
    ctx.stroke();
    if (i % 5 === 0) {
      ctx.textAlign = 'left';
      ctx.textBaseline = 'bottom';
      ctx.fillText(`E ${fmt(i * step)}`, sx + 3, height - 3);
    }
  }
  for (let j = j0; j <= j1; j++) {
    const sy = Math.round(toScreen(v, { x: 0, y: j * step }).sy) + 0.5;
    ctx.strokeStyle = j % 5 === 0 ? PALETTE.gridMajor : PALETTE.gridMinor;
    ctx.beginPath();
    ctx.moveTo(0, sy);
    ctx.lineTo(width, sy);
    ctx.stroke();
    if (j % 5 === 0) {
      ctx.textAlign = 'left';
      ctx.textBaseline = 'bottom';
      ctx.fillText(`N ${fmt(j * step)}`, 3, sy - 2);
    }
  }
}
