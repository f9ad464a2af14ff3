import { createStore } from 'zustand/vanilla';
import { browserStore, type KeyValueStore } from './keyValue.js';
import { deleteKeptCopy, listKeptCopies, readKeptCopy } from './keptCopies.js';
import type { TabChannel } from './tabChannel.js';

/** A kept copy as the list shows it: the text itself stays in storage until it is downloaded. */
export interface KeptCopySummary {
  id: string;
  keptAt: string;
  reason: string;
  name: string | null;
  /** characters of the project text */
  size: number;
}

/** The list of kept copies and whether its dialog is open: chrome state, apart from the document. */
export const keptCopiesView = createStore<{ copies: KeptCopySummary[]; open: boolean; error: string | null }>()(() => ({
  copies: [],
  open: false,
  error: null,
}));

let storage: KeyValueStore = browserStore;
let channel: TabChannel | null = null;

/** Where kept copies are read from, and the channel that tells other tabs of a change. */
export function bindKeptCopies(kv: KeyValueStore, tabs: TabChannel | null) {
  storage = kv;
  channel = tabs;
  tabs?.listen((m) => {
    if (m.kind === 'kept') void refreshKeptCopies(false);
  });
}

/** Reads the list again; `tell` also tells the other tabs that it changed. */
export async function refreshKeptCopies(tell = true): Promise<void> {
  try {
    const copies = await listKeptCopies(storage);
    keptCopiesView.setState({
      copies: copies.map(({ text, ...c }) => ({ ...c, size: text.length })),
      error: null,
    });
  } catch (e) {
    keptCopiesView.setState({
      error: e instanceof Error && e.message ? e.message : 'the browser’s storage could not be read',
    });
  }
  if (tell) channel?.post({ kind: 'kept' });
}

export const showKeptCopies = () => {
  keptCopiesView.setState({ open: true });
  void refreshKeptCopies(false);
};
export const hideKeptCopies = () => keptCopiesView.setState({ open: false });

export const keptCopyText = async (id: string): Promise<string | null> =>
  (await readKeptCopy(storage, id))?.text ?? null;

export async function removeKeptCopy(id: string): Promise<void> {
  await deleteKeptCopy(storage, id);
  await refreshKeptCopies();
}
