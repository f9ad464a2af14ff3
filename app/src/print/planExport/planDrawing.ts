import {
  FOOT,
  formatDimension,
  quantityText,
  restrainedJointPositions,
  settingOut,
  type Analysis,
  type ScheduleFitting,
  type UnitSystem,
} from '@mainbrace/solver';
import { extentOf } from '../../format/extent.js';
import { CAUTION_INDENT, CAUTION_LINE, CAUTION_SIZE, cautionLines, wrapText } from './sheetText.js';

/** A drawing scale a drawing set uses: metric ratios, or inches on paper to feet on the ground. */
export interface PlanScale {
  id: string;
  label: string;
  /** millimetres on paper per metre on the ground */
  mmPerMetre: number;
}

export const PLAN_SCALES: readonly PlanScale[] = [
  { id: '1:200', label: '1:200', mmPerMetre: 1000 / 200 },
  { id: '1:500', label: '1:500', mmPerMetre: 1000 / 500 },
  { id: '1:1000', label: '1:1000', mmPerMetre: 1000 / 1000 },
  { id: '1in20ft', label: '1" = 20 ft', mmPerMetre: 25.4 / (20 * FOOT) },
  { id: '1in40ft', label: '1" = 40 ft', mmPerMetre: 25.4 / (40 * FOOT) },
  { id: '1in50ft', label: '1" = 50 ft', mmPerMetre: 25.4 / (50 * FOOT) },
];

/** What a drawn thing is: the writers give each its colour and weight. */
export type Ink = 'pipe' | 'block' | 'anchor' | 'pad' | 'joint' | 'ink' | 'thrust';

/** Drawing primitives in paper millimetres, y down from the sheet's top-left corner. */
export type Mark =
  | { t: 'line'; x1: number; y1: number; x2: number; y2: number; ink: Ink; width: number; dash?: boolean }
  | { t: 'poly'; points: [number, number][]; ink: Ink; fill: boolean; dash?: boolean }
  | { t: 'text'; x: number; y: number; text: string; size: number; bold?: boolean; anchor?: 'start' | 'middle' };

export interface Drawing {
  /** sheet size, mm */
  width: number;
  height: number;
  marks: Mark[];
  scale: PlanScale;
}

/** Largest sheet either writer makes, mm: the longest roll a plotter takes (about 5 m). */
export const LARGEST_SHEET = 5000;
const MARGIN = 20;
/** Text height of marks, mm: 2.5 mm ≈ 7 pt, the least a drawing set prints. */
const MARK_SIZE = 2.5;

/**
 * The plan at a true scale for the drawing set: pipes at their outside diameter
 * (at least a visible line), blocks, anchors and pads from the setting-out geometry, restrained zones
 * as a tick per joint, fitting marks, a north arrow, a scale bar, a scale statement and, under them, the
 * cautions every printed page carries. Throws when
 * the sheet would be larger than LARGEST_SHEET: the message names a smaller scale.
 */
export function planDrawing(
  analysis: Analysis,
  rows: readonly ScheduleFitting[],
  units: UnitSystem,
  scale: PlanScale,
  title: string,
): Drawing {
  const { project } = analysis;
  const [x0, x1] = extentOf(project.nodes.map((n) => n.x));
  const [y0, y1] = extentOf(project.nodes.map((n) => n.y));
  const k = scale.mmPerMetre;
  const width = Math.max(297, (x1 - x0) * k + 2 * MARGIN);
  const cautions = cautionLines(width - 2 * MARGIN);
  // The cautions' block under the scale bar: a heading, then their lines.
  const cautionBlock = CAUTION_LINE * (cautions.length + 1) + 8;
  const height = Math.max(210, (y1 - y0) * k + 2 * MARGIN + 30 + cautionBlock);
  if (!(width <= LARGEST_SHEET && height <= LARGEST_SHEET)) {
    throw new Error(
      `At ${scale.label} the plan needs a sheet ${Math.round(width)} × ${Math.round(height)} mm, more than ${LARGEST_SHEET} mm: choose a smaller scale`,
    );
  }
  const px = (x: number) => MARGIN + (x - x0) * k + (width - 2 * MARGIN - (x1 - x0) * k) / 2;
  const py = (y: number) => MARGIN + 12 + (y1 - y) * k;
  const marks: Mark[] = [];
  const at = new Map(project.nodes.map((n) => [n.id, n]));
  for (const p of project.pipes) {
    const a = at.get(p.from)!,
      b = at.get(p.to)!;
    marks.push({
      t: 'line',
      x1: px(a.x),
      y1: py(a.y),
      x2: px(b.x),
      y2: py(b.y),
      ink: 'pipe',
      width: Math.max(0.35, p.outsideDiameter * k),
    });
  }
  const step = project.design.dimensionStep;
  for (const f of rows) {
    const so = settingOut(f, step);
    const [fx, fy] = [f.position[0], f.position[1]];
    for (const b of [so.block, so.reverseBlock]) {
      if (!b) continue;
      const [ux, uy] = b.direction;
      const [nx, ny] = [-uy, ux];
      const w = b.faceWidth / 2;
      const c = (s: number, q: number): [number, number] => [px(fx + ux * s + nx * q), py(fy + uy * s + ny * q)];
      marks.push({
        t: 'poly',
        points: [c(0, -w), c(b.thickness, -w), c(b.thickness, w), c(0, w)],
        ink: 'block',
        fill: true,
      });
    }
    if (so.anchor) {
      const [l, w] = [so.anchor.length / 2, so.anchor.width / 2];
      marks.push({
        t: 'poly',
        points: [
          [px(fx - l), py(fy - w)],
          [px(fx + l), py(fy - w)],
          [px(fx + l), py(fy + w)],
          [px(fx - l), py(fy + w)],
        ],
        ink: 'anchor',
        fill: false,
        dash: true,
      });
    }
    const legs = analysis.legs.get(f.node) ?? [];
    if (so.pad && legs[0]) {
      const d = legs[0].direction;
      const len = Math.hypot(d[0], d[1]) || 1;
      const [ux, uy] = [d[0] / len, d[1] / len];
      const [nx, ny] = [-uy, ux];
      const [a, c2] = [so.pad.length / 2, so.pad.width / 2];
      const c = (s: number, q: number): [number, number] => [px(fx + ux * s + nx * q), py(fy + uy * s + ny * q)];
      marks.push({
        t: 'poly',
        points: [c(-a, -c2), c(a, -c2), c(a, c2), c(-a, c2)],
        ink: 'pad',
        fill: false,
        dash: true,
      });
    }
    for (const l of f.restraint.restrainedLegs) {
      const leg = legs.find((x) => x.pipe.id === l.pipe);
      if (!leg) continue;
      const len = Math.hypot(leg.direction[0], leg.direction[1]) || 1;
      const [ux, uy] = [leg.direction[0] / len, leg.direction[1] / len];
      const [nx, ny] = [-uy, ux];
      const half = 1.6 / k;
      for (const s of restrainedJointPositions(l.length, project.design.layingLength)) {
        const [cx, cy] = [fx + ux * Math.min(s, leg.length), fy + uy * Math.min(s, leg.length)];
        marks.push({
          t: 'line',
          x1: px(cx + nx * half),
          y1: py(cy + ny * half),
          x2: px(cx - nx * half),
          y2: py(cy - ny * half),
          ink: 'joint',
          width: 0.35,
        });
      }
      const end = Math.min(l.length, leg.length);
      const off = 3 / k;
      marks.push({
        t: 'line',
        x1: px(fx + nx * off),
        y1: py(fy + ny * off),
        x2: px(fx + ux * end + nx * off),
        y2: py(fy + uy * end + ny * off),
        ink: 'joint',
        width: 0.18,
      });
      marks.push({
        t: 'text',
        x: px(fx + (ux * end) / 2 + nx * off * 1.8),
        y: py(fy + (uy * end) / 2 + ny * off * 1.8),
        text: quantityText(l.length, 'restrained', units),
        size: MARK_SIZE * 0.9,
        anchor: 'middle',
      });
    }
    marks.push({ t: 'text', x: px(fx) + 2, y: py(fy) - 2, text: f.mark, size: MARK_SIZE, bold: true });
  }
  // North arrow, scale bar, statement.
  const nx = width - MARGIN,
    ny = MARGIN;
  marks.push({
    t: 'poly',
    points: [
      [nx, ny],
      [nx + 3, ny + 9],
      [nx, ny + 7],
      [nx - 3, ny + 9],
    ],
    ink: 'ink',
    fill: true,
  });
  marks.push({ t: 'text', x: nx, y: ny + 14, text: 'N', size: 3.5, bold: true, anchor: 'middle' });
  const barGround = niceLength(60 / k, units);
  const barY = height - MARGIN + 6 - cautionBlock;
  marks.push({ t: 'line', x1: MARGIN, y1: barY, x2: MARGIN + barGround * k, y2: barY, ink: 'ink', width: 1 });
  for (const s of [0, 0.5, 1])
    marks.push({
      t: 'line',
      x1: MARGIN + barGround * k * s,
      y1: barY - 1.5,
      x2: MARGIN + barGround * k * s,
      y2: barY + 1.5,
      ink: 'ink',
      width: 0.25,
    });
  marks.push({
    t: 'text',
    x: MARGIN + barGround * k + 3,
    y: barY + 1,
    text:
      units === 'us'
        ? `${Math.round(barGround / FOOT)} ft`
        : `${formatDimension(barGround, 'si').replace(/\.00 m$/, ' m')}`,
    size: MARK_SIZE,
  });
  const statement = `${title} — plan at ${scale.label} on a ${Math.round(width)} × ${Math.round(height)} mm sheet. Blocks, anchors (dashed), pads and restrained joints (ticks) from the schedule.`;
  // Clear of the north arrow at the top right.
  wrapText(statement, 3, width - 2 * MARGIN - 10).forEach((line, i) =>
    marks.push({ t: 'text', x: MARGIN, y: MARGIN - 6 + i * 4.2, text: line, size: 3, bold: true }),
  );
  marks.push({ t: 'text', x: MARGIN, y: barY + 8, text: 'Cautions', size: CAUTION_SIZE, bold: true });
  cautions.forEach((line, i) =>
    marks.push({
      t: 'text',
      x: MARGIN + (line.indent ? CAUTION_INDENT : 0),
      y: barY + 8 + CAUTION_LINE * (i + 1),
      text: line.text,
      size: CAUTION_SIZE,
    }),
  );
  return { width, height, marks, scale };
}

/** A round length near `m` for a scale bar: 1, 2 or 5 × a power of ten, of metres or of feet. */
export function niceLength(m: number, units: UnitSystem): number {
  const unit = units === 'us' ? FOOT : 1;
  const v = m / unit;
  const p = Math.pow(10, Math.floor(Math.log10(v)));
  const n = v / p >= 5 ? 5 : v / p >= 2 ? 2 : 1;
  return n * p * unit;
}
