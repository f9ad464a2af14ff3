// The window's commands (app/src/chrome/appCommands.ts runs them): loaded first in the warm-up after the
// first screen, or on the first command.
import { importOrReload } from './loadChunk.js';
import { savedDocument } from '../state/savedDocument.js';
import type { AppStore } from '../state/store.js';
import type { Actions } from '../state/actions.js';
import { download, fileStem, projectText } from '../files/saveFile.js';
import type { ActionName } from './actionTable.js';
import { hasUnsavedWork, type CommandUi } from './appCommands.js';
import { lazyModule } from './lazyPart.js';

/** The schedule and quantities files: their writers load when first chosen (or after the first draw). */
const exportTexts = lazyModule(() => import('../files/exportTexts.js'));
/** The blank project (it reads the soil library): loaded when New is first chosen, or after the first draw. */
const blankProjects = lazyModule(() => import('../files/blankProject.js'));

/** New: a blank project from the documented defaults, in the units in use; asks first when work would be lost. */
function startNew(store: AppStore, actions: Actions, ui: Partial<CommandUi>) {
  const go = () =>
    void blankProjects().then(({ blankProject }) => {
      const blank = blankProject(store.getState().units);
      actions.replaceProject(blank);
      actions.markSaved(blank);
      actions.notify(null);
    });
  if (!hasUnsavedWork(store)) return go();
  actions.notify({
    tone: 'warning',
    title: 'Start a new project? This one has changes not saved to a file.',
    lines: ['Save it first to keep a file, or discard it (Undo still brings it back in this session).'],
    actions: [
      {
        label: 'Save, then start new',
        run: () => {
          runCommand('save', store, actions, ui);
          go();
        },
      },
      { label: 'Discard and start new', run: go },
      { label: 'Keep working', run: () => actions.notify(null) },
    ],
  });
}

const NOT_PLACED =
  'A drawn project is not placed on the earth: GeoJSON needs a route imported from a GeoJSON file, or from a CSV survey with its projection (Open…).';

/** The design as GeoJSON for a GIS; the exchange module loads only now (docs/routes.md). */
async function exportGeoJson(store: AppStore, actions: Actions) {
  const ex = await importOrReload(() => import('@mainbrace/solver/exchange'));
  const project = store.getState().project;
  const r = ex.designGeoJson(project);
  if (r.ok) download(`${fileStem(project)}.geojson`, r.text, 'application/geo+json');
  else
    actions.notify({
      tone: 'error',
      title: 'The design was not exported as GeoJSON',
      // the solver's words name the command line's option; a drawn project is told in the app's terms
      lines: [r.reason === 'not-placed' ? NOT_PLACED : r.message],
    });
}

/** Carries out a window command that may wait for code (chrome/appCommands.ts runs undo, redo, Open and Print itself). */
export function runCommand(name: ActionName, store: AppStore, actions: Actions, ui: Partial<CommandUi>) {
  const project = () => store.getState().project;
  /** A file written from the project by one of the export writers, named after the project. */
  const exportAs = (suffix: string, type: string, text: (t: Awaited<ReturnType<typeof exportTexts>>) => string) =>
    void exportTexts().then((t) => download(`${fileStem(project())}-${suffix}`, text(t), type));
  switch (name) {
    case 'new':
      return startNew(store, actions, ui);
    case 'save': {
      const doc = savedDocument(store.getState());
      download(`${fileStem(doc)}.json`, projectText(doc), 'application/json');
      return actions.markSaved(project());
    }
    case 'exportCsv':
      return exportAs('schedule.csv', 'text/csv', (t) => t.scheduleCsvText(project(), store.getState().units));
    case 'exportQuantities':
      return exportAs('quantities.csv', 'text/csv', (t) => t.quantitiesCsvText(project(), store.getState().units));
    case 'exportJson':
      return exportAs('schedule.json', 'application/json', (t) => t.scheduleJsonText(project()));
    case 'exportGeoJson':
      return void exportGeoJson(store, actions);
    default:
      return;
  }
}
