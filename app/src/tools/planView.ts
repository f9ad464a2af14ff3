import { imageToPlan } from '@mainbrace/solver';
import { centreOn, fitView, toScreen } from '../state/viewport.js';
import { fitInsetRight, LEGEND_MIN_CANVAS_PX, type PlanInput } from './planInput.js';
import type { PlanPoint } from '../state/documentEdits.js';

// How the plan's view is framed: what the store's actions and the plan's first size need at start,
// apart from the input tools (tools/dispatch.ts), which load on first use (docs/performance.md).

/** The view that shows the whole route (or, with no route yet, the site plan), leaving the legend's strip clear. */
export function fittedView(s: Pick<PlanInput, 'project' | 'canvas' | 'legendOpen'>) {
  const width = s.canvas.width - fitInsetRight(s);
  // A small plan cannot spare 100 px of margin a side: keep room for arrows in proportion.
  const margin = Math.min(100, 0.14 * Math.min(width, s.canvas.height));
  // With no route yet, a site plan to trace is what there is to see: fit its corners.
  const u = s.project.underlay;
  const points =
    s.project.nodes.length === 0 && u
      ? [
          { u: 0, v: 0 },
          { u: u.width, v: 0 },
          { u: 0, v: u.height },
          { u: u.width, v: u.height },
        ].map((q) => imageToPlan(u, q))
      : s.project.nodes;
  return fitView(points, width, s.canvas.height, margin);
}

/** Brings a node into view (keeping the scale) when it is off screen or under the edge. */
export function reveal(s: PlanInput, id: string): PlanInput {
  const n = s.project.nodes.find((x) => x.id === id);
  return n ? revealPoint(s, n) : s;
}

/** Brings a plan point into view (keeping the scale) when it is off screen or under the edge. */
export function revealPoint(s: PlanInput, n: PlanPoint): PlanInput {
  const p = toScreen(s.viewport, n);
  const margin = 40;
  const inside =
    p.sx >= margin &&
    p.sy >= margin &&
    p.sx <= s.canvas.width - fitInsetRight(s) - margin &&
    p.sy <= s.canvas.height - margin;
  return inside ? s : { ...s, viewport: centreOn(s.viewport, n, s.canvas.width - fitInsetRight(s), s.canvas.height) };
}

/** Selects a fitting, bringing it into view only when it is off screen (a row of the schedule). */
export const revealFitting = (s: PlanInput, id: string): PlanInput =>
  reveal({ ...s, selection: { nodes: new Set([id]), pipes: new Set() } }, id);

/** Selects a fitting and brings it into view (the schedule's and details' "zoom to fitting"). */
export function showFitting(s: PlanInput, id: string): PlanInput {
  const n = s.project.nodes.find((x) => x.id === id);
  if (!n) return s;
  // Close enough to read the fitting's block and arrow: at least 4 px per metre.
  const scale = Math.max(s.viewport.scale, 4);
  return {
    ...s,
    selection: { nodes: new Set([id]), pipes: new Set() },
    viewport: centreOn({ ...s.viewport, scale }, n, s.canvas.width - fitInsetRight(s), s.canvas.height),
  };
}

/** The plan learns its size: the first size is when it can first show the whole route. */
export function resized(s: PlanInput, width: number, height: number): PlanInput {
  const first = s.canvas.width === 0 || s.canvas.height === 0;
  const next = {
    ...s,
    canvas: { width, height },
    // A narrow plan starts with the legend closed (one tap opens it).
    legendOpen: first ? s.legendOpen && width >= LEGEND_MIN_CANVAS_PX : s.legendOpen,
  };
  return first ? { ...next, viewport: fittedView(next) } : next;
}
