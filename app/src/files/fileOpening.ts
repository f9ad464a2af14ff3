// Opening a chosen or dropped file and importing a route into the project (files/useFileOpening.ts holds
// what waits for the import dialog): loaded on the first Open or drop, or in the warm-up.
import type { Project } from '@mainbrace/solver';
import type { Actions } from '../state/actions.js';
import type { AppStore } from '../state/store.js';
import { openProjectFile } from './projectFile.js';
import { hasUnsavedWork, loadCommands } from '../chrome/appCommands.js';
import { readAnyFile, runImport, type ImportChoices, type PendingImport } from './routeImport.js';

/** Notes worth showing after an import: warnings first, then at most a few notes. */
function importLines(notes: { level: string; where: string; message: string }[]): string[] {
  const text = (n: { level: string; where: string; message: string }) =>
    `${n.level === 'warning' ? '! ' : ''}${n.where ? `${n.where}: ` : ''}${n.message}`;
  const warnings = notes.filter((n) => n.level !== 'note').map(text);
  const rest = notes.filter((n) => n.level === 'note').map(text);
  return [...warnings, ...rest.slice(0, 6), ...(rest.length > 6 ? [`… and ${rest.length - 6} more notes`] : [])];
}

/**
 * Lets a valid file replace the project: at once, or, where the project has changes not saved to a file,
 * once the user chooses, as New asks (chrome/commandRunner.ts).
 */
function askFirst(name: string, store: AppStore, actions: Actions) {
  return (open: () => void) => {
    if (!hasUnsavedWork(store)) return open();
    actions.notify({
      tone: 'warning',
      title: `Open ${name}? This project has changes not saved to a file.`,
      lines: ['Save it first to keep a file, or discard it (Undo still brings it back in this session).'],
      actions: [
        {
          label: 'Save, then open',
          // the project is saved before the file replaces it, once the commands' code is in hand
          run: () =>
            void loadCommands().then((m) => {
              m.runCommand('save', store, actions, {});
              open();
            }),
        },
        { label: 'Discard and open', run: open },
        { label: 'Keep working', run: () => actions.notify(null) },
      ],
    });
  };
}

/** Opens a project file (asking first where work would be lost), or returns the route a file holds for the import dialog; null otherwise. */
export async function openFile(file: File, store: AppStore, actions: Actions): Promise<PendingImport | null> {
  const r = await readAnyFile(file);
  if (r.kind === 'project') {
    await openProjectFile(file, actions, askFirst(file.name, store, actions));
    return null;
  }
  if (r.kind === 'route') return r.pending;
  actions.notify({
    tone: 'error',
    title: `${file.name} was not imported — your project is unchanged`,
    lines: r.lines,
  });
  return null;
}

/** Imports a route as the dialog chose: it replaces the project, shown whole, or the user is told why not. */
export async function importRoute(p: PendingImport, choices: ImportChoices, store: AppStore, actions: Actions) {
  const current: Project = store.getState().project;
  const r = await runImport(p, choices, current);
  if (r.ok) {
    // A route from elsewhere lies wherever its coordinates put it: replacing the project shows all of it,
    // clear of the legend.
    actions.replaceProject(r.project);
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
}
