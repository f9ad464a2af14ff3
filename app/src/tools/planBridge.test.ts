import { describe, expect, it } from 'vitest';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { chain, DN300 } from '../testFixtures.js';
import { loadPlanInput, sendPlanEvent } from './planBridge.js';
import type { PlanEvent } from './planInput.js';

// No harness here: in this file the input tools are not installed, so the plan's events take the
// app's path — they wait for the tools' chunk, then replay in order (issue 16).
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
