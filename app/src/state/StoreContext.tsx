import { createContext, useContext, type ReactNode } from 'react';
import { useStore } from 'zustand';
import type { Analysis } from '@mainbrace/solver';
import { resultsOf } from './results.js';
import type { AppState, AppStore } from './store.js';
import type { Actions } from './actions.js';

const StoreCtx = createContext<{ store: AppStore; actions: Actions } | null>(null);

export function StoreProvider({
  store,
  actions,
  children,
}: {
  store: AppStore;
  actions: Actions;
  children: ReactNode;
}) {
  return <StoreCtx.Provider value={{ store, actions }}>{children}</StoreCtx.Provider>;
}

function useCtx() {
  const c = useContext(StoreCtx);
  if (!c) throw new Error('StoreProvider missing');
  return c;
}

/** A slice of the app state; the selector must return a stable value (zustand v5). */
export const useApp = <T,>(selector: (s: AppState) => T): T => useStore(useCtx().store, selector);

export const useActions = (): Actions => useCtx().actions;

export const useAppStore = (): AppStore => useCtx().store;

/**
 * Results of the current document, from its result inputs only (`resultsOf`): one lookup per render,
 * and the same object after an edit that cannot change a result (the name, the units, the sheet).
 */
export function useAnalysis(): Analysis {
  return useApp((s) => resultsOf(s.project));
}
