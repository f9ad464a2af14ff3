import { savedDocument } from './savedDocument.js';
import { get, set } from 'idb-keyval';
import type { Project } from '@mainbrace/solver';
import type { AppStore } from './store.js';
import { validated } from './actions.js';

const KEY = 'mainbrace.project.v1';
const DELAY_MS = 400;

const UNREADABLE_KEY = 'mainbrace.project.v1.unreadable';

/** What was kept from the last visit: a valid project, nothing, or a copy that no longer reads. */
export type Restored =
  { kind: 'project'; project: Project } | { kind: 'none' } | { kind: 'unreadable'; lines: string[] };

/**
 * The project kept from the last visit. A kept copy that no longer validates is not thrown away: it is
 * moved to a backup key (so the next autosave cannot overwrite it) and the user is told.
 */
export async function restoreProject(): Promise<Restored> {
  let text: string | undefined;
  try {
    text = await get<string>(KEY);
  } catch {
    return { kind: 'none' };
  }
  if (!text) return { kind: 'none' };
  let lines: string[];
  try {
    const r = validated(JSON.parse(text));
    if (r.ok) return { kind: 'project', project: r.project };
    lines = r.lines;
  } catch (e) {
    lines = [`not valid JSON: ${(e as Error).message}`];
  }
  await set(UNREADABLE_KEY, text).catch(() => undefined);
  return { kind: 'unreadable', lines };
}

/**
 * Saves the document to IndexedDB shortly after every edit, and at once when the page is hidden.
 * A failure is shown to the user (their work is then only in this tab).
 */
export function startAutosave(store: AppStore, onFailure: (message: string) => void): () => void {
  let timer: ReturnType<typeof setTimeout> | null = null;
  let failed = false;
  let saved: Project | null = savedDocument(store.getState());
  const flush = () => {
    if (timer) clearTimeout(timer);
    timer = null;
    const project = savedDocument(store.getState());
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
    if (savedDocument(s) === savedDocument(prev)) return;
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
