import { useState } from 'react';
import type { Project } from '@mainbrace/solver';
import { useActions, useAppStore } from '../state/StoreContext.js';
import { fitView } from '../state/viewport.js';
import type { ImportChoices, PendingImport } from './routeImport.js';
import { lazyModule } from '../chrome/lazyPart.js';

/** Reading a file of any kind and importing a route: loaded on the first Open or drop (or after the first draw). */
const routes = lazyModule(() => import('./routeImport.js'));
/** Reading and checking a project file: loaded likewise. */
const projectFiles = lazyModule(() => import('./projectFile.js'));

/** Notes worth showing after an import: warnings first, then at most a few notes. */
function importLines(notes: { level: string; where: string; message: string }[]): string[] {
  const text = (n: { level: string; where: string; message: string }) =>
    `${n.level === 'warning' ? '! ' : ''}${n.where ? `${n.where}: ` : ''}${n.message}`;
  const warnings = notes.filter((n) => n.level !== 'note').map(text);
  const rest = notes.filter((n) => n.level === 'note').map(text);
  return [...warnings, ...rest.slice(0, 6), ...(rest.length > 6 ? [`… and ${rest.length - 6} more notes`] : [])];
}

/**
 * Opening a file from the Open button or a drop: a project file opens at once; a route (CSV survey,
 * GeoJSON) waits for the import dialog. A bad file never replaces the project.
 */
export function useFileOpening() {
  const actions = useActions();
  const store = useAppStore();
  const [pending, setPending] = useState<PendingImport | null>(null);

  const open = async (file: File) => {
    const r = await (await routes()).readAnyFile(file);
    if (r.kind === 'project') return (await projectFiles()).openProjectFile(file, actions);
    if (r.kind === 'route') return setPending(r.pending);
    actions.notify({
      tone: 'error',
      title: `${file.name} was not imported — your project is unchanged`,
      lines: r.lines,
    });
  };

  const confirm = async (choices: ImportChoices) => {
    const p = pending;
    if (!p) return;
    setPending(null);
    const current: Project = store.getState().project;
    const r = await (await routes()).runImport(p, choices, current);
    if (r.ok) {
      actions.replaceProject(r.project);
      // A route from elsewhere lies wherever its coordinates put it: show all of it.
      const el = document.querySelector('[data-testid="plan"]');
      actions.setViewport(fitView(r.project.nodes, el?.clientWidth ?? 800, el?.clientHeight ?? 500));
      actions.notify({
        tone: 'info',
        title: `Imported ${p.name}: ${r.project.nodes.length} nodes, ${r.project.pipes.length} pipes`,
        lines: importLines(r.notes),
      });
    } else
      actions.notify({
        tone: 'error',
        title: `${p.name} was not imported — your project is unchanged`,
        lines: importLines(r.notes.filter((n) => n.level === 'error')),
      });
  };

  return { pending, open, confirm, cancel: () => setPending(null) };
}
