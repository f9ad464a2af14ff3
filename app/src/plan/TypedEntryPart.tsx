import { useApp } from '../state/StoreContext.js';
import { lazyPart } from '../chrome/lazyPart.js';

// The typed-entry box shows only with the draw tool, which the input tools (loaded on first use) turn
// on: it and its entry parser load with them, not in the first screen (docs/performance.md).
const Box = lazyPart(() => import('./TypedEntryBox.js').then((m) => m.TypedEntryBox));

/** The typed-entry box while the draw tool is on (plan/TypedEntryBox.tsx); nothing otherwise. */
export function TypedEntryBox() {
  const tool = useApp((s) => s.tool);
  return tool === 'draw' ? <Box /> : null;
}
