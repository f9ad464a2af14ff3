import type { Recovery } from './recoveryActions.js';
import { lazyModule } from './lazyPart.js';

/** The error screen's ways out: loaded in the warm-up after the first screen, or when one is chosen. */
const recoveryActions = lazyModule(() => import('./recoveryActions.js'));

/**
 * The error screen's ways out, whose code is loaded before the first is carried out: the screen itself
 * needs none of it to show, and each way out is already a wait (storage, a file, a reload). A failure to
 * load is the way out's failure, which the screen shows.
 */
export function lazyRecovery(...args: Parameters<typeof import('./recoveryActions.js').createRecovery>): Recovery {
  const get = async () => (await recoveryActions()).createRecovery(...args);
  return {
    downloadKept: async () => (await get()).downloadKept(),
    startWithout: async () => (await get()).startWithout(),
    open: async (file) => (await get()).open(file),
    startNew: async () => (await get()).startNew(),
  };
}
