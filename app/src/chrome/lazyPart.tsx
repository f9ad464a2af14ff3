import { Component, lazy, Suspense, useState, type ComponentType, type ReactNode } from 'react';
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
): ComponentType<P> & { preload: () => Promise<unknown> } {
  let loaded: ComponentType<P> | null = null;
  const get = () =>
    load().then((c) => {
      loaded = c;
      return c;
    });
  loaders.push(get);
  const Waiting = lazy(() =>
    importOrReload(get).then(
      (c) => ({ default: c }),
      (e: unknown) => {
        throw new PartNotLoaded(e instanceof Error ? e.message : String(e));
      },
    ),
  );
  function Part(props: P) {
    const [Loaded] = useState(() => loaded);
    if (Loaded) return <Loaded {...props} />;
    return (
      <LoadFailure>
        <Suspense fallback={fallback}>
          <Waiting {...props} />
        </Suspense>
      </LoadFailure>
    );
  }
  // what the tests await to render the part at once, as the app does after its warm-up
  return Object.assign(Part, { preload: get });
}

/** The code of a part off the first screen could not be loaded (after `importOrReload` tried). */
class PartNotLoaded extends Error {}

/**
 * A part whose code could not be loaded says so where it would have been, instead of taking the whole
 * screen down with it (the app's error screen is for errors in what did load).
 */
class LoadFailure extends Component<{ children: ReactNode }, { error: unknown }> {
  override state: { error: unknown } = { error: null };

  static getDerivedStateFromError(error: unknown) {
    return { error };
  }

  override render() {
    if (this.state.error === null) return this.props.children;
    // An error of the part itself is the app's error screen's, as if the part had been there all along.
    if (!(this.state.error instanceof PartNotLoaded)) throw this.state.error;
    return (
      <p className="part-failed" role="alert">
        This part of Mainbrace could not be loaded: reload the page (your project is kept).
      </p>
    );
  }
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
