import type { PlanPoint } from '../state/documentEdits.js';
import type { TypedEntry } from '../format/typedEntry.js';

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
    const toward = pointer ? { x: pointer.x - from.x, y: pointer.y - from.y } : null;
    const n = toward ? Math.hypot(toward.x, toward.y) : 0;
    if (!toward || n === 0)
      return { ok: false, message: 'point the pointer where the leg goes, or give a bearing (12.5 @90)' };
    ux = toward.x / n;
    uy = toward.y / n;
  }
  return { ok: true, at: { x: from.x + entry.length * ux, y: from.y + entry.length * uy } };
}
