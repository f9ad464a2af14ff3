import { lazyModule } from '../chrome/lazyPart.js';

/** What an edit of the route's shape runs: the document edits and a leg's length (state/routeEditOps.ts). */
export type RouteEdits = typeof import('./routeEditOps.js');

let loaded: RouteEdits | null = null;

/**
 * Loads the route's edits: first in the warm-up after the first screen, since nothing on that screen
 * changes the route's shape before the user acts (docs/performance.md).
 */
export const loadRouteEdits = lazyModule(() => import('./routeEditOps.js').then((m) => (loaded = m)), 'first');

/** The route's edits, or null while they load. */
export const routeEdits = (): RouteEdits | null => loaded;
