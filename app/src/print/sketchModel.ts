import {
  blockTopShown,
  compassPoint,
  formatDimension,
  jointsText,
  layingLengthText,
  quantityText,
  restrainedJointPositions,
  settingOut,
  type Analysis,
  type Leg,
  type ScheduleFitting,
  type UnitSystem,
} from '@mainbrace/solver';

/**
 * A restraint sketch as drawing primitives (crew-sheet.md "A sketch"): a plan and a section drawn
 * from the schedule row's computed geometry, in sketch units (the SVG's viewBox: 1 unit ≈ 0.25 mm on
 * the printed sheet). Every dimension is taken from the schedule view model, so that a change in
 * how blocks or anchors are sized shows here without a change to this file.
 */
export type Shape =
  | { t: 'line'; x1: number; y1: number; x2: number; y2: number; role: Role; dash?: boolean }
  | { t: 'poly'; points: [number, number][]; role: Role; dash?: boolean; closed?: boolean }
  | { t: 'circle'; x: number; y: number; r: number; role: Role }
  | { t: 'text'; x: number; y: number; text: string; role: Role; anchor?: 'start' | 'middle' | 'end'; rotate?: number }
  | { t: 'dim'; x1: number; y1: number; x2: number; y2: number; text: string; side: 1 | -1 }
  | { t: 'hatch'; x1: number; y1: number; x2: number; y2: number; side: 1 | -1; role: Role };

/** What a shape stands for: the renderer gives each role its colour, fill and weight. */
export type Role =
  'pipe' | 'block' | 'outline' | 'anchor' | 'pad' | 'soil' | 'ground' | 'water' | 'thrust' | 'joint' | 'ink';

export interface Sketch {
  mark: string;
  /** each element built, in words with its dimensions */
  plan: Shape[];
  section: Shape[];
  /** the lines written under the views: what to build and where, in a crew's words */
  lines: string[];
  /** error-level restraint: outlines only and a bold note */
  notAdequate: boolean;
  /** a joints-only fitting: the plan is the restrained legs */
  jointsOnly: boolean;
}

/** The size of one view: the plan and the section are drawn in boxes this big. */
export const VIEW = { w: 118, h: 118 } as const;

/** Where the thrust puts the block, in a crew's words. */
function bearingSide(f: ScheduleFitting, legs: readonly Leg[], bearing: number): string {
  switch (f.kind) {
    case 'bend':
    case 'reducing-bend':
      // A reducing bend that turns little in plan (a dip, a slight angle) pushes toward its smaller
      // pipe, as a reducer does: there is no outside of a bend for the block to stand on.
      return f.kind === 'reducing-bend' && towardSmallerPipe(legs, bearing)
        ? 'against the shoulder, toward the smaller pipe'
        : 'on the outside of the bend';
    case 'tee':
    case 'wye':
    case 'cross':
      return 'behind the run, opposite the branch';
    case 'reducer':
      return 'against the shoulder, toward the smaller pipe';
    case 'valve':
      return 'in line with the pipe';
    default:
      return 'behind the cap';
  }
}

/**
 * Whether a plan bearing (degrees clockwise from north) points within 30° of the way the smaller pipe
 * leaves: a reducing bend that pushes so pushes as a reducer does, at the shoulder toward that pipe.
 */
function towardSmallerPipe(legs: readonly Leg[], bearing: number): boolean {
  const b = (bearing * Math.PI) / 180;
  const [bx, by] = [Math.sin(b), Math.cos(b)];
  let small: Leg | undefined;
  for (const l of legs) if (!small || l.pipe.outsideDiameter < small.pipe.outsideDiameter) small = l;
  if (!small) return false;
  const h = Math.hypot(small.direction[0], small.direction[1]);
  return h > 0 && (small.direction[0] * bx + small.direction[1] * by) / h >= Math.cos(Math.PI / 6);
}

/** A plan frame: metres east/north of the fitting → sketch units, north up, centred in the view. */
function planFrame(extent: number) {
  const s = (VIEW.w / 2 - 12) / Math.max(extent, 0.05);
  return {
    s,
    x: (e: number) => VIEW.w / 2 + e * s,
    y: (n: number) => VIEW.h / 2 - n * s,
  };
}

/**
 * The sketch of one schedule row. `analysis` gives the plan direction of each pipe at the fitting
 * (the row has only what they run toward).
 */
export function sketchOf(f: ScheduleFitting, analysis: Analysis, units: UnitSystem): Sketch {
  const design = analysis.project.design;
  const so = settingOut(f, design.dimensionStep);
  const r = f.restraint;
  const dim = (m: number) => formatDimension(m, units);
  // Depths as the schedule words them (columnUnits.ts): a block's top is its base less its height as printed.
  const topText = (m: number) => quantityText(m, 'topDepth', units);
  const baseText = (m: number) => quantityText(m, 'baseDepth', units);
  const notAdequate = f.diagnostics.some((d) => d.severity === 'error');
  const concrete: Role = notAdequate ? 'outline' : 'block';
  const legs = analysis.legs.get(f.node) ?? [];
  const jointsOnly = !r.block && !r.anchor && !r.trenchBottom && r.restrainedLegs.length > 0;
  const plan: Shape[] = [];
  const section: Shape[] = [];
  const lines: string[] = [];

  // ---- plan ----
  const longest = Math.max(0, ...r.restrainedLegs.map((l) => l.length));
  const concreteExtent = Math.max(
    so.block ? Math.hypot(so.block.thickness, so.block.faceWidth / 2) : 0,
    so.reverseBlock ? Math.hypot(so.reverseBlock.thickness, so.reverseBlock.faceWidth / 2) : 0,
    so.anchor ? Math.hypot(so.anchor.length, so.anchor.width) / 2 : 0,
    so.pad ? Math.hypot(so.pad.length, so.pad.width) / 2 : 0,
    so.od * 2,
  );
  const extent = jointsOnly ? longest * 1.05 : concreteExtent * 1.35;
  const p = planFrame(extent);
  for (const l of legs) {
    const [dx, dy] = [l.direction[0], l.direction[1]];
    const len = Math.hypot(dx, dy) || 1;
    const reach = Math.min(l.length, extent * 1.4);
    plan.push({
      t: 'line',
      x1: p.x(0),
      y1: p.y(0),
      x2: p.x((dx / len) * reach),
      y2: p.y((dy / len) * reach),
      role: 'pipe',
    });
    const leg = r.restrainedLegs.find((x) => x.pipe === l.pipe.id);
    if (leg) {
      const u = [dx / len, dy / len] as const;
      const n = [-u[1], u[0]] as const;
      const tick = 5 / p.s;
      for (const at of restrainedJointPositions(leg.length, design.layingLength)) {
        const cx = u[0] * Math.min(at, reach),
          cy = u[1] * Math.min(at, reach);
        plan.push({
          t: 'line',
          x1: p.x(cx + n[0] * tick),
          y1: p.y(cy + n[1] * tick),
          x2: p.x(cx - n[0] * tick),
          y2: p.y(cy - n[1] * tick),
          role: 'joint',
        });
      }
      if (jointsOnly) {
        const off = 11 / p.s;
        const end = Math.min(leg.length, reach);
        plan.push({
          t: 'dim',
          x1: p.x(n[0] * off),
          y1: p.y(n[1] * off),
          x2: p.x(u[0] * end + n[0] * off),
          y2: p.y(u[1] * end + n[1] * off),
          text: quantityText(leg.length, 'restrained', units),
          side: 1,
        });
      }
    }
  }
  const blockPlan = (b: NonNullable<typeof so.block>, role: Role) => {
    const [ux, uy] = b.direction;
    const [nx, ny] = [-uy, ux];
    const w = b.faceWidth / 2;
    const corner = (a: number, c: number): [number, number] => [p.x(ux * a + nx * c), p.y(uy * a + ny * c)];
    plan.push({
      t: 'poly',
      points: [corner(0, -w), corner(b.thickness, -w), corner(b.thickness, w), corner(0, w)],
      role,
      closed: true,
    });
    // Undisturbed soil hatched beyond the bearing face.
    const [a1, a2] = [corner(b.thickness, -w), corner(b.thickness, w)];
    plan.push({ t: 'hatch', x1: a1[0], y1: a1[1], x2: a2[0], y2: a2[1], side: 1, role: 'soil' });
    // Face width along the face, thickness from the fitting's centreline to the face.
    const off = 8 / p.s;
    const [d1, d2] = [corner(b.thickness + off, -w), corner(b.thickness + off, w)];
    plan.push({ t: 'dim', x1: d1[0], y1: d1[1], x2: d2[0], y2: d2[1], text: dim(b.faceWidth), side: 1 });
    const [e1, e2] = [corner(0, -w - off), corner(b.thickness, -w - off)];
    plan.push({ t: 'dim', x1: e1[0], y1: e1[1], x2: e2[0], y2: e2[1], text: dim(b.thickness), side: -1 });
  };
  if (so.block) {
    blockPlan(so.block, concrete);
    // The thrust the block resists: from the fitting toward the bearing face.
    const [ux, uy] = so.block.direction;
    const a = so.block.thickness * 0.8;
    plan.push({ t: 'line', x1: p.x(0), y1: p.y(0), x2: p.x(ux * a), y2: p.y(uy * a), role: 'thrust' });
  }
  if (so.reverseBlock) blockPlan(so.reverseBlock, concrete);
  if (so.anchor) {
    const [l, w] = [so.anchor.length / 2, so.anchor.width / 2];
    plan.push({
      t: 'poly',
      points: [
        [p.x(-l), p.y(-w)],
        [p.x(l), p.y(-w)],
        [p.x(l), p.y(w)],
        [p.x(-l), p.y(w)],
      ],
      role: notAdequate ? 'outline' : 'anchor',
      dash: true,
      closed: true,
    });
    plan.push({
      t: 'dim',
      x1: p.x(-l),
      y1: p.y(-w) + 8,
      x2: p.x(l),
      y2: p.y(-w) + 8,
      text: dim(so.anchor.length),
      side: 1,
    });
  }
  if (so.pad && legs[0]) {
    const [dx, dy] = [legs[0].direction[0], legs[0].direction[1]];
    const len = Math.hypot(dx, dy) || 1;
    const [ux, uy] = [dx / len, dy / len];
    const [nx, ny] = [-uy, ux];
    const [a, c] = [so.pad.length / 2, so.pad.width / 2];
    const corner = (s: number, q: number): [number, number] => [p.x(ux * s + nx * q), p.y(uy * s + ny * q)];
    plan.push({
      t: 'poly',
      points: [corner(-a, -c), corner(a, -c), corner(a, c), corner(-a, c)],
      role: notAdequate ? 'outline' : 'pad',
      dash: true,
      closed: true,
    });
  }
  plan.push({ t: 'circle', x: p.x(0), y: p.y(0), r: 2.2, role: 'ink' });
  // North, for reading the plan against the key plan.
  plan.push({
    t: 'poly',
    points: [
      [VIEW.w - 8, 4],
      [VIEW.w - 5, 13],
      [VIEW.w - 11, 13],
    ],
    role: 'ink',
    closed: true,
  });
  plan.push({ t: 'text', x: VIEW.w - 8, y: 22, text: 'N', role: 'ink', anchor: 'middle' });
  plan.push({ t: 'text', x: 2, y: VIEW.h - 2, text: 'PLAN', role: 'ink' });

  // ---- section across the pipe, looking along it: ground, cover, pipe, concrete, soil, water ----
  const depthBelow = Math.max(
    so.block?.baseDepth ?? 0,
    so.reverseBlock?.baseDepth ?? 0,
    so.anchor?.baseDepth ?? 0,
    so.pad?.baseDepth ?? 0,
    so.ground - so.centreline + so.od,
  );
  const across = Math.max(
    (so.block?.thickness ?? 0) + (so.reverseBlock?.thickness ?? 0),
    so.anchor?.width ?? 0,
    so.pad?.width ?? 0,
    so.od * 3,
  );
  const ss = Math.min((VIEW.h - 26) / (depthBelow * 1.05), (VIEW.w - 34) / (across * 1.3));
  const gy = 12;
  const sy = (depth: number) => gy + depth * ss;
  // Horizontal axis: along the bearing direction, the fitting's centreline at cx.
  const cx = VIEW.w / 2 - (so.block && !so.reverseBlock ? (so.block.thickness * ss) / 2 : 0);
  const sx = (u: number) => cx + u * ss;
  const centreDepth = so.ground - so.centreline;
  section.push({ t: 'line', x1: 2, y1: gy, x2: VIEW.w - 2, y2: gy, role: 'ground' });
  section.push({ t: 'hatch', x1: 2, y1: gy, x2: VIEW.w - 2, y2: gy, side: 1, role: 'ground' });
  const gw = design.groundwaterElevation;
  if (gw !== null && so.ground - gw < depthBelow * 1.05) {
    const wy = sy(Math.max(0, so.ground - gw));
    section.push({ t: 'line', x1: 2, y1: wy, x2: VIEW.w - 2, y2: wy, role: 'water', dash: true });
    section.push({ t: 'text', x: 4, y: wy - 2, text: 'groundwater', role: 'water' });
  }
  const blockSection = (b: NonNullable<typeof so.block>, sign: 1 | -1, role: Role) => {
    const x0 = sx(0),
      x1 = sx(sign * b.thickness);
    const [top, base] = [sy(b.topDepth), sy(b.baseDepth)];
    section.push({
      t: 'poly',
      points: [
        [x0, top],
        [x1, top],
        [x1, base],
        [x0, base],
      ],
      role,
      closed: true,
    });
    section.push({ t: 'hatch', x1, y1: top, x2: x1, y2: base, side: sign === 1 ? -1 : 1, role: 'soil' });
    const fx = x1 + sign * 9;
    section.push({ t: 'dim', x1: fx, y1: top, x2: fx, y2: base, text: dim(b.faceHeight), side: sign });
  };
  if (so.block) blockSection(so.block, 1, concrete);
  if (so.reverseBlock) blockSection(so.reverseBlock, -1, concrete);
  if (so.anchor) {
    const w = so.anchor.width / 2;
    section.push({
      t: 'poly',
      points: [
        [sx(-w), sy(so.anchor.topDepth)],
        [sx(w), sy(so.anchor.topDepth)],
        [sx(w), sy(so.anchor.baseDepth)],
        [sx(-w), sy(so.anchor.baseDepth)],
      ],
      role: notAdequate ? 'outline' : 'anchor',
      closed: true,
    });
    section.push({
      t: 'dim',
      x1: sx(w) + 8,
      y1: sy(so.anchor.topDepth),
      x2: sx(w) + 8,
      y2: sy(so.anchor.baseDepth),
      text: dim(so.anchor.height),
      side: 1,
    });
    // Straps over the pipe down into the anchor.
    const rr = (so.od / 2) * ss;
    section.push({
      t: 'line',
      x1: sx(0) - rr - 1,
      y1: sy(centreDepth),
      x2: sx(0) - rr - 1,
      y2: sy(so.anchor.topDepth) + 6,
      role: 'ink',
    });
    section.push({
      t: 'line',
      x1: sx(0) + rr + 1,
      y1: sy(centreDepth),
      x2: sx(0) + rr + 1,
      y2: sy(so.anchor.topDepth) + 6,
      role: 'ink',
    });
  }
  if (so.pad) {
    const w = so.pad.width / 2;
    section.push({
      t: 'poly',
      points: [
        [sx(-w), sy(so.pad.topDepth)],
        [sx(w), sy(so.pad.topDepth)],
        [sx(w), sy(so.pad.baseDepth)],
        [sx(-w), sy(so.pad.baseDepth)],
      ],
      role: notAdequate ? 'outline' : 'pad',
      closed: true,
    });
    section.push({
      t: 'hatch',
      x1: sx(-w),
      y1: sy(so.pad.baseDepth),
      x2: sx(w),
      y2: sy(so.pad.baseDepth),
      side: 1,
      role: 'soil',
    });
  }
  section.push({ t: 'circle', x: sx(0), y: sy(centreDepth), r: Math.max(1.5, (so.od / 2) * ss), role: 'pipe' });
  // Depths from the ground: to the top and to the base of the deepest concrete, at the left edge.
  const main = so.block ?? so.reverseBlock;
  const dx = 6;
  if (main) {
    section.push({
      t: 'dim',
      x1: dx,
      y1: gy,
      x2: dx,
      y2: sy(main.topDepth),
      text: topText(blockTopShown(main, units)),
      side: 1,
    });
    section.push({
      t: 'dim',
      x1: dx + 14,
      y1: gy,
      x2: dx + 14,
      y2: sy(main.baseDepth),
      text: baseText(main.baseDepth),
      side: 1,
    });
  } else if (so.anchor) {
    section.push({
      t: 'dim',
      x1: dx,
      y1: gy,
      x2: dx,
      y2: sy(so.anchor.baseDepth),
      text: baseText(so.anchor.baseDepth),
      side: 1,
    });
  } else if (so.pad) {
    section.push({
      t: 'dim',
      x1: dx,
      y1: gy,
      x2: dx,
      y2: sy(so.pad.baseDepth),
      text: baseText(so.pad.baseDepth),
      side: 1,
    });
  } else {
    section.push({ t: 'dim', x1: dx, y1: gy, x2: dx, y2: sy(centreDepth - so.od / 2), text: dim(f.cover), side: 1 });
  }
  section.push({ t: 'text', x: 2, y: VIEW.h - 2, text: 'SECTION', role: 'ink' });

  // ---- words: what the dimensions cannot say, short ----
  if (notAdequate) lines.push('NOT ADEQUATE — do not build as drawn: see the bold note.');
  // The block's size is in the table row and on the dimensions: the words say what they cannot.
  const blockLine = (b: NonNullable<typeof so.block>, what: string) =>
    `${what} bears ${compassPoint(b.bearing)} against undisturbed soil ${bearingSide(f, legs, b.bearing)}, ` +
    `face ${dim(b.thickness)} from fitting centre; top ${topText(blockTopShown(b, units))}, base ${baseText(b.baseDepth)} below ground.`;
  if (so.block) lines.push(blockLine(so.block, 'Block'));
  if (so.reverseBlock) {
    const same =
      so.block &&
      so.block.faceWidth === so.reverseBlock.faceWidth &&
      so.block.faceHeight === so.reverseBlock.faceHeight &&
      so.block.thickness === so.reverseBlock.thickness;
    lines.push(
      same
        ? `Opposite block: same size, bears ${compassPoint(so.reverseBlock.bearing)}.`
        : blockLine(so.reverseBlock, 'Opposite block'),
    );
  }
  if (so.anchor)
    lines.push(
      `Anchor ${dim(so.anchor.length)} L × ${dim(so.anchor.width)} W × ${dim(so.anchor.height)} H${so.anchor.cube ? ' (cube)' : ''} ` +
        `under the fitting, base ${baseText(so.anchor.baseDepth)} below ground; anchor straps to the fitting.`,
    );
  if (so.pad)
    lines.push(
      `Pad ${dim(so.pad.width)} w × ${dim(so.pad.length)} l × ${dim(so.pad.thickness)} t, on the trench bottom.`,
    );
  if (r.restrainedLegs.length) {
    const legsText = r.restrainedLegs.map(
      (l) =>
        `${quantityText(l.length, 'restrained', units)} toward ${l.toward ?? 'the end of the line'} (${jointsText(l.joints)})`,
    );
    lines.push(
      `Restrain ${legsText.join('; ')}: ${layingLengthText(design.layingLength, units)} pipes, the first joint at the fitting.`,
    );
  }
  return { mark: f.mark, plan, section, lines, notAdequate, jointsOnly };
}
