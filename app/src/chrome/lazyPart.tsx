import { lazy, Suspense, useState, type ComponentType, type ReactNode } from 'react';
import { importOrReload } from './loadChunk.js';

/** Every lazy part's loader, for the warm-up after the first draw. */
const loaders: (() => Promise<unknown>)[] = [];

/**
 * A part of the app off the first screen (a drawer tab, the details of a selection, the print, a
 * dialog) in a chunk of its own, so that the first screen loads and compiles less JavaScript
 * (docs/performance.md). Rendered while it loads it shows `fallback`; once loaded (see `warmParts`) it renders
 * at once. The first render decides which, so a part never remounts and keeps its state.
 */
export function lazyPart<P extends object>(
  load: () => Promise<ComponentType<P>>,
  fallback: ReactNode = null,
): ComponentType<P> {
  let loaded: ComponentType<P> | null = null;
  const get = () =>
    load().then((c) => {
      loaded = c;
      return c;
    });
  loaders.push(get);
  const Waiting = lazy(() => importOrReload(get).then((c) => ({ default: c })));
  function Part(props: P) {
    const [Loaded] = useState(() => loaded);
    if (Loaded) return <Loaded {...props} />;
    return (
      <Suspense fallback={fallback}>
        <Waiting {...props} />
      </Suspense>
    );
  }
  return Part;
}

/**
 * A module off the first screen that is not drawn (an export's writer, the plan's input tools): loaded
 * on first use or by the warm-up, whichever comes first; `first` puts it at the head of the warm-up.
 */
export function lazyModule<T>(load: () => Promise<T>, order: 'first' | 'in turn' = 'in turn'): () => Promise<T> {
  if (order === 'first') loaders.unshift(load);
  else loaders.push(load);
  return () => importOrReload(load);
}

const idle = () =>
  new Promise<void>((resolve) => {
    if (typeof requestIdleCallback === 'function') requestIdleCallback(() => resolve(), { timeout: 500 });
    else setTimeout(resolve, 0);
  });

/**
 * Loads every lazy part, one at a time when the page is idle, so that the first use of each is as
 * quick as if it had been in the first load. A part that fails to load here is tried again (and its
 * failure handled) when it is used.
 */
export async function warmParts(): Promise<void> {
  for (const load of loaders) {
    await idle();
    await load().catch(() => undefined);
  }
}
