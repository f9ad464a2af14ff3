import { useState } from 'react';
import { useActions, useAppStore } from '../state/StoreContext.js';
import type { ImportChoices, PendingImport } from './routeImport.js';
import { lazyModule } from '../chrome/lazyPart.js';

/** Opening and importing files (files/fileOpening.ts): loaded on the first Open or drop, or after the first draw. */
const opening = lazyModule(() => import('./fileOpening.js'));

/**
 * Opening a file from the Open button or a drop: a project file opens at once; a route (CSV survey,
 * GeoJSON) waits for the import dialog. A bad file never replaces the project.
 */
export function useFileOpening() {
  const actions = useActions();
  const store = useAppStore();
  const [pending, setPending] = useState<PendingImport | null>(null);

  const open = async (file: File) => {
    const r = await (await opening()).openFile(file, actions);
    if (r) setPending(r);
  };

  const confirm = async (choices: ImportChoices) => {
    const p = pending;
    if (!p) return;
    setPending(null);
    await (await opening()).importRoute(p, choices, store, actions);
  };

  return { pending, open, confirm, cancel: () => setPending(null) };
}
