import type { PlanPoint } from '../state/documentEdits.js';
import type { TypedEntry } from '../format/typedEntry.js';
import { drawStep, type DrawOutcome, type DrawState } from './drawTool.js';
import type { Hit } from './hit.js';

export type TypedPlacement = { ok: true; at: PlanPoint } | { ok: false; message: string };

const RAD = Math.PI / 180;

/**
 * Where a typed entry puts the next node, drawing on from `from`: a length along the pointer, turned
 * from the previous leg, or at a bearing (clockwise from north; plan x east, y north); or coordinates.
 */
export function typedPoint(
  entry: TypedEntry,
  from: PlanPoint | null,
  previous: PlanPoint | null,
  pointer: PlanPoint | null,
): TypedPlacement {
  if (entry.kind === 'point') return { ok: true, at: { x: entry.x, y: entry.y } };
  if (!from)
    return { ok: false, message: 'start the run first: click on the plan or type its coordinates (E 120 N 340)' };
  let ux: number;
  let uy: number;
  const d = entry.direction;
  if (d.kind === 'bearing') {
    ux = Math.sin(d.degrees * RAD);
    uy = Math.cos(d.degrees * RAD);
  } else if (d.kind === 'deflection') {
    const n = previous ? Math.hypot(previous.x, previous.y) : 0;
    if (!previous || n === 0)
      return { ok: false, message: 'a turn needs a previous leg: give a bearing for the first leg (12.5 @90)' };
    const c = Math.cos(d.degrees * RAD);
    const s = Math.sin(d.degrees * RAD);
    ux = (previous.x * c - previous.y * s) / n;
    uy = (previous.x * s + previous.y * c) / n;
  } else {
    // Toward the pointer; with the pointer on the last node (just placed by typing), straight on.
    const toward = pointer ? { x: pointer.x - from.x, y: pointer.y - from.y } : null;
    const along = toward && Math.hypot(toward.x, toward.y) > 0 ? toward : previous;
    const n = along ? Math.hypot(along.x, along.y) : 0;
    if (!along || n === 0)
      return { ok: false, message: 'point the pointer where the leg goes, or give a bearing (12.5 @90)' };
    ux = along.x / n;
    uy = along.y / n;
  }
  return { ok: true, at: { x: from.x + entry.length * ux, y: from.y + entry.length * uy } };
}

/** Typed points closer than this to a node or pipe, m, join it (coordinates are kept to 1 mm). */
export const TYPED_JOIN = 0.001;

/**
 * One typed entry as a step of the draw tool: the node it places is clicked exactly there, with no
 * snapping; a point on a node or pipe joins it. `hitAt` says what lies at a plan point.
 */
export function typedStep(
  state: DrawState,
  entry: TypedEntry,
  hitAt: (at: PlanPoint) => Hit,
): ({ ok: true } & DrawOutcome) | { ok: false; message: string } {
  const drawing = state.phase === 'drawing' ? state : null;
  const points = drawing ? [drawing.startPoint, ...drawing.vertices] : [];
  const from = points.at(-1) ?? null;
  const before = points.at(-2);
  const previous = from && before ? { x: from.x - before.x, y: from.y - before.y } : null;
  const placed = typedPoint(entry, from, previous, drawing?.cursor ?? null);
  if (!placed.ok) return placed;
  const out = drawStep(
    state,
    { type: 'click', at: placed.at, hit: hitAt(placed.at) },
    { snapping: false, lengthStep: 1, samePoint: TYPED_JOIN },
  );
  if (out.state === state && !out.commit) return { ok: false, message: 'that is the point the run is at now' };
  return { ok: true, ...out };
}
