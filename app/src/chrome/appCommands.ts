import type { AppStore } from '../state/store.js';
import type { Actions } from '../state/actions.js';
import type { ActionName } from './actionTable.js';
import { lazyModule } from './lazyPart.js';

/** Parts of the window a command needs: the file picker and the print view. */
export interface CommandUi {
  pickFile: () => void;
  print: () => void;
}

const ui: Partial<CommandUi> = {};

/** The top bar and the app register the file picker and the print view here when they mount. */
export function registerCommandUi(part: Partial<CommandUi>) {
  Object.assign(ui, part);
}

/** Whether the design holds work not in a file: anything drawn since it was last saved or opened. */
export function hasUnsavedWork(store: AppStore): boolean {
  const s = store.getState();
  return s.project.nodes.length > 0 && s.project !== s.fileBaseline;
}

type Commands = typeof import('./commandRunner.js');
let loaded: Commands | null = null;

/** The commands' code: first in the warm-up after the first screen (nothing there runs one unasked). */
export const loadCommands = lazyModule(() => import('./commandRunner.js').then((m) => (loaded = m)), 'first');

/** Carries out a window command (the plan's own commands are the dispatcher's). */
export function runCommand(name: ActionName, store: AppStore, actions: Actions) {
  if (name === 'undo') return actions.undo();
  if (name === 'redo') return actions.redo();
  // The file picker opens only within the click or key that asked for it: never after a wait.
  if (name === 'open') return ui.pickFile?.();
  if (name === 'print') return ui.print?.();
  if (loaded) return loaded.runCommand(name, store, actions, ui);
  loadCommands().then(
    (m) => m.runCommand(name, store, actions, ui),
    () =>
      actions.notify({
        tone: 'error',
        title: 'That command was not carried out: its code could not be loaded',
        lines: ['Reload the page (your project is kept) and try again.'],
      }),
  );
}
