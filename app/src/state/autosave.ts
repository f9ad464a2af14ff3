import { get, set } from 'idb-keyval';
import type { Project } from '@mainbrace/solver';
import type { AppStore } from './store.js';
import { validated } from './actions.js';

const KEY = 'mainbrace.project.v1';
const DELAY_MS = 400;

/** The project kept from the last visit, if any and if it is still a valid project. */
export async function restoreProject(): Promise<Project | null> {
  try {
    const text = await get<string>(KEY);
    if (!text) return null;
    const r = validated(JSON.parse(text));
    return r.ok ? r.project : null;
  } catch {
    return null;
  }
}

/**
 * Saves the document to IndexedDB shortly after every edit, and at once when the page is hidden.
 * A failure is shown to the user (their work is then only in this tab).
 */
export function startAutosave(store: AppStore, onFailure: (message: string) => void): () => void {
  let timer: ReturnType<typeof setTimeout> | null = null;
  let failed = false;
  let saved: Project | null = store.getState().project;
  const flush = () => {
    if (timer) clearTimeout(timer);
    timer = null;
    const project = store.getState().project;
    if (project === saved) return;
    saved = project;
    set(KEY, JSON.stringify(project)).then(
      () => {
        failed = false;
      },
      (e: unknown) => {
        if (!failed) onFailure(e instanceof Error ? e.message : String(e));
        failed = true;
        saved = null;
      },
    );
  };
  const unsubscribe = store.subscribe((s, prev) => {
    if (s.project === prev.project) return;
    if (timer) clearTimeout(timer);
    timer = setTimeout(flush, DELAY_MS);
  });
  const onHide = () => {
    if (document.visibilityState === 'hidden') flush();
  };
  document.addEventListener('visibilitychange', onHide);
  window.addEventListener('pagehide', flush);
  return () => {
    unsubscribe();
    document.removeEventListener('visibilitychange', onHide);
    window.removeEventListener('pagehide', flush);
  };
}

/** Saves at once (the first save after a restore or a new project). */
export async function saveNow(project: Project): Promise<void> {
  await set(KEY, JSON.stringify(project));
}
