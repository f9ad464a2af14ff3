import { analyse } from '@mainbrace/solver';
import type { AppState, AppStore } from '../state/store.js';
import type { Actions } from '../state/actions.js';
import type { dispatch as Dispatch, DispatchResult } from './dispatch.js';
import type { PlanDerived, PlanEvent, PlanInput, PlanIntent } from './planInput.js';
import { resized } from './planView.js';
import { actionForKey } from '../chrome/actionTable.js';
import { lazyModule } from '../chrome/lazyPart.js';

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
  fittingOrder: () => analyse(s.project).fittings.map((f) => f.node.id),
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

// The input tools (the dispatcher and the tools it runs: select, draw, pan, typed entry) are not needed
// to draw the first screen, so they load on the first pointer or key event, or in the warm-up after the
// first draw, whichever comes first (docs/performance.md: about 5 kB gzipped off the first load). Events that come
// while they load wait in order and are replayed through them, so nothing the user did is lost.
let dispatchNow: typeof Dispatch | null = null;
export type Waiting = { store: AppStore; actions: Actions; event: PlanEvent; handlers?: Partial<IntentHandlers> };
const waiting: Waiting[] = [];

function run(w: Waiting, dispatch: typeof Dispatch): DispatchResult {
  const s = w.store.getState();
  const out = dispatch(planInputOf(s), w.event, derivedOf(s));
  applyOutcome(w.store, w.actions, out, w.handlers);
  return out;
}

/** Loads the input tools (once) and replays what waited for them. */
export const loadPlanInput = lazyModule(
  () =>
    import('./dispatch.js').then((m) => {
      dispatchNow = m.dispatch;
      for (const w of waiting.splice(0)) run(w, m.dispatch);
    }),
  'first',
);

/**
 * Adds an event to those waiting for the input tools. A pointer's move replaces its move just before it:
 * only where the pointer got to matters (a pan takes the whole drag, a hover the last place), and a
 * chunk slow to load, or failing and tried again, must not make every move of the meantime wait.
 */
export function queueEvent(queue: Waiting[], w: Waiting): void {
  const last = queue[queue.length - 1];
  if (w.event.type === 'pointerMove' && last?.event.type === 'pointerMove' && last.event.id === w.event.id)
    queue[queue.length - 1] = w;
  else queue.push(w);
}

/** What an event that waits for the input tools is taken to have done, until it is replayed. */
function waited(s: PlanInput, event: PlanEvent): DispatchResult {
  // A key the tools will use must not also act on the page (Save must not open the browser's dialog).
  if (event.type !== 'key') return { state: s, intents: [], handled: true };
  const action = actionForKey(event);
  const handled =
    (event.key === ' ' && !event.ctrl && !event.meta) ||
    (action !== undefined && (action.scope !== 'plan' || event.planFocused));
  return { state: s, intents: [], handled };
}

/** Sends one event through the dispatcher and applies the outcome. */
export function sendPlanEvent(
  store: AppStore,
  actions: Actions,
  event: PlanEvent,
  handlers?: Partial<IntentHandlers>,
): DispatchResult {
  if (dispatchNow) return run({ store, actions, event, handlers }, dispatchNow);
  const s = store.getState();
  // The plan's size is what its first draw needs: taken at once (after anything still waiting).
  if (event.type === 'resize' && waiting.length === 0) {
    const state = resized(planInputOf(s), event.width, event.height);
    applyOutcome(store, actions, { state, intents: [], handled: true });
    return { state, intents: [], handled: true };
  }
  queueEvent(waiting, { store, actions, event, handlers });
  void loadPlanInput().catch(() => undefined); // a failure is tried again at the next event
  return waited(planInputOf(s), event);
}

/**
 * Whether the plan takes the pointer just pressed (pointer capture), so that its moves and release reach
 * the plan even off it: when the press began a gesture, and when the press waits for the input tools,
 * since it may begin one when it is replayed (a drag started before they load would otherwise lose its
 * release over a panel and leave the gesture open). Capture ends by itself when the pointer is released.
 */
export function capturesPress(store: AppStore, out: DispatchResult): boolean {
  return out.handled && (dispatchNow === null || store.getState().gesture.kind !== 'idle');
}

/** Makes the input tools present at once (tests that drive the plan synchronously). */
export function installPlanInput(dispatch: typeof Dispatch) {
  dispatchNow = dispatch;
}
