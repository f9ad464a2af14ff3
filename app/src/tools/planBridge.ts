import { analyse, scheduleOf } from '@mainbrace/solver';
import type { AppState, AppStore } from '../state/store.js';
import type { Actions } from '../state/actions.js';
import { dispatch, type DispatchResult } from './dispatch.js';
import type { PlanDerived, PlanEvent, PlanInput, PlanIntent } from './planInput.js';

/** The dispatcher's view of the app state. */
export function planInputOf(s: AppState): PlanInput {
  return {
    project: s.project,
    selection: s.selection,
    tool: s.tool,
    snapping: s.snapping,
    units: s.units,
    viewport: s.viewport,
    canvas: s.canvas,
    legendOpen: s.legendOpen,
    gesture: s.gesture,
    touches: s.touches,
    draw: s.draw,
    hover: s.hover,
    dragPreview: s.dragPreview,
    selectBox: s.selectBox,
    spaceHeld: s.spaceHeld,
    underlayPick: s.underlayPick,
    typed: s.typed,
    typedError: s.typedError,
  };
}

const KEYS = [
  'selection',
  'tool',
  'snapping',
  'viewport',
  'canvas',
  'gesture',
  'touches',
  'draw',
  'hover',
  'dragPreview',
  'selectBox',
  'spaceHeld',
  'legendOpen',
  'underlayPick',
  'typed',
  'typedError',
] as const satisfies readonly (keyof PlanInput & keyof AppState)[];

/** Fittings in chainage order: the schedule's row order (run letter, then number). */
export const derivedOf = (s: AppState): PlanDerived => ({
  fittingOrder: () => scheduleOf(analyse(s.project)).fittings.map((f) => f.node),
});

/** What the app does with intents the plan cannot carry out itself. */
export interface IntentHandlers {
  command: (name: Extract<PlanIntent, { kind: 'command' }>['name']) => void;
  openDetails: () => void;
}

/** Writes what changed back to the store (no undo step: none of it is the design), then carries out the intents. */
export function applyOutcome(
  store: AppStore,
  actions: Actions,
  out: DispatchResult,
  handlers: Partial<IntentHandlers> = {},
) {
  const before = store.getState();
  const patch: Partial<AppState> = {};
  for (const k of KEYS) if (out.state[k] !== before[k]) (patch as Record<string, unknown>)[k] = out.state[k];
  if (Object.keys(patch).length) store.setState(patch);
  for (const i of out.intents) {
    if (i.kind === 'addRun') actions.addRun(i.start, i.vertices, i.end);
    else if (i.kind === 'moveNodes') actions.moveNodes(i.positions);
    else if (i.kind === 'deleteSelection') actions.deleteSelection();
    else if (i.kind === 'openDetails') handlers.openDetails?.();
    else handlers.command?.(i.name);
  }
}

/** Sends one event through the dispatcher and applies the outcome. */
export function sendPlanEvent(
  store: AppStore,
  actions: Actions,
  event: PlanEvent,
  handlers?: Partial<IntentHandlers>,
): DispatchResult {
  const s = store.getState();
  const out = dispatch(planInputOf(s), event, derivedOf(s));
  applyOutcome(store, actions, out, handlers);
  return out;
}
