import type { UnitSystem } from '@mainbrace/solver';
import type { Scene, ScenePolygon } from './planScene.js';
import { toScreen, type Viewport } from '../state/viewport.js';
import { LINE, MATERIAL_DASH, PALETTE, TYPE, pipeWidth } from './palette.js';
import type { LabelSpace } from './labelSpace.js';
import { symbol } from './fittingSymbol.js';
import {
  MIN_HATCH_PX,
  MIN_POLYGON_PX,
  Occupancy,
  SYMBOL_CELL_PX,
  onScreen,
  segmentOnScreen,
  textWidth,
} from './levelOfDetail.js';
import { thrustLabel } from './thrustLabel.js';

type Ctx = CanvasRenderingContext2D;

/** Longest thrust arrow on the plan, px; every arrow is scaled to the largest force (one scale). */
export const ARROW_PX = 72;

function path(ctx: Ctx, v: Viewport, pts: readonly { x: number; y: number }[]) {
  ctx.beginPath();
  addPolygon(ctx, v, pts);
}

/** A closed polygon added to the current path. */
function addPolygon(ctx: Ctx, v: Viewport, pts: readonly { x: number; y: number }[]) {
  pts.forEach((p, i) => {
    const sx = (p.x - v.left) * v.scale,
      sy = (v.top - p.y) * v.scale;
    if (i === 0) ctx.moveTo(sx, sy);
    else ctx.lineTo(sx, sy);
  });
  ctx.closePath();
}

/** Concrete hatching: 45° lines clipped to the polygon, as drawings mark concrete. */
function hatch(ctx: Ctx, v: Viewport, pts: readonly { x: number; y: number }[], color: string) {
  const s = pts.map((p) => toScreen(v, p));
  const xs = s.map((p) => p.sx),
    ys = s.map((p) => p.sy);
  const x0 = Math.min(...xs),
    x1 = Math.max(...xs),
    y0 = Math.min(...ys),
    y1 = Math.max(...ys);
  ctx.save();
  path(ctx, v, pts);
  ctx.clip();
  ctx.strokeStyle = color;
  ctx.lineWidth = LINE.hatch;
  ctx.beginPath();
  for (let k = x0 - (y1 - y0); k < x1; k += LINE.hatchPitch) {
    ctx.moveTo(k, y1);
    ctx.lineTo(k + (y1 - y0), y0);
  }
  ctx.stroke();
  ctx.restore();
}

/**
 * Blocks (hatched), anchors (crossed) and trench pads (dashed), under the pipes. A polygon smaller
 * than MIN_POLYGON_PX on screen, or off it, is not drawn; hatching needs MIN_HATCH_PX across.
 */
export function drawRestraints(
  ctx: Ctx,
  v: Viewport,
  scene: Pick<Scene, 'polygons'>,
  width = Infinity,
  height = Infinity,
) {
  const shown: { poly: ScenePolygon; hatched: boolean }[] = [];
  for (const poly of scene.polygons) {
    // The extent in plan metres, then on screen (the view only scales and flips y): no object per
    // point, since a 10,000-fitting route measures every block to leave out those under a pixel.
    let x0 = Infinity,
      x1 = -Infinity,
      y0 = Infinity,
      y1 = -Infinity;
    for (const p of poly.points) {
      if (p.x < x0) x0 = p.x;
      if (p.x > x1) x1 = p.x;
      if (p.y < y0) y0 = p.y;
      if (p.y > y1) y1 = p.y;
    }
    const across = (x1 - x0) * v.scale;
    const tall = (y1 - y0) * v.scale;
    if (Math.max(across, tall) < MIN_POLYGON_PX) continue;
    const left = (x0 - v.left) * v.scale;
    const top = (v.top - y1) * v.scale;
    if (!segmentOnScreen(left, top, left + across, top + tall, width, height)) continue;
    shown.push({ poly, hatched: poly.kind === 'block' && Math.min(across, tall) >= MIN_HATCH_PX });
  }
  // One fill for every piece, the hatching of blocks large enough, then one outline per kind: a
  // route's thousands of blocks are a few paths, not a fill and a stroke each.
  const outline = (list: readonly { poly: ScenePolygon }[]) => {
    ctx.beginPath();
    for (const { poly } of list) addPolygon(ctx, v, poly.points);
  };
  outline(shown);
  ctx.fillStyle = PALETTE.blockFill;
  ctx.fill();
  for (const s of shown) if (s.hatched) hatch(ctx, v, s.poly.points, PALETTE.block);
  for (const kind of ['block', 'anchor', 'pad'] as const) {
    const of = shown.filter((s) => s.poly.kind === kind);
    if (!of.length) continue;
    outline(of);
    ctx.setLineDash(kind === 'pad' ? [4, 3] : []);
    ctx.strokeStyle = kind === 'anchor' ? PALETTE.anchor : kind === 'pad' ? PALETTE.pad : PALETTE.block;
    ctx.lineWidth = kind === 'anchor' ? LINE.anchor : LINE.block;
    ctx.stroke();
    ctx.setLineDash([]);
    if (kind !== 'anchor') continue;
    ctx.beginPath();
    for (const { poly } of of) {
      const [a, b, c, d] = poly.points.map((p) => toScreen(v, p));
      ctx.moveTo(a!.sx, a!.sy);
      ctx.lineTo(c!.sx, c!.sy);
      ctx.moveTo(b!.sx, b!.sy);
      ctx.lineTo(d!.sx, d!.sy);
    }
    ctx.stroke();
  }
}

/** Pipes: blue, weighted by diameter, dashed by material; selected pipes darker with a halo. */
export function drawPipes(ctx: Ctx, v: Viewport, scene: Pick<Scene, 'pipes'>, width = Infinity, height = Infinity) {
  ctx.lineCap = 'round';
  // Pipes of one look are stroked as one path (a 10,000-pipe route is a few strokes, not 10,000): the
  // halos of the selected first, then the steel pipes' dark edges, then the pipes themselves. A dash
  // pattern starts again at each pipe, as it did with a stroke per pipe.
  type Stroke = { style: string; lineWidth: number; dash: number[]; alpha: number; xy: number[] };
  const strokes = new Map<string, Stroke>();
  // the look is made once per group, not once per pipe
  const add = (key: string, look: () => Omit<Stroke, 'xy'>, ax: number, ay: number, bx: number, by: number) => {
    let st = strokes.get(key);
    if (!st) strokes.set(key, (st = { ...look(), xy: [] }));
    st.xy.push(ax, ay, bx, by);
  };
  for (const p of scene.pipes) {
    const ax = (p.a.x - v.left) * v.scale,
      ay = (v.top - p.a.y) * v.scale,
      bx = (p.b.x - v.left) * v.scale,
      by = (v.top - p.b.y) * v.scale;
    if (!segmentOnScreen(ax, ay, bx, by, width, height)) continue;
    const w = pipeWidth(p.outsideDiameter);
    if (p.selected)
      add(`0 ${w}`, () => ({ style: PALETTE.selection, lineWidth: w + 6, dash: [], alpha: 0.35 }), ax, ay, bx, by);
    if (p.material === 'steel')
      add(`1 ${w}`, () => ({ style: PALETTE.ink, lineWidth: w + 2, dash: [], alpha: 1 }), ax, ay, bx, by);
    add(
      `2 ${w} ${p.material} ${p.selected}`,
      () => ({
        style: p.selected ? PALETTE.pipeSelected : PALETTE.pipe,
        lineWidth: w,
        dash: MATERIAL_DASH[p.material].map((d) => d * w),
        alpha: 1,
      }),
      ax,
      ay,
      bx,
      by,
    );
  }
  for (const key of [...strokes.keys()].sort()) {
    const st = strokes.get(key)!;
    ctx.strokeStyle = st.style;
    ctx.lineWidth = st.lineWidth;
    ctx.setLineDash(st.dash);
    ctx.globalAlpha = st.alpha;
    ctx.beginPath();
    for (let k = 0; k < st.xy.length; k += 4) {
      ctx.moveTo(st.xy[k]!, st.xy[k + 1]!);
      ctx.lineTo(st.xy[k + 2]!, st.xy[k + 3]!);
    }
    ctx.stroke();
  }
  ctx.globalAlpha = 1;
  ctx.setLineDash([]);
}

/** Haloed text: legible over pipes and hatching. */
export function label(
  ctx: Ctx,
  text: string,
  x: number,
  y: number,
  color: string = PALETTE.ink,
  font: string = TYPE.mark,
) {
  ctx.font = font;
  ctx.textAlign = 'left';
  ctx.textBaseline = 'middle';
  ctx.lineWidth = 4;
  ctx.lineJoin = 'round';
  ctx.strokeStyle = PALETTE.halo;
  ctx.strokeText(text, x, y);
  ctx.fillStyle = color;
  ctx.fillText(text, x, y);
}

/** The warning marker beside a mark: a triangle with "!" (never colour alone). */
function warningMark(ctx: Ctx, wx: number, ty: number) {
  ctx.beginPath();
  ctx.moveTo(wx, ty - 6);
  ctx.lineTo(wx + 6.5, ty + 5.5);
  ctx.lineTo(wx - 6.5, ty + 5.5);
  ctx.closePath();
  ctx.fillStyle = PALETTE.warning;
  ctx.fill();
  ctx.strokeStyle = PALETTE.ink;
  ctx.lineWidth = 1;
  ctx.stroke();
  ctx.fillStyle = PALETTE.ink;
  ctx.font = TYPE.symbol;
  ctx.textAlign = 'center';
  ctx.fillText('!', wx, ty + 1.5);
}

/**
 * Places the mark labels (fittings' and tie-ins'): marks get their room first, above right of the
 * symbol, else the other corners; selected ones always show. Returns each label's left-middle point.
 */
export function placeTags(
  ctx: Ctx,
  v: Viewport,
  scene: Pick<Scene, 'fittings' | 'plainNodes'>,
  space: LabelSpace,
): Map<string, { x: number; y: number }> {
  const out = new Map<string, { x: number; y: number }>();
  const marked = [
    ...scene.fittings.map((f) => ({ node: f.node, at: f.at, mark: f.mark, warned: f.warned, selected: f.selected })),
    ...scene.plainNodes.flatMap((n) => (n.mark ? [{ ...n, node: n.id, mark: n.mark, warned: false }] : [])),
  ];
  const ordered = marked.sort((a, b) => Number(b.selected) - Number(a.selected));
  const h = 15;
  for (const f of ordered) {
    const s = toScreen(v, f.at);
    // Off screen, or no room even for the narrowest label at any corner: not measured at all.
    if (!f.selected && !onScreen(s.sx, s.sy, space.width, space.height, 0)) continue;
    if (!f.selected && !fitsAnywhere(space, s.sx, s.sy, h)) continue;
    const w = textWidth(ctx, TYPE.mark, f.mark) + (f.warned ? 18 : 0) + 4;
    const spot = space.place([
      { x: s.sx + 8, y: s.sy - 19, w, h },
      { x: s.sx - 8 - w, y: s.sy - 19, w, h },
      { x: s.sx + 8, y: s.sy + 5, w, h },
      { x: s.sx - 8 - w, y: s.sy + 5, w, h },
    ]);
    if (spot) out.set(f.node, { x: spot.x + 1, y: spot.y + h / 2 });
    else if (f.selected) out.set(f.node, { x: s.sx + 9, y: s.sy - 12 });
  }
  return out;
}

/** The narrowest label (one character) has room at one of the four corners of a symbol. */
function fitsAnywhere(space: LabelSpace, sx: number, sy: number, h: number): boolean {
  const w = 12;
  return (
    space.fits({ x: sx + 8, y: sy - 19, w, h }) ||
    space.fits({ x: sx - 8 - w, y: sy - 19, w, h }) ||
    space.fits({ x: sx + 8, y: sy + 5, w, h }) ||
    space.fits({ x: sx - 8 - w, y: sy + 5, w, h })
  );
}

/** The selection ring round a symbol: amber, and thicker than any symbol line. */
function ring(ctx: Ctx, x: number, y: number) {
  ctx.beginPath();
  ctx.arc(x, y, 11, 0, Math.PI * 2);
  ctx.strokeStyle = PALETTE.selection;
  ctx.lineWidth = 3;
  ctx.stroke();
}

/** Fitting symbols with their placed marks and warning markers; plain nodes and tie-ins (with their marks). */
export function drawFittings(
  ctx: Ctx,
  v: Viewport,
  scene: Pick<Scene, 'fittings' | 'plainNodes'>,
  tags: ReadonlyMap<string, { x: number; y: number }>,
  width = Infinity,
  height = Infinity,
) {
  // Selected symbols first, so that a crowded cell shows the one the user picked.
  const cells = new Occupancy(SYMBOL_CELL_PX);
  const shows = (s: { sx: number; sy: number }, selected: boolean, tagged: boolean) =>
    onScreen(s.sx, s.sy, width, height, 16) && (cells.take(s.sx, s.sy) || selected || tagged);
  for (const n of scene.plainNodes) {
    const s = toScreen(v, n.at);
    if (!shows(s, n.selected, tags.has(n.id))) continue;
    if (n.tieIn) {
      // A tie-in hands its thrust to the existing main: the open diamond of the symbol set.
      if (n.selected) ring(ctx, s.sx, s.sy);
      symbol(ctx, { kind: 'tie-in', axis: { x: 1, y: 0 } }, s.sx, s.sy);
    } else {
      ctx.beginPath();
      ctx.arc(s.sx, s.sy, 3, 0, Math.PI * 2);
      ctx.fillStyle = n.selected ? PALETTE.selection : PALETTE.pipe;
      ctx.fill();
      ctx.strokeStyle = PALETTE.ink;
      ctx.lineWidth = 1.2;
      ctx.stroke();
    }
    const at = n.mark ? tags.get(n.id) : undefined;
    if (at) label(ctx, n.mark!, at.x, at.y, PALETTE.ink, TYPE.mark);
  }
  for (const f of scene.fittings) {
    const s = toScreen(v, f.at);
    const at = tags.get(f.node);
    if (!shows(s, f.selected, at !== undefined)) continue;
    if (f.selected) ring(ctx, s.sx, s.sy);
    symbol(ctx, f, s.sx, s.sy);
    if (!at) continue;
    label(ctx, f.mark, at.x, at.y, PALETTE.ink, TYPE.mark);
    if (f.warned) warningMark(ctx, at.x + textWidth(ctx, TYPE.mark, f.mark) + 10, at.y);
  }
}

/** Thrust arrows from each fitting in the direction the water pushes it, one force scale for the plan. */
export function drawArrows(
  ctx: Ctx,
  v: Viewport,
  scene: Pick<Scene, 'arrows' | 'largestForce'>,
  units: UnitSystem,
  space: LabelSpace,
) {
  if (scene.largestForce <= 0) return;
  const cells = new Occupancy(SYMBOL_CELL_PX);
  for (const a of scene.arrows) {
    const s = toScreen(v, a.at);
    if (!onScreen(s.sx, s.sy, space.width, space.height) || !cells.take(s.sx, s.sy)) continue;
    const length = a.horizontal > 0 ? Math.max(10, (ARROW_PX * a.horizontal) / scene.largestForce) : 0;
    const ux = a.direction.x,
      uy = -a.direction.y;
    const ex = s.sx + ux * length,
      ey = s.sy + uy * length;
    ctx.strokeStyle = PALETTE.thrust;
    ctx.fillStyle = PALETTE.thrust;
    ctx.lineWidth = LINE.thrust;
    if (length > 0) {
      ctx.beginPath();
      ctx.moveTo(s.sx, s.sy);
      ctx.lineTo(ex - ux * 6, ey - uy * 6);
      ctx.stroke();
      ctx.beginPath();
      ctx.moveTo(ex, ey);
      ctx.lineTo(ex - ux * 9 - uy * 4.5, ey - uy * 9 + ux * 4.5);
      ctx.lineTo(ex - ux * 9 + uy * 4.5, ey - uy * 9 - ux * 4.5);
      ctx.closePath();
      ctx.fill();
    }
    // The label is formatted and measured only if the shortest force label ("9 kN", about 26 px) has room.
    const h = 13;
    // Around the head first, then beside the shaft on either hand, clear of its line: a label left off
    // where the first spots are taken (a tight bend, a branch) would leave a bare arrow.
    const mx = (s.sx + ex) / 2,
      my = (s.sy + ey) / 2;
    const room = (w: number) => {
      const d = 4 + (Math.abs(uy) * w + Math.abs(ux) * h) / 2;
      return [
        { x: ux >= 0 ? ex + 3 : ex - 3 - w, y: uy >= 0 ? ey + 2 : ey - 2 - h, w, h },
        { x: ux >= 0 ? ex - 3 - w : ex + 3, y: uy >= 0 ? ey + 2 : ey - 2 - h, w, h },
        { x: ex - w / 2, y: uy >= 0 ? ey + 4 : ey - 4 - h, w, h },
        { x: ux >= 0 ? ex + 3 : ex - 3 - w, y: uy >= 0 ? ey - 2 - h : ey + 2, w, h },
        { x: mx - uy * d - w / 2, y: my + ux * d - h / 2, w, h },
        { x: mx + uy * d - w / 2, y: my - ux * d - h / 2, w, h },
      ];
    };
    if (!room(24).some((r) => space.fits(r))) continue;
    const text = thrustLabel(a.horizontal, a.vertical, units);
    const w = textWidth(ctx, TYPE.force, text) + 4;
    const spot = space.place(room(w));
    if (spot) label(ctx, text, spot.x + 2, spot.y + h / 2, PALETTE.thrust, TYPE.force);
  }
}
