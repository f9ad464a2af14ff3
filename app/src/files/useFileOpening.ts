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

  /** The file is not opened when the code that reads it cannot be loaded: say so, naming it. */
  const unreadable = (name: string) =>
    actions.notify({
      tone: 'error',
      title: `${name} was not opened — your project is unchanged`,
      lines: ['The code that reads files could not be loaded: reload the page (your project is kept) and try again.'],
    });

  const open = async (file: File) => {
    const m = await opening().catch(() => null);
    if (!m) return unreadable(file.name);
    const r = await m.openFile(file, store, actions);
    if (r) setPending(r);
  };

  const confirm = async (choices: ImportChoices) => {
    const p = pending;
    if (!p) return;
    setPending(null);
    const m = await opening().catch(() => null);
    if (!m) return unreadable(p.name);
    await m.importRoute(p, choices, store, actions);
  };

  return { pending, open, confirm, cancel: () => setPending(null) };
}
