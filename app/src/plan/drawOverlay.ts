import { formatSi, type Project, type UnitSystem } from '@mainbrace/solver';
import type { Hit } from '../tools/hit.js';
import type { DrawState } from '../tools/drawTool.js';
import { rubberBand } from '../tools/rubberBand.js';
import type { PlanPoint } from '../state/documentEdits.js';
import { toScreen, type Viewport } from '../state/viewport.js';
import { label } from './drawRoute.js';
import { PALETTE } from './palette.js';

/** The interactive layer: the run being drawn with its live length and turn, and the selection box. */
export function drawOverlay(
  ctx: CanvasRenderingContext2D,
  v: Viewport,
  draw: DrawState,
  box: { from: PlanPoint; to: PlanPoint } | null,
  units: UnitSystem,
  snapped: boolean,
) {
  if (draw.phase === 'drawing') {
    const pts = [draw.startPoint, ...draw.vertices].map((p) => toScreen(v, p));
    ctx.strokeStyle = PALETTE.rubber;
    ctx.lineWidth = 2.5;
    ctx.beginPath();
    pts.forEach((p, i) => (i === 0 ? ctx.moveTo(p.sx, p.sy) : ctx.lineTo(p.sx, p.sy)));
    ctx.stroke();
    for (const p of pts) {
      ctx.beginPath();
      ctx.arc(p.sx, p.sy, 3.5, 0, Math.PI * 2);
      ctx.fillStyle = PALETTE.rubber;
      ctx.fill();
    }
    const band = rubberBand(draw);
    if (band) {
      const a = toScreen(v, band.from),
        b = toScreen(v, band.to);
      ctx.setLineDash([6, 4]);
      ctx.beginPath();
      ctx.moveTo(a.sx, a.sy);
      ctx.lineTo(b.sx, b.sy);
      ctx.stroke();
      ctx.setLineDash([]);
      if (snapped) {
        ctx.strokeStyle = PALETTE.rubber;
        ctx.lineWidth = 1.5;
        ctx.strokeRect(b.sx - 5, b.sy - 5, 10, 10);
      }
      const parts = [formatSi(band.length, 'length', units, 4)];
      if (band.deflection !== null) parts.push(`turn ${formatSi(band.deflection, 'angle', units)}`);
      if (snapped) parts.push('snapped');
      label(ctx, parts.join(' · '), b.sx + 12, b.sy + 14, PALETTE.rubber);
    }
  }
  if (box) {
    const a = toScreen(v, box.from),
      b = toScreen(v, box.to);
    ctx.fillStyle = 'rgba(224, 138, 0, 0.08)';
    ctx.strokeStyle = PALETTE.selection;
    ctx.lineWidth = 1;
    ctx.setLineDash([4, 3]);
    ctx.fillRect(Math.min(a.sx, b.sx), Math.min(a.sy, b.sy), Math.abs(b.sx - a.sx), Math.abs(b.sy - a.sy));
    ctx.strokeRect(Math.min(a.sx, b.sx), Math.min(a.sy, b.sy), Math.abs(b.sx - a.sx), Math.abs(b.sy - a.sy));
    ctx.setLineDash([]);
  }
}

/**
 * What a click at the pointer would select or join: a ring on the node, or the pipe traced with a dot
 * where a tee would go. Shape and colour both mark it (a thicker halo, never colour alone).
 */
export function drawHover(
  ctx: CanvasRenderingContext2D,
  v: Viewport,
  project: Project,
  hover: Hit,
  attaching: boolean,
) {
  if (hover.kind === 'none') return;
  ctx.save();
  ctx.strokeStyle = PALETTE.selection;
  ctx.fillStyle = PALETTE.selection;
  if (hover.kind === 'node') {
    const p = toScreen(v, hover.at);
    ctx.lineWidth = 2.5;
    ctx.beginPath();
    ctx.arc(p.sx, p.sy, 11, 0, Math.PI * 2);
    ctx.stroke();
  } else {
    const pipe = project.pipes.find((x) => x.id === hover.id);
    const a = pipe && project.nodes.find((n) => n.id === pipe.from);
    const b = pipe && project.nodes.find((n) => n.id === pipe.to);
    if (a && b) {
      const pa = toScreen(v, a);
      const pb = toScreen(v, b);
      ctx.globalAlpha = 0.35;
      ctx.lineWidth = 10;
      ctx.lineCap = 'round';
      ctx.beginPath();
      ctx.moveTo(pa.sx, pa.sy);
      ctx.lineTo(pb.sx, pb.sy);
      ctx.stroke();
      ctx.globalAlpha = 1;
    }
    if (attaching) {
      const p = toScreen(v, hover.at);
      ctx.lineWidth = 2;
      ctx.beginPath();
      ctx.arc(p.sx, p.sy, 6, 0, Math.PI * 2);
      ctx.stroke();
      ctx.beginPath();
      ctx.arc(p.sx, p.sy, 2.5, 0, Math.PI * 2);
      ctx.fill();
    }
  }
  if (attaching) {
    const p = toScreen(v, hover.at);
    label(
      ctx,
      hover.kind === 'node' ? 'joins this node' : 'joins the pipe (tee)',
      p.sx + 12,
      p.sy - 10,
      PALETTE.selection,
    );
  }
  ctx.restore();
}
