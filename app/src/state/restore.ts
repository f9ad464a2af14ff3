import type { Project } from '@mainbrace/solver';
import { validated, type Validated } from './checks.js';
import type { KeyValueStore } from './keyValue.js';
import { readRecord, type StoredRecord } from './storedProject.js';
import { keepCopyOnce, type KeptCopy } from './keptCopies.js';
import { storageErrorDetail } from './storageFailure.js';
import { checkProjectText } from './projectCheck.js';

/** What was kept from the last visit, and the revision this tab's document grows from. */
export type Restored =
  | { kind: 'project'; project: Project; revision: number }
  | { kind: 'none' }
  /** a stored record with no text in it: nothing to open, but the user is told */
  | { kind: 'empty'; revision: number }
  /** a copy that no longer reads: set aside as a kept copy (null if even that failed) */
  | { kind: 'unreadable'; lines: string[]; revision: number; copy: KeptCopy | null }
  | { kind: 'storage-failed'; detail: string };

/** A stored project text as a project, or the reasons it is not one. */
export async function projectFromText(text: string): Promise<Validated> {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    return { ok: false, lines: [`not valid JSON: ${(e as Error).message}`] };
  }
  return validated(data);
}

/**
 * The project kept from the last visit. A kept copy that no longer validates is never thrown away:
 * it is added to the dated kept copies (the same text only once) and the user is told.
 */
export async function restoreProject(kv: KeyValueStore): Promise<Restored> {
  let record: StoredRecord | null;
  try {
    record = await readRecord(kv);
  } catch (e) {
    return { kind: 'storage-failed', detail: await storageErrorDetail(e) };
  }
  if (!record) return { kind: 'none' };
  if (record.text.trim() === '') return { kind: 'empty', revision: record.revision };
  const r = await checkProjectText(record.text, 'stored');
  if (r.ok) return { kind: 'project', project: r.project, revision: record.revision };
  const copy = await keepCopyOnce(kv, record.text, 'could not be read when Mainbrace started').catch(() => null);
  return { kind: 'unreadable', lines: r.lines, revision: record.revision, copy };
}
