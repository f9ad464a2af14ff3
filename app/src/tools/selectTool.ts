import type { PlanPoint } from '../state/documentEdits.js';
import type { Hit } from './hit.js';

/** The select tool: click or Shift-click to select, drag nodes to move them, drag empty ground to box-select. */
export type SelectState =
  | { phase: 'idle' }
  | { phase: 'pressed'; origin: PlanPoint; hit: Hit; additive: boolean }
  | { phase: 'dragging'; origin: PlanPoint; ids: string[]; starts: Map<string, PlanPoint>; offset: PlanPoint }
  | { phase: 'boxing'; origin: PlanPoint; current: PlanPoint; additive: boolean };

export type SelectEvent =
  | { type: 'down'; at: PlanPoint; hit: Hit; additive: boolean }
  | { type: 'move'; at: PlanPoint }
  | { type: 'up'; at: PlanPoint };

export interface SelectContext {
  /** m, how far the pointer must move before a press becomes a drag (a few pixels) */
  dragThreshold: number;
  /** nodes currently selected: dragging one of them drags them all */
  selectedNodes: ReadonlySet<string>;
  /** where each node is, m */
  nodeAt: (id: string) => PlanPoint | undefined;
}

/** What the tool asks the app to do. */
export type SelectEffect =
  | { kind: 'select'; hit: Hit; additive: boolean }
  | { kind: 'box'; from: PlanPoint; to: PlanPoint; additive: boolean }
  | { kind: 'preview'; positions: Map<string, PlanPoint> }
  | { kind: 'move'; positions: Map<string, PlanPoint> };

function positions(s: Extract<SelectState, { phase: 'dragging' }>): Map<string, PlanPoint> {
  const out = new Map<string, PlanPoint>();
  for (const [id, p] of s.starts) out.set(id, { x: p.x + s.offset.x, y: p.y + s.offset.y });
  return out;
}

/** One step of the select tool: a pure function of its state and a plan-space pointer event. */
export function selectStep(
  state: SelectState,
  event: SelectEvent,
  ctx: SelectContext,
): { state: SelectState; effect?: SelectEffect } {
  if (event.type === 'down')
    return { state: { phase: 'pressed', origin: event.at, hit: event.hit, additive: event.additive } };
  if (state.phase === 'idle') return { state };
  if (event.type === 'move') {
    if (state.phase === 'pressed') {
      if (Math.hypot(event.at.x - state.origin.x, event.at.y - state.origin.y) < ctx.dragThreshold) return { state };
      if (state.hit.kind === 'node') {
        const ids = ctx.selectedNodes.has(state.hit.id) ? [...ctx.selectedNodes] : [state.hit.id];
        const starts = new Map<string, PlanPoint>();
        for (const id of ids) {
          const at = ctx.nodeAt(id);
          if (at) starts.set(id, at);
        }
        const dragging: SelectState = {
          phase: 'dragging',
          origin: state.origin,
          ids,
          starts,
          offset: { x: event.at.x - state.origin.x, y: event.at.y - state.origin.y },
        };
        return { state: dragging, effect: { kind: 'preview', positions: positions(dragging) } };
      }
      if (state.hit.kind === 'none')
        return { state: { phase: 'boxing', origin: state.origin, current: event.at, additive: state.additive } };
      return { state };
    }
    if (state.phase === 'dragging') {
      const next = { ...state, offset: { x: event.at.x - state.origin.x, y: event.at.y - state.origin.y } };
      return { state: next, effect: { kind: 'preview', positions: positions(next) } };
    }
    return { state: { ...state, current: event.at } };
  }
  // up
  if (state.phase === 'pressed')
    return { state: { phase: 'idle' }, effect: { kind: 'select', hit: state.hit, additive: state.additive } };
  if (state.phase === 'dragging')
    return { state: { phase: 'idle' }, effect: { kind: 'move', positions: positions(state) } };
  return {
    state: { phase: 'idle' },
    effect: { kind: 'box', from: state.origin, to: event.at, additive: state.additive },
  };
}
