import { leaveNoticeForNextStart } from '../state/startNotice.js';

const RELOADED_AT = 'mainbrace.reloadedForUpdate';
/** A second failure this soon after reloading is not a stale tab: show it instead of reloading again. */
const RELOAD_GUARD_MS = 60_000;

let saveBeforeReload: () => Promise<boolean> = async () => false;

/** How to keep the project before reloading: the autosave's flush, once it runs. */
export function setSaveBeforeReload(save: () => Promise<boolean>) {
  saveBeforeReload = save;
}

/** When this tab last reloaded for a new version (0: never), or null without session storage. */
function lastReload(): number | null {
  try {
    return Number(sessionStorage.getItem(RELOADED_AT) ?? 0);
  } catch {
    return null;
  }
}

/**
 * Loads a lazy part of the app. If its file is gone (a newer version replaced this tab's files while
 * it was open), the project is saved and the tab reloads into the new version, saying so; it only
 * fails if the project could not be saved or a reload a moment ago did not help.
 */
export function importOrReload<T>(load: () => Promise<T>): Promise<T> {
  return load().catch(async (e: unknown) => {
    const last = lastReload();
    if (last === null || Date.now() - last < RELOAD_GUARD_MS || !(await saveBeforeReload())) throw e;
    sessionStorage.setItem(RELOADED_AT, String(Date.now()));
    leaveNoticeForNextStart({
      tone: 'info',
      title: 'Mainbrace was updated while this tab was open: it reloaded into the new version with your project',
      lines: [],
    });
    window.location.reload();
    return new Promise<T>(() => undefined); // the page is going away
  });
}
