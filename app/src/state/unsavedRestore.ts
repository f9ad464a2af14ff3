import type { KeyValueStore } from './keyValue.js';
import type { Restored } from './restore.js';
import type { Notice } from './store.js';
import { showKeptCopies } from './keptCopiesView.js';
import { readRecord } from './storedProject.js';
import { keepCopyOnce } from './keptCopies.js';
import { checkProjectText } from './projectCheck.js';
import { readUnsaved, removeKey, type SyncStorage } from './unsavedEdits.js';

export interface WithUnsaved {
  kept: Restored;
  /** the key of the unsaved document that opened, removed once this tab has it in hand */
  adopted: string | null;
  /** what the user is told about unsaved documents set aside, if any were */
  notice: Notice | null;
}

/**
 * The project to open, counting the document left unsaved when the page was last left. It opens
 * only if it grew from the very copy in storage and reads as a valid project: a newer copy saved
 * by another tab, or a damaged or partial entry, never gives way to it. One that cannot open is
 * added to the kept copies, so nothing the user made is lost.
 */
export async function withUnsaved(
  kv: KeyValueStore,
  storage: SyncStorage | null,
  kept: Restored,
): Promise<WithUnsaved> {
  const none = { kept, adopted: null, notice: null };
  if (kept.kind === 'storage-failed') return none; // left where it is for a start that can read storage
  const entries = readUnsaved(storage);
  if (entries.length === 0) return none;
  const record = await readRecord(kv).catch(() => null);
  const revision = kept.kind === 'none' ? 0 : kept.revision;
  const canOpen = kept.kind === 'project' || kept.kind === 'none' || kept.kind === 'empty';
  let out: WithUnsaved = none;
  let setAside = 0;
  for (const { key, edit } of entries) {
    if (!edit || (record && edit.text === record.text)) {
      removeKey(storage, key); // saved after all, or nothing readable to keep
      continue;
    }
    if (!out.adopted && canOpen && edit.base === revision) {
      const r = await checkProjectText(edit.text, 'stored');
      if (r.ok) {
        out = { kept: { kind: 'project', project: r.project, revision }, adopted: key, notice: null };
        continue;
      }
    }
    try {
      await keepCopyOnce(kv, edit.text, 'last edits before the page was left, not saved over a newer copy');
      removeKey(storage, key);
      setAside++;
    } catch {
      // stays for the next start
    }
  }
  if (setAside === 0) return out;
  return {
    ...out,
    notice: {
      tone: 'warning',
      title:
        'Edits made just before the page was last left could not go on here (a newer version was saved, or they did not read): they are in Kept copies',
      lines: [],
      actions: [{ label: 'Show kept copies', run: showKeptCopies }],
    },
  };
}
