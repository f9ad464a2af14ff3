import type { KeyValueStore } from './keyValue.js';

/** Where the project of the last visit is kept (the key is unchanged since the first release). */
export const PROJECT_KEY = 'mainbrace.project.v1';

/**
 * The kept project with its revision: every save adds one, so a tab can tell whether the copy in
 * storage is still the one its document grew from or a newer one written by another tab.
 */
export interface StoredRecord {
  revision: number;
  /** ISO date of the save, null for a copy saved before revisions were kept */
  savedAt: string | null;
  /** the tab that saved it */
  tab: string | null;
  /** the project file's text, exactly as saved */
  text: string;
}

/** A stored value as a record: earlier releases kept the bare text (revision 0). */
export function asRecord(value: unknown): StoredRecord | null {
  if (value === undefined || value === null) return null;
  if (typeof value === 'string') return { revision: 0, savedAt: null, tab: null, text: value };
  if (typeof value === 'object' && typeof (value as StoredRecord).text === 'string') {
    const r = value as StoredRecord;
    return {
      revision: Number.isInteger(r.revision) ? r.revision : 0,
      savedAt: typeof r.savedAt === 'string' ? r.savedAt : null,
      tab: typeof r.tab === 'string' ? r.tab : null,
      text: r.text,
    };
  }
  // Anything else is damage; its JSON keeps it readable in a kept copy.
  return { revision: 0, savedAt: null, tab: null, text: safeJson(value) };
}

function safeJson(value: unknown): string {
  try {
    return JSON.stringify(value) ?? String(value);
  } catch {
    return String(value);
  }
}

export async function readRecord(kv: KeyValueStore): Promise<StoredRecord | null> {
  return asRecord(await kv.get(PROJECT_KEY));
}

export type WriteResult = { ok: true; record: StoredRecord } | { ok: false; current: StoredRecord };

/**
 * Saves `text` only if storage still holds revision `base` (or nothing): a newer copy from another
 * tab is never overwritten here. Read and write happen in one transaction.
 */
export async function writeIfAt(kv: KeyValueStore, base: number, text: string, tab: string): Promise<WriteResult> {
  let result: WriteResult | null = null;
  await kv.update(PROJECT_KEY, (old) => {
    const current = asRecord(old);
    if (current && current.revision !== base) {
      result = { ok: false, current };
      return old;
    }
    const record: StoredRecord = { revision: base + 1, savedAt: new Date().toISOString(), tab, text };
    result = { ok: true, record };
    return record;
  });
  return result!;
}

/** Saves over whatever is stored: only after the user chose this tab's version. */
export async function writeOver(kv: KeyValueStore, text: string, tab: string): Promise<StoredRecord> {
  let record: StoredRecord | null = null;
  await kv.update(PROJECT_KEY, (old) => {
    record = { revision: (asRecord(old)?.revision ?? 0) + 1, savedAt: new Date().toISOString(), tab, text };
    return record;
  });
  return record!;
}
