import { describe, expect, it, vi } from 'vitest';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { chain, DN300 } from '../testFixtures.js';
import { loadPlanInput, queueEvent, sendPlanEvent, type Waiting } from './planBridge.js';
import type { PlanEvent } from './planInput.js';

// No harness here: in this file the input tools are not installed, so the plan's events take the
// app's path — they wait for the tools' chunk, then replay in order (docs/performance.md).
const key = (k: string, ctrl = false): PlanEvent => ({
  type: 'key',
  key: k,
  shift: false,
  ctrl,
  meta: false,
  alt: false,
  planFocused: true,
});

describe('plan events before the input tools have loaded', () => {
  it('size the plan at once, and replay the rest in order once the tools are here', async () => {
    const store = createAppStore(chain([0, 0], [30, 0], [30, 40]), DN300);
    const actions = createActions(store);
    sendPlanEvent(store, actions, { type: 'resize', width: 800, height: 500 });
    // the first draw needs the size and the fitted view, without the tools
    expect(store.getState().canvas).toEqual({ width: 800, height: 500 });
    expect(store.getState().viewport.scale).toBeGreaterThan(0);

    // D (draw), then H (pan), then Mod+S: each waits; the keys the tools use are kept from the page
    expect(sendPlanEvent(store, actions, key('d')).handled).toBe(true);
    expect(sendPlanEvent(store, actions, key('h')).handled).toBe(true);
    expect(sendPlanEvent(store, actions, key('s', true)).handled).toBe(true);
    // a key no action has is left to the page
    expect(sendPlanEvent(store, actions, key('q')).handled).toBe(false);
    expect(store.getState().tool).toBe('select');

    await loadPlanInput();
    // replayed in the order given: draw, then pan
    expect(store.getState().tool).toBe('pan');
    // and from now on at once
    sendPlanEvent(store, actions, key('d'));
    expect(store.getState().tool).toBe('draw');
  });
});

/** A mouse press with `button` at (sx, sy) px. */
const press = (id: number, button: number, sx: number, sy: number): PlanEvent => ({
  type: 'pointerDown',
  id,
  pointer: 'mouse',
  button,
  at: { sx, sy },
  shift: false,
  alt: false,
});

describe('a drag started before the input tools have loaded', () => {
  it('keeps the pointer on the plan, and pans by the whole drag once replayed', async () => {
    // A fresh copy of the bridge: its tools not loaded, whatever the test above did.
    vi.resetModules();
    const bridge = await import('./planBridge.js');
    const { toScreen } = await import('../state/viewport.js');
    const store = createAppStore(chain([0, 0], [30, 0], [30, 40]), DN300);
    const actions = createActions(store);
    const send = (e: PlanEvent) => bridge.sendPlanEvent(store, actions, e);
    send({ type: 'resize', width: 800, height: 500 });
    const node = store.getState().project.nodes[0]!;
    const was = toScreen(store.getState().viewport, node);

    send(key('h'));
    const down = send(press(1, 0, 100, 100));
    // no gesture yet (the press waits), but the release may come over a panel: the plan must take the pointer
    expect(store.getState().gesture.kind).toBe('idle');
    expect(bridge.capturesPress(store, down)).toBe(true);
    send({ type: 'pointerMove', id: 1, pointer: 'mouse', at: { sx: 160, sy: 130 }, alt: false });
    send({ type: 'pointerUp', id: 1, pointer: 'mouse', at: { sx: 160, sy: 130 } });

    await bridge.loadPlanInput();
    // a pan moves every point by the drag: (160 − 100, 130 − 100) px
    const now = toScreen(store.getState().viewport, node);
    expect(now.sx - was.sx).toBeCloseTo(60, 6);
    expect(now.sy - was.sy).toBeCloseTo(30, 6);
    expect(store.getState().gesture.kind).toBe('idle');

    // once loaded, the gesture decides: a pan press takes the pointer, a right-button press with the select tool does not
    const pan = send(press(2, 0, 10, 10));
    expect(bridge.capturesPress(store, pan)).toBe(true);
    send({ type: 'pointerUp', id: 2, pointer: 'mouse', at: { sx: 10, sy: 10 } });
    send(key('v'));
    expect(store.getState().tool).toBe('select');
    const right = send(press(3, 2, 10, 10));
    expect(bridge.capturesPress(store, right)).toBe(false);
  });
});

describe('moves that wait for the input tools', () => {
  const store = createAppStore(chain([0, 0], [30, 0]), DN300);
  const actions = createActions(store);
  const move = (id: number, sx: number): Waiting => ({
    store,
    actions,
    event: { type: 'pointerMove', id, pointer: 'touch', at: { sx, sy: 0 }, alt: false },
  });
  const at = (w: Waiting) => (w.event.type === 'pointerMove' ? `${w.event.id}@${w.event.at.sx}` : w.event.type);

  it('keep only where each pointer got to between other events, in order', () => {
    const queue: Waiting[] = [];
    for (let sx = 0; sx < 1000; sx++) queueEvent(queue, move(1, sx));
    queueEvent(queue, { store, actions, event: press(1, 0, 999, 0) });
    queueEvent(queue, move(1, 5));
    queueEvent(queue, move(1, 6));
    // two fingers: their moves interleave, and each stays
    queueEvent(queue, move(2, 7));
    queueEvent(queue, move(1, 8));
    expect(queue.map(at)).toEqual(['1@999', 'pointerDown', '1@6', '2@7', '1@8']);
  });
});
