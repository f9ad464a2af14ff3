import { savedDocument } from './savedDocument.js';
import type { Project } from '@mainbrace/solver';
import type { AppStore, Notice } from './store.js';
import type { KeyValueStore } from './keyValue.js';
import { readRecord, writeIfAt, writeOver } from './storedProject.js';
import { deleteKeptCopy, keepCopy, updateKeptCopy, type KeptCopy } from './keptCopies.js';
import { projectFromText } from './restore.js';
import type { TabChannel } from './tabChannel.js';
import { storageErrorDetail } from './storageFailure.js';
import { download, fileStem, projectText } from '../files/saveFile.js';
import { refreshKeptCopies, showKeptCopies } from './keptCopiesView.js';
import { clearUnsaved, writeUnsaved, type SyncStorage } from './unsavedEdits.js';

const DELAY_MS = 400;

export interface AutosaveOptions {
  kv: KeyValueStore;
  channel: TabChannel | null;
  /** this tab's id */
  tab: string;
  /** the revision in storage this tab's document came from; -1 when storage could not be read */
  base: number;
  notify: (notice: Notice) => void;
  /** replaces the document with another tab's version (an undoable step like Open) */
  adopt: (project: Project) => void;
  delayMs?: number;
  /** synchronous storage for the document as the page is left (unsavedEdits.ts); null where blocked */
  sync?: SyncStorage | null;
}

const timeOf = (iso: string) => new Date(iso).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });
const showCopies = { label: 'Show kept copies', run: showKeptCopies };

/**
 * Saves the document to browser storage shortly after every edit, and at once when the page is
 * hidden. A save never overwrites a newer copy another tab saved: an idle tab takes the newer copy
 * in; a tab with edits of its own keeps them as a kept copy and asks which version goes on.
 */
export function startAutosave(store: AppStore, o: AutosaveOptions) {
  const { kv, channel, tab } = o;
  const sync = o.sync ?? null;
  let base = o.base;
  let saved: Project | null = savedDocument(store.getState());
  let timer: ReturnType<typeof setTimeout> | null = null;
  let failed = false;
  /** this tab's own version while another tab's newer copy is in storage */
  let conflict: { mine: KeptCopy } | null = null;
  let queue: Promise<unknown> = Promise.resolve();
  const serial = (job: () => Promise<void>) => (queue = queue.then(job).catch(fail));
  const current = () => savedDocument(store.getState());
  const saveToFile = {
    label: 'Save to a file',
    run: () => download(`${fileStem(current())}.json`, projectText(current()), 'application/json'),
  };

  function fail(e: unknown) {
    saved = null; // retry at the next edit or flush
    if (failed) return;
    failed = true;
    const notice = (detail: string): Notice => ({
      tone: 'warning',
      title: 'Autosave failed: your work is only in this tab — save it to a file',
      lines: [detail],
      actions: [saveToFile],
    });
    // At once; then with the browser's reason worded, unless another notice has come meanwhile.
    const first = notice('the browser did not store the project');
    o.notify(first);
    void storageErrorDetail(e).then((detail) => {
      if (store.getState().notice === first) o.notify(notice(detail));
    });
  }

  const conflictNotice = (mine: KeptCopy): Notice => ({
    tone: 'warning',
    title: 'This project was changed in another tab: nothing was overwritten',
    lines: [
      `This tab’s version is in Kept copies (${timeOf(mine.keptAt)}); its further edits go there until you choose.`,
      'Choose which version goes on here; the other stays in Kept copies.',
    ],
    actions: [
      { label: 'Keep this tab’s version', run: () => serial(keepMine) },
      { label: 'Open the other tab’s version', run: () => serial(takeTheirs) },
      saveToFile,
      showCopies,
    ],
  });

  async function save() {
    const project = current();
    if (project === saved) return;
    const text = JSON.stringify(project);
    if (conflict) {
      conflict.mine = await updateKeptCopy(kv, conflict.mine, text);
      saved = project;
      clearUnsaved(sync, tab); // the kept copy holds it
      failed = false;
      void refreshKeptCopies();
      if (store.getState().notice?.title !== conflictNotice(conflict.mine).title)
        o.notify(conflictNotice(conflict.mine));
      return;
    }
    const r = await writeIfAt(kv, base, text, tab);
    failed = false;
    if (r.ok) return accept(r.record.revision, project, true);
    // The same text from both tabs is no conflict.
    if (r.current.text === text) return accept(r.current.revision, project, false);
    const mine = await keepCopy(kv, text, 'this tab’s version, not saved over a newer one from another tab');
    conflict = { mine };
    saved = project;
    clearUnsaved(sync, tab);
    void refreshKeptCopies();
    o.notify(conflictNotice(mine));
  }

  function accept(revision: number, project: Project, tell: boolean) {
    base = revision;
    saved = project;
    if (current() === project) clearUnsaved(sync, tab);
    if (tell) channel?.post({ kind: 'saved', revision, tab });
  }

  async function keepMine() {
    const project = current();
    const text = JSON.stringify(project);
    const theirs = await readRecord(kv);
    if (theirs && theirs.text !== text)
      await keepCopy(kv, theirs.text, 'another tab’s version, replaced by this tab’s');
    const record = await writeOver(kv, text, tab);
    if (conflict) await deleteKeptCopy(kv, conflict.mine.id); // it is the stored project now
    conflict = null;
    accept(record.revision, project, true);
    void refreshKeptCopies();
    o.notify({
      tone: 'info',
      title: 'This tab’s version is saved; the other tab’s version is in Kept copies',
      lines: [],
      actions: [showCopies],
    });
  }

  async function takeTheirs() {
    const theirs = await readRecord(kv);
    const r = theirs ? await projectFromText(theirs.text) : null;
    if (!theirs || !r?.ok) {
      o.notify({
        tone: 'error',
        title: 'The other tab’s version could not be read; this tab’s version goes on',
        lines: r && !r.ok ? r.lines : [],
      });
      return keepMine();
    }
    const text = JSON.stringify(current());
    const mine = conflict
      ? await updateKeptCopy(kv, conflict.mine, text)
      : await keepCopy(kv, text, 'this tab’s version');
    conflict = null;
    clearUnsaved(sync, tab); // this tab's version is in the kept copy
    accept(theirs.revision, r.project, false);
    o.adopt(r.project);
    void refreshKeptCopies();
    o.notify({
      tone: 'info',
      title: `Opened the other tab’s version; this tab’s version is in Kept copies (${timeOf(mine.keptAt)})`,
      lines: [],
      actions: [showCopies],
    });
  }

  /** Another tab saved: an idle tab takes the newer copy in, so its next edit builds on it. */
  async function follow(revision: number) {
    if (conflict || timer || current() !== saved || revision <= base) return;
    const theirs = await readRecord(kv);
    if (!theirs || theirs.revision <= base) return;
    const r = await projectFromText(theirs.text);
    if (!r.ok) return; // the next save finds the newer copy and asks
    if (conflict || timer || current() !== saved) return; // an edit came in while it was checked
    accept(theirs.revision, r.project, false);
    o.adopt(r.project);
    o.notify({ tone: 'info', title: 'Updated with the changes saved in another tab', lines: [] });
  }

  const flush = () => {
    if (timer) clearTimeout(timer);
    timer = null;
    return serial(save);
  };
  const unsubscribe = store.subscribe((s, prev) => {
    const doc = savedDocument(s);
    if (doc === savedDocument(prev) || doc === saved) return;
    if (timer) clearTimeout(timer);
    timer = setTimeout(flush, o.delayMs ?? DELAY_MS);
  });
  const unlisten = channel?.listen((m) => {
    if (m.kind === 'saved' && m.tab !== tab) void serial(() => follow(m.revision));
  });
  /** The save below may not finish before the page goes: the document is written synchronously first. */
  const keepUnsaved = () => {
    const project = current();
    if (project !== saved)
      writeUnsaved(sync, { base, savedAt: new Date().toISOString(), tab, text: JSON.stringify(project) });
  };
  const onHide = () => {
    if (document.visibilityState !== 'hidden') return;
    keepUnsaved();
    void flush();
  };
  const onPageHide = () => {
    keepUnsaved();
    void flush();
  };
  document.addEventListener('visibilitychange', onHide);
  window.addEventListener('pagehide', onPageHide);
  return {
    /** saves now; true when this tab's document is in storage (before a reload) */
    flush: async (): Promise<boolean> => {
      await flush();
      return current() === saved;
    },
    /** saves now even if nothing changed since the last save: the document replaces a set-aside copy */
    claim: async () => {
      saved = null;
      keepUnsaved();
      await flush();
    },
    /** stops saving: pending edits are dropped (the error screen sets the kept project aside first) */
    stop: () => {
      if (timer) clearTimeout(timer);
      timer = null;
      unsubscribe();
      unlisten?.();
      document.removeEventListener('visibilitychange', onHide);
      window.removeEventListener('pagehide', onPageHide);
    },
  };
}

export type Autosave = ReturnType<typeof startAutosave>;
export { restoreProject, type Restored } from './restore.js';
