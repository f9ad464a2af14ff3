import { createContext, useContext, type ReactNode } from 'react';
import { useStore } from 'zustand';
import { analyse, type Analysis } from '@mainbrace/solver';
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

/** Results of the current document: `analyse` is memoised by document identity, so this is one lookup per render. */
export function useAnalysis(): Analysis {
  return analyse(useApp((s) => s.project));
}
