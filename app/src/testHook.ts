import { analyse, scheduleOf } from '@mainbrace/solver';
import type { AppStore } from './state/store.js';

/** Installs `window.__mainbrace` for the browser tests (dev and test builds only, main.tsx). */
export function installTestHook(store: AppStore) {
  // Read-only hook for the browser tests: the document and its results, never a way to change them.
  Object.defineProperty(window, '__mainbrace', {
    value: Object.freeze({
      project: () => structuredClone(store.getState().project),
      schedule: () => structuredClone(scheduleOf(analyse(store.getState().project))),
      selection: () => ({
        nodes: [...store.getState().selection.nodes],
        pipes: [...store.getState().selection.pipes],
      }),
      viewport: () => ({ ...store.getState().viewport }),
      // cheap reads for the benchmarks, which must not clone a 10,000-node document to count it
      counts: () => {
        const p = store.getState().project;
        return { nodes: p.nodes.length, pipes: p.pipes.length, fittings: analyse(p).fittings.length };
      },
      nodeAt: (i: number) => {
        const n = store.getState().project.nodes[i];
        return n ? { x: n.x, y: n.y } : null;
      },
      canUndo: () => store.temporal.getState().pastStates.length > 0,
    }),
  });
}
