/**
 * The document as it stood when the page was left, written synchronously: an IndexedDB save begun
 * as the page unloads is cut off by a reload or a navigation, so the last edits before one would be
 * lost. Each tab writes under its own key and removes it once browser storage holds its document.
 */

/** The few calls of `localStorage` used here (a test passes a Map-backed one). */
export type SyncStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem' | 'key' | 'length'>;

const PREFIX = 'mainbrace.unsaved.v1.';

export interface UnsavedEdit {
  /** the stored revision the document grew from */
  base: number;
  /** ISO date it was written */
  savedAt: string;
  tab: string;
  /** the project file's text */
  text: string;
}

/** Writes this tab's unsaved document; false when the browser refused (full, or storage blocked). */
export function writeUnsaved(storage: SyncStorage | null, edit: UnsavedEdit): boolean {
  if (!storage) return false;
  try {
    storage.setItem(PREFIX + edit.tab, JSON.stringify(edit));
    return true;
  } catch {
    return false;
  }
}

export function clearUnsaved(storage: SyncStorage | null, tab: string): void {
  try {
    storage?.removeItem(PREFIX + tab);
  } catch {
    // nothing to clear when storage is blocked
  }
}

function asEdit(value: string | null): UnsavedEdit | null {
  if (value === null) return null;
  try {
    const e = JSON.parse(value) as Partial<UnsavedEdit>;
    if (
      Number.isInteger(e.base) &&
      typeof e.savedAt === 'string' &&
      typeof e.tab === 'string' &&
      typeof e.text === 'string'
    )
      return e as UnsavedEdit;
  } catch {
    // a damaged entry is no edit: it is dropped like one that was saved
  }
  return null;
}

/** Every tab's unsaved document left in storage, newest first, with the key each is under. */
export function readUnsaved(storage: SyncStorage | null): { key: string; edit: UnsavedEdit | null }[] {
  if (!storage) return [];
  try {
    const keys: string[] = [];
    for (let i = 0; i < storage.length; i++) {
      const k = storage.key(i);
      if (k?.startsWith(PREFIX)) keys.push(k);
    }
    return keys
      .map((key) => ({ key, edit: asEdit(storage.getItem(key)) }))
      .sort((a, b) => (b.edit?.savedAt ?? '').localeCompare(a.edit?.savedAt ?? ''));
  } catch {
    return [];
  }
}

/** Whether any tab left an unsaved document: the code that weighs one loads only then. */
export function hasUnsaved(storage: SyncStorage | null): boolean {
  if (!storage) return false;
  try {
    for (let i = 0; i < storage.length; i++) if (storage.key(i)?.startsWith(PREFIX)) return true;
  } catch {
    // as readUnsaved
  }
  return false;
}

export function removeKey(storage: SyncStorage | null, key: string): void {
  try {
    storage?.removeItem(key);
  } catch {
    // as clearUnsaved
  }
}

/** The page's `localStorage`, or null where the browser blocks it. */
export function pageStorage(): SyncStorage | null {
  try {
    return window.localStorage;
  } catch {
    return null;
  }
}
