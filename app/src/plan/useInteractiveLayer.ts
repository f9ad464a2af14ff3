import { useEffect, useSyncExternalStore } from 'react';
import { lazyModule } from '../chrome/lazyPart.js';

type InteractiveLayer = typeof import('./interactiveLayer.js');

let loaded: InteractiveLayer | null = null;
const waiting = new Set<() => void>();
const load = lazyModule(
  () =>
    import('./interactiveLayer.js').then((m) => {
      loaded = m;
      for (const tell of waiting) tell();
      return m;
    }),
  'first',
);
const subscribe = (tell: () => void) => {
  waiting.add(tell);
  return () => waiting.delete(tell);
};

/**
 * The plan's interactive layer (plan/interactiveLayer.ts), or null until its code is here. It is loaded
 * first in the warm-up after the first screen, or at once when `wanted` (something to show: a hover, a
 * drag, a run being drawn, the slider's gesture); the plan draws again when it arrives.
 */
export function useInteractiveLayer(wanted: boolean): InteractiveLayer | null {
  const layer = useSyncExternalStore(subscribe, () => loaded);
  useEffect(() => {
    // a failure is tried again at the next change of what the layer would show
    if (wanted && !loaded) load().catch(() => undefined);
  }, [wanted]);
  return layer;
}
