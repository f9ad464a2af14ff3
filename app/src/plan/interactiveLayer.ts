import {
  imageToPlan,
  type Analysis,
  type ImagePoint,
  type Project,
  type Underlay,
  type UnitSystem,
} from '@mainbrace/solver';
import type { PlanPoint } from '../state/documentEdits.js';
import type { Selection } from '../state/store.js';
import type { Viewport } from '../state/viewport.js';
import type { Hit } from '../tools/hit.js';
import type { DrawState } from '../tools/drawTool.js';
import { planScene, type Scene } from './planScene.js';
import { drawFittings, drawPipes, placeTags } from './drawRoute.js';
import { LabelSpace } from './labelSpace.js';
import { drawHover, drawOverlay } from './drawOverlay.js';
import { drawLiveChange } from './drawLiveChange.js';
import { drawPicks } from './drawUnderlay.js';
import type { LiveChange } from './liveChange.js';

export { liveChanges } from './liveChange.js';

/**
 * What moves while nodes are dragged: the dragged nodes and the pipes that meet them, at their
 * preview positions, without results (the document changes, and results follow, on drop).
 */
export function dragScene(
  project: Project,
  analysis: Analysis,
  selection: Selection,
  preview: ReadonlyMap<string, PlanPoint>,
): Scene {
  const touching = project.pipes.filter((p) => preview.has(p.from) || preview.has(p.to));
  const ids = new Set([...preview.keys(), ...touching.flatMap((p) => [p.from, p.to])]);
  const sub: Project = { ...project, nodes: project.nodes.filter((n) => ids.has(n.id)), pipes: touching };
  const scene = planScene(sub, analysis, { kind: 'envelope' }, selection, preview);
  const moving = (id: string) => preview.has(id);
  return {
    ...scene,
    arrows: [],
    polygons: [],
    zones: [],
    largestForce: 0,
    fittings: scene.fittings.filter((f) => moving(f.node)),
    plainNodes: scene.plainNodes.filter((n) => moving(n.id)),
  };
}

/** Everything the interactive layer shows; each part is absent when nothing of it is going on. */
export interface InteractiveParts {
  width: number;
  height: number;
  units: UnitSystem;
  /** the dragged nodes and their pipes */
  moving: Scene | null;
  /** the slider's gesture: the blocks before it, and what changed since, with each case's name */
  live: { before: Scene; changes: readonly LiveChange[]; caseLabel: (id: string) => string } | null;
  /** what a click would select or join, on this document */
  hover: { project: Project; hit: Hit; attaching: boolean } | null;
  draw: DrawState;
  selectBox: { from: PlanPoint; to: PlanPoint } | null;
  snapped: boolean;
  /** points picked so far to calibrate the site-plan image */
  picks: { underlay: Underlay; points: readonly ImagePoint[] } | null;
}

/**
 * The plan's interactive layer: dragged nodes, the slider's changes, hover, the run being drawn, the
 * selection box and calibration picks. It draws nothing until the user acts, so it is loaded with the
 * input tools (after the first screen), not with the first screen.
 */
export function drawInteractive(ctx: CanvasRenderingContext2D, v: Viewport, p: InteractiveParts) {
  if (p.moving) {
    drawPipes(ctx, v, p.moving);
    drawFittings(ctx, v, p.moving, placeTags(ctx, v, p.moving, new LabelSpace(p.width, p.height)));
  }
  // The changes since the slider's gesture began, over the marks (their labels avoid each other).
  if (p.live)
    drawLiveChange(ctx, v, p.live.before.polygons, p.live.changes, p.live.caseLabel, new LabelSpace(p.width, p.height));
  if (p.hover) drawHover(ctx, v, p.hover.project, p.hover.hit, p.hover.attaching);
  drawOverlay(ctx, v, p.draw, p.selectBox, p.units, p.snapped);
  if (p.picks)
    drawPicks(
      ctx,
      v,
      p.picks.points.map((q) => imageToPlan(p.picks!.underlay, q)),
    );
}
