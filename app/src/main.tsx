import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import type { Project } from '@mainbrace/solver';
import { App } from './App.js';
import { createAppStore } from './state/store.js';
import { createActions } from './state/actions.js';
import { StoreProvider } from './state/StoreContext.js';
import { restoreProject, startAutosave, type Restored } from './state/autosave.js';
import { browserStore } from './state/keyValue.js';
import { hasUnsaved, pageStorage, removeKey } from './state/unsavedEdits.js';
import type { WithUnsaved } from './state/unsavedRestore.js';
import { newTabId, openTabChannel } from './state/tabChannel.js';
import { bindKeptCopies, refreshKeptCopies } from './state/keptCopiesView.js';
import { takeStartNotice } from './state/startNotice.js';
import { setSaveBeforeReload } from './chrome/loadChunk.js';
import { lazyRecovery } from './chrome/lazyRecovery.js';
import { installShortcuts } from './chrome/shortcuts.js';
import { ErrorBoundary } from './chrome/ErrorBoundary.js';
import { defaultPipe } from './state/defaultPipe.js';
import { loadChecks, validated } from './state/checks.js';
import { afterFirstDraw } from './chrome/warmUp.js';
import type { Notice } from './state/store.js';
import { warmParts } from './chrome/lazyPart.js';
import { loadScheduleWords } from './state/scheduleViewOf.js';
import './styles.css';

const DEMO_URL = `${import.meta.env.BASE_URL}demo/larkspur-rise.json`;

/** The project to open: the one kept from the last visit, else the demo, else a blank one. */
async function firstProject(kept: Restored, demo: Promise<unknown>): Promise<Project> {
  if (kept.kind === 'project') return kept.project;
  try {
    const r = await validated(await demo);
    if (r.ok) return r.project;
  } catch {
    // offline and not cached: start blank
  }
  // (the blank project reads the soil library, which the first screen otherwise does without)
  return (await import('./files/blankProject.js')).blankProject();
}

async function start() {
  // Read-only hook for the browser tests, in the dev and test builds only, in a file of its own.
  const testHook = import.meta.env.DEV || import.meta.env.MODE === 'test' ? import('./testHook.js') : null;
  // The findings' meanings load beside the kept project and the demo; the first render needs them.
  const scheduleWords = loadScheduleWords();
  const kv = browserStore;
  const channel = openTabChannel();
  bindKeptCopies(kv, channel);
  // The demo is fetched while the kept project is read (index.html preloads it), not after.
  const demo = fetch(DEMO_URL).then((r) => r.json() as Promise<unknown>);
  demo.catch(() => undefined); // a kept project opens without it
  const sync = pageStorage();
  // A document left unsaved by a reload right after an edit opens instead of the copy it grew from.
  const restored = await restoreProject(kv);
  const unsaved: WithUnsaved = hasUnsaved(sync)
    ? await import('./state/unsavedRestore.js').then((m) => m.withUnsaved(kv, sync, restored))
    : { kept: restored, adopted: null, notice: null };
  const kept = unsaved.kept;
  const project = await firstProject(kept, demo);
  await scheduleWords;
  const store = createAppStore(project, defaultPipe(project.units));
  const actions = createActions(store);
  // The demo or a blank project is nobody's unsaved work: New replaces it without asking.
  if (kept.kind !== 'project') actions.markSaved(project);
  // A run being drawn when the page goes (a reload, the tab closed) is kept as drawn so far: its legs
  // become pipes before the autosave writes the document (this listener is added first, so runs first).
  window.addEventListener('pagehide', () => {
    const d = store.getState().draw;
    if (d.phase !== 'drawing' || d.vertices.length === 0) return;
    actions.addRun(d.start, d.vertices, null);
    store.setState({ draw: { phase: 'idle' } });
  });
  const autosave = startAutosave(store, {
    kv,
    channel,
    tab: newTabId(),
    base: kept.kind === 'none' ? 0 : kept.kind === 'storage-failed' ? -1 : kept.revision,
    notify: actions.notify,
    adopt: actions.replaceProject,
    sync,
  });
  setSaveBeforeReload(autosave.flush);
  if (unsaved.adopted) {
    void autosave.claim(); // writes this tab's own unsaved entry at once, then saves it to storage
    removeKey(sync, unsaved.adopted);
  }
  // A damaged or empty record is replaced by what opened (a damaged one is in the kept copies first).
  if ((kept.kind === 'unreadable' && kept.copy) || kept.kind === 'empty') void autosave.claim();
  installShortcuts(store, actions);
  // What went wrong with the kept project, if anything, is worded by code only such a start loads.
  const problem =
    kept.kind === 'project' || kept.kind === 'none'
      ? null
      : await import('./state/keptNotice.js').then(
          (m) => m.keptNotice(kept),
          (): Notice => ({
            tone: 'warning',
            title: 'The project kept from your last visit did not open: the demo opened instead',
            lines: ['Kept copies may hold it; reload the page to see why.'],
          }),
        );
  const notice = problem ?? unsaved.notice ?? takeStartNotice();
  if (notice) actions.notify(notice);
  void refreshKeptCopies(false);
  // The offline worker is installed after the first draw, and its update notice loads with it: on a
  // first visit it fetches and stores every file, which had competed with the first draw for the
  // processor (some 250 ms of its thread's time in a trace of a fresh profile).
  const atStart = 'serviceWorker' in navigator ? navigator.serviceWorker.controller : null;
  afterFirstDraw(() => {
    import('./chrome/newVersion.js')
      .then((m) => {
        m.registerServiceWorker();
        m.watchForNewVersion(actions.notify, autosave.flush, atStart);
      })
      .catch(() => undefined); // offline before the worker held it: the next visit installs it
  });
  if (testHook) void testHook.then((m) => m.installTestHook(store));
  createRoot(document.getElementById('root')!).render(
    <StrictMode>
      <ErrorBoundary store={store} recovery={lazyRecovery(kv, store, actions, autosave)}>
        <StoreProvider store={store} actions={actions}>
          <App />
        </StoreProvider>
      </ErrorBoundary>
    </StrictMode>,
  );
}

void start();
// The schema checks (zod) word refusals and check edits: a valid project opens without them. The
// parts off the first screen follow, one at a time while the page is idle.
afterFirstDraw(() => {
  void loadChecks()
    .catch(() => undefined)
    .then(warmParts);
});
