import type { Project } from '@mainbrace/solver';
import { createAppStore, type AppStore } from '../state/store.js';
import { createActions, type Actions } from '../state/actions.js';
import { toScreen, type ScreenPoint } from '../state/viewport.js';
import type { PipeSpec } from '../state/documentEdits.js';
import type { ActionName } from '../chrome/actionTable.js';
import { installPlanInput, sendPlanEvent, type IntentHandlers } from './planBridge.js';
import { dispatch } from './dispatch.js';
import type { PlanEvent, PointerKind } from './planInput.js';

/** DN200 ductile iron, OD 222 mm (EN 545 table, as the app's catalogue has it), for drawn runs. */
const HARNESS_PIPE: PipeSpec = { outsideDiameter: 0.222, insideDiameter: 0.2, material: 'ductile-iron' };

export interface HarnessOptions {
  width?: number;
  height?: number;
  /** keep the legend's strip out of Fit (the app's default); off makes the view easier to reason about */
  legend?: boolean;
}

type Where = { x: number; y: number } | { px: ScreenPoint };

/**
 * Drives the plan's dispatcher headless, as the browser would: pointer, wheel and key events in screen
 * pixels, through the same store and actions the app uses. Points may be given in plan metres
 * ({x, y}) — turned into pixels through the current view — or in pixels ({px}).
 */
export function planHarness(doc: Project, o: HarnessOptions = {}) {
  // headless and synchronous: the input tools are here from the start (the app loads them on first use)
  installPlanInput(dispatch);
  const store: AppStore = createAppStore(doc, HARNESS_PIPE);
  const actions: Actions = createActions(store);
  store.setState({ legendOpen: o.legend ?? false });
  const commands: ActionName[] = [];
  let detailsOpened = 0;
  const handlers: IntentHandlers = {
    command: (name) => {
      commands.push(name);
      if (name === 'undo') actions.undo();
      if (name === 'redo') actions.redo();
    },
    openDetails: () => detailsOpened++,
  };
  const send = (e: PlanEvent) => sendPlanEvent(store, actions, e, handlers);
  send({ type: 'resize', width: o.width ?? 800, height: o.height ?? 500 });
  const px = (w: Where): ScreenPoint => ('px' in w ? w.px : toScreen(store.getState().viewport, w));
  const mods = { shift: false, alt: false };
  let nextTouch = 100;

  const h = {
    store,
    actions,
    commands,
    detailsOpened: () => detailsOpened,
    send,
    state: () => store.getState(),
    doc: () => store.getState().project,
    selected: () => ({
      nodes: [...store.getState().selection.nodes].sort(),
      pipes: [...store.getState().selection.pipes].sort(),
    }),
    undoSteps: () => store.temporal.getState().pastStates.length,
    px,
    pointerDown: (
      w: Where,
      opt: { button?: number; shift?: boolean; alt?: boolean; pointer?: PointerKind; id?: number } = {},
    ) =>
      send({
        type: 'pointerDown',
        id: opt.id ?? 1,
        pointer: opt.pointer ?? 'mouse',
        button: opt.button ?? 0,
        at: px(w),
        shift: opt.shift ?? mods.shift,
        alt: opt.alt ?? mods.alt,
      }),
    pointerMove: (w: Where, opt: { alt?: boolean; pointer?: PointerKind; id?: number } = {}) =>
      send({
        type: 'pointerMove',
        id: opt.id ?? 1,
        pointer: opt.pointer ?? 'mouse',
        at: px(w),
        alt: opt.alt ?? mods.alt,
      }),
    pointerUp: (w: Where, opt: { pointer?: PointerKind; id?: number } = {}) =>
      send({ type: 'pointerUp', id: opt.id ?? 1, pointer: opt.pointer ?? 'mouse', at: px(w) }),
    /** press and release at one point, as a mouse click */
    click(w: Where, opt: { shift?: boolean; alt?: boolean } = {}) {
      const p = px(w);
      h.pointerMove({ px: p }, opt);
      h.pointerDown({ px: p }, opt);
      h.pointerUp({ px: p });
    },
    /** press, move in steps, release: a mouse drag between two points fixed at the start */
    drag(from: Where, to: Where, opt: { shift?: boolean; button?: number; steps?: number } = {}) {
      const a = px(from);
      const b = px(to);
      h.pointerDown({ px: a }, opt);
      const n = opt.steps ?? 6;
      for (let i = 1; i <= n; i++)
        h.pointerMove({ px: { sx: a.sx + ((b.sx - a.sx) * i) / n, sy: a.sy + ((b.sy - a.sy) * i) / n } });
      h.pointerUp({ px: b });
    },
    doubleClick: (w: Where) => send({ type: 'doubleClick', at: px(w) }),
    wheel: (w: Where, deltaY: number) => send({ type: 'wheel', at: px(w), deltaY }),
    key: (key: string, opt: { shift?: boolean; ctrl?: boolean; alt?: boolean; planFocused?: boolean } = {}) =>
      send({
        type: 'key',
        key,
        shift: opt.shift ?? false,
        ctrl: opt.ctrl ?? false,
        meta: false,
        alt: opt.alt ?? false,
        planFocused: opt.planFocused ?? true,
      }),
    keyUp: (key: string) => send({ type: 'keyUp', key }),
    command: (name: ActionName) => send({ type: 'command', name }),
    /** one finger: down, moved in steps, up (all in pixels fixed at the start) */
    touchDrag(from: Where, to: Where, steps = 6) {
      const id = nextTouch++;
      const a = px(from);
      const b = px(to);
      h.pointerDown({ px: a }, { pointer: 'touch', id });
      for (let i = 1; i <= steps; i++)
        h.pointerMove(
          { px: { sx: a.sx + ((b.sx - a.sx) * i) / steps, sy: a.sy + ((b.sy - a.sy) * i) / steps } },
          { pointer: 'touch', id },
        );
      h.pointerUp({ px: b }, { pointer: 'touch', id });
    },
    tap(w: Where) {
      const id = nextTouch++;
      const p = px(w);
      h.pointerDown({ px: p }, { pointer: 'touch', id });
      h.pointerUp({ px: p }, { pointer: 'touch', id });
    },
    /** two fingers from a1, b1 to a2, b2 (pixels), moved together in steps */
    pinch(a1: ScreenPoint, b1: ScreenPoint, a2: ScreenPoint, b2: ScreenPoint, steps = 5) {
      const ia = nextTouch++;
      const ib = nextTouch++;
      h.pointerDown({ px: a1 }, { pointer: 'touch', id: ia });
      h.pointerDown({ px: b1 }, { pointer: 'touch', id: ib });
      for (let i = 1; i <= steps; i++) {
        const f = i / steps;
        h.pointerMove(
          { px: { sx: a1.sx + (a2.sx - a1.sx) * f, sy: a1.sy + (a2.sy - a1.sy) * f } },
          { pointer: 'touch', id: ia },
        );
        h.pointerMove(
          { px: { sx: b1.sx + (b2.sx - b1.sx) * f, sy: b1.sy + (b2.sy - b1.sy) * f } },
          { pointer: 'touch', id: ib },
        );
      }
      h.pointerUp({ px: a2 }, { pointer: 'touch', id: ia });
      h.pointerUp({ px: b2 }, { pointer: 'touch', id: ib });
    },
  };
  return h;
}

export type PlanHarness = ReturnType<typeof planHarness>;
