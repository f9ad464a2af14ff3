import type { PlanPoint, RouteEnd } from '../state/documentEdits.js';
import type { Hit } from './hit.js';
import { snapSegment } from './snapping.js';
import { lastPoint, previousDirection } from './rubberBand.js';

export { rubberBand } from './rubberBand.js';

/** The draw tool: click to place vertices; a run may start and end on nodes or on pipes. */
export type DrawState =
  | { phase: 'idle' }
  | { phase: 'drawing'; start: RouteEnd; startPoint: PlanPoint; vertices: PlanPoint[]; cursor: PlanPoint | null };

export type DrawEvent =
  | { type: 'click'; at: PlanPoint; hit: Hit }
  | { type: 'move'; at: PlanPoint; hit: Hit }
  | { type: 'finish' }
  | { type: 'cancel' }
  | { type: 'removeVertex' };

export interface DrawContext {
  snapping: boolean;
  /** m, length step when snapping */
  lengthStep: number;
  /** m, two clicks closer than this are one point (a double-click) */
  samePoint: number;
}

export interface DrawCommit {
  start: RouteEnd;
  vertices: PlanPoint[];
  end: RouteEnd | null;
}

export interface DrawOutcome {
  state: DrawState;
  commit?: DrawCommit;
}

const IDLE: DrawState = { phase: 'idle' };

/** Where the pointer would place the next vertex: on the hit node or pipe, else snapped open ground. */
function target(s: Extract<DrawState, { phase: 'drawing' }>, at: PlanPoint, hit: Hit, ctx: DrawContext): PlanPoint {
  if (hit.kind !== 'none') return hit.at;
  return ctx.snapping ? snapSegment(lastPoint(s), previousDirection(s), at, ctx.lengthStep) : at;
}

const endOf = (hit: Hit, at: PlanPoint): RouteEnd =>
  hit.kind === 'node'
    ? { kind: 'node', id: hit.id }
    : hit.kind === 'pipe'
      ? { kind: 'pipe', id: hit.id, at: hit.at }
      : { kind: 'point', at };

/** One step of the draw tool: a pure function of its state and a plan-space event. */
export function drawStep(state: DrawState, event: DrawEvent, ctx: DrawContext): DrawOutcome {
  if (state.phase === 'idle') {
    if (event.type !== 'click') return { state };
    const at = event.hit.kind === 'none' ? event.at : event.hit.at;
    return { state: { phase: 'drawing', start: endOf(event.hit, at), startPoint: at, vertices: [], cursor: at } };
  }
  switch (event.type) {
    case 'move':
      return { state: { ...state, cursor: target(state, event.at, event.hit, ctx) } };
    case 'click': {
      const at = target(state, event.at, event.hit, ctx);
      const last = lastPoint(state);
      if (Math.hypot(at.x - last.x, at.y - last.y) < ctx.samePoint) return { state };
      if (event.hit.kind !== 'none') {
        const startsHere = state.start.kind === 'node' && event.hit.kind === 'node' && event.hit.id === state.start.id;
        if (startsHere && state.vertices.length === 0) return { state };
        return { state: IDLE, commit: { start: state.start, vertices: state.vertices, end: endOf(event.hit, at) } };
      }
      return { state: { ...state, vertices: [...state.vertices, at], cursor: at } };
    }
    case 'finish':
      if (state.vertices.length === 0) return { state: IDLE };
      return { state: IDLE, commit: { start: state.start, vertices: state.vertices, end: null } };
    case 'cancel':
      return { state: IDLE };
    case 'removeVertex':
      if (state.vertices.length === 0) return { state: IDLE };
      return { state: { ...state, vertices: state.vertices.slice(0, -1) } };
  }
}
