import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { analyse, findSize, scheduleOf, type Project } from '@mainbrace/solver';
import { App } from './App.js';
import { createAppStore } from './state/store.js';
import { createActions, validated } from './state/actions.js';
import { StoreProvider } from './state/StoreContext.js';
import { restoreProject, startAutosave, type Restored } from './state/autosave.js';
import { installShortcuts } from './chrome/shortcuts.js';
import { ErrorBoundary } from './chrome/ErrorBoundary.js';
import { blankProject } from './files/blankProject.js';
import type { PipeSpec } from './state/documentEdits.js';
import './styles.css';

const DEMO_URL = `${import.meta.env.BASE_URL}demo/larkspur-rise.json`;

/** The project to open: the one kept from the last visit, else the demo, else a blank one. */
async function firstProject(kept: Restored): Promise<Project> {
  if (kept.kind === 'project') return kept.project;
  try {
    const r = validated(await (await fetch(DEMO_URL)).json());
    if (r.ok) return r.project;
  } catch {
    // offline and not cached: start blank
  }
  return blankProject();
}

/** The pipe new runs are drawn with: DN 200 ductile iron in SI, 8-in class 350 in US units. */
function defaultPipe(project: Project): PipeSpec {
  const [series, nominal] = project.units === 'us' ? ['di-awwa-pc350', '8'] : ['di-en545', 'DN200'];
  const size = findSize(series, nominal)!;
  return {
    outsideDiameter: size.outsideDiameter,
    insideDiameter: size.insideDiameter,
    material: 'ductile-iron',
    series,
    nominal,
  };
}

async function start() {
  const kept = await restoreProject();
  const project = await firstProject(kept);
  const store = createAppStore(project, defaultPipe(project));
  const actions = createActions(store);
  startAutosave(store, (message) =>
    actions.notify({
      tone: 'warning',
      title: 'Autosave failed: your work is only in this tab — save it to a file',
      lines: [message],
    }),
  );
  installShortcuts(store, actions);
  if (kept.kind === 'unreadable') {
    actions.notify({
      tone: 'warning',
      title:
        'The project kept from your last visit could not be read; a copy is kept in this browser under "mainbrace.project.v1.unreadable" and the demo opened instead',
      lines: kept.lines,
    });
  }
  if (import.meta.env.DEV || import.meta.env.MODE === 'test') {
    // Read-only hook for the browser tests: the document and its results, never a way to change them.
    Object.defineProperty(window, '__mainbrace', {
      value: Object.freeze({
        project: () => structuredClone(store.getState().project),
        schedule: () => structuredClone(scheduleOf(analyse(store.getState().project))),
        selection: () => ({
          nodes: [...store.getState().selection.nodes],
          pipes: [...store.getState().selection.pipes],
        }),
        viewport: () => ({ ...store.getState().viewport }),
        canUndo: () => store.temporal.getState().pastStates.length > 0,
      }),
    });
  }
  createRoot(document.getElementById('root')!).render(
    <StrictMode>
      <ErrorBoundary store={store}>
        <StoreProvider store={store} actions={actions}>
          <App />
        </StoreProvider>
      </ErrorBoundary>
    </StrictMode>,
  );
}

void start();

// Installed and offline: the service worker is built with the app (not in the dev server).
if (import.meta.env.PROD && 'serviceWorker' in navigator) {
  window.addEventListener('load', () => {
    void navigator.serviceWorker.register('./sw.js').catch(() => undefined);
  });
}
