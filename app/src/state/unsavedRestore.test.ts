import { describe, it, expect, afterEach } from 'vitest';
import type { Project } from '@mainbrace/solver';
import { createAppStore } from './store.js';
import { createActions } from './actions.js';
import { memoryStore, type KeyValueStore } from './keyValue.js';
import { restoreProject, startAutosave, type Autosave } from './autosave.js';
import { PROJECT_KEY, readRecord } from './storedProject.js';
import { listKeptCopies } from './keptCopies.js';
import { readUnsaved, removeKey, writeUnsaved, type SyncStorage } from './unsavedEdits.js';
import { withUnsaved } from './unsavedRestore.js';
import { DN300, project } from '../testFixtures.js';

const route = () =>
  project(
    [
      { id: 'n1', x: 0, y: 0 },
      { id: 'n2', x: 30, y: 0 },
    ],
    [{ from: 'n1', to: 'n2' }],
    [{ id: 'working', pressure: 620_000 }],
  );

/** localStorage as a Map: synchronous, as the browser's is. */
function mapStorage(): SyncStorage & { data: Map<string, string> } {
  const data = new Map<string, string>();
  return {
    data,
    getItem: (k) => data.get(k) ?? null,
    setItem: (k, v) => void data.set(k, String(v)),
    removeItem: (k) => void data.delete(k),
    key: (i) => [...data.keys()][i] ?? null,
    get length() {
      return data.size;
    },
  };
}

/** Browser storage whose writes never finish: a save begun as the page unloads is cut off. */
function cutOff(kv: KeyValueStore): KeyValueStore {
  return { ...kv, update: () => new Promise<void>(() => undefined) };
}

const running: Autosave[] = [];
afterEach(() => running.splice(0).forEach((a) => a.stop()));

/** A page as main.tsx starts one: the stored project, then any document left unsaved. */
async function openPage(kv: KeyValueStore, sync: SyncStorage, tab: string, saveKv: KeyValueStore = kv) {
  const r = await withUnsaved(kv, sync, await restoreProject(kv));
  if (r.kept.kind !== 'project') throw new Error(`found ${r.kept.kind}`);
  const store = createAppStore(r.kept.project, DN300);
  const actions = createActions(store);
  const autosave = startAutosave(store, {
    kv: saveKv,
    channel: null,
    tab,
    base: r.kept.revision,
    notify: actions.notify,
    adopt: actions.replaceProject,
    delayMs: 400,
    sync,
  });
  running.push(autosave);
  if (r.adopted) {
    void autosave.claim();
    removeKey(sync, r.adopted);
  }
  return { store, actions, autosave, r };
}

const pressureOf = (p: Project) => p.loadCases[0]!.pressure;
const settle = () => new Promise((r) => setTimeout(r, 40));

describe('the last edit before a reload', () => {
  it('opens again after a reload made at once, when the save to browser storage was cut off', async () => {
    const kv = memoryStore({
      [PROJECT_KEY]: { revision: 4, savedAt: null, tab: 'old', text: JSON.stringify(route()) },
    });
    const sync = mapStorage();
    const a = await openPage(kv, sync, 'a', cutOff(kv));
    a.actions.updateCase('working', { pressure: 1_100_000 });
    window.dispatchEvent(new Event('pagehide')); // the reload, well inside the autosave's 400 ms
    a.autosave.stop();
    // Storage still holds revision 4 with the old pressure…
    expect(pressureOf(JSON.parse((await readRecord(kv))!.text))).toBe(620_000);
    // …yet the page that opens next has the edit, and saves it as revision 5.
    const b = await openPage(kv, sync, 'b');
    expect(pressureOf(b.store.getState().project)).toBe(1_100_000);
    await b.autosave.flush();
    const record = await readRecord(kv);
    expect([record!.revision, pressureOf(JSON.parse(record!.text))]).toEqual([5, 1_100_000]);
    // Once storage holds it, no unsaved entry is left to open a third time.
    expect(readUnsaved(sync)).toEqual([]);
  });

  it('leaves no entry once the save finished', async () => {
    const kv = memoryStore({ [PROJECT_KEY]: JSON.stringify(route()) });
    const sync = mapStorage();
    const a = await openPage(kv, sync, 'a');
    a.actions.updateCase('working', { pressure: 900_000 });
    window.dispatchEvent(new Event('pagehide'));
    expect(readUnsaved(sync)).toHaveLength(1);
    await a.autosave.flush();
    await settle();
    expect(readUnsaved(sync)).toEqual([]);
  });

  it('never lets a partial or invalid entry replace the stored project, and keeps a readable one aside', async () => {
    const good = JSON.stringify(route());
    const kv = memoryStore({ [PROJECT_KEY]: { revision: 2, savedAt: null, tab: 'old', text: good } });
    const sync = mapStorage();
    sync.setItem('mainbrace.unsaved.v1.cut', '{"base":2,"savedAt":"2026-01-01T00:00:00Z","tab":"cut","text":"{\\"na');
    const invalid = JSON.stringify({ ...route(), nodes: 'none' });
    writeUnsaved(sync, { base: 2, savedAt: '2026-01-01T00:00:01Z', tab: 'bad', text: invalid });
    const b = await openPage(kv, sync, 'b');
    expect(b.store.getState().project).toEqual(route());
    expect(b.r.adopted).toBeNull();
    expect((await listKeptCopies(kv)).map((c) => c.text)).toEqual([invalid]);
    expect(b.r.notice?.title).toMatch(/they are in Kept copies/);
    expect(readUnsaved(sync)).toEqual([]);
    expect((await readRecord(kv))!.text).toBe(good);
  });

  it('never replaces a newer copy another tab saved since: the entry goes to the kept copies', async () => {
    const theirs = { ...route(), name: 'Saved later in another tab' };
    const kv = memoryStore({
      [PROJECT_KEY]: { revision: 7, savedAt: null, tab: 'other', text: JSON.stringify(theirs) },
    });
    const sync = mapStorage();
    const mine = JSON.stringify({ ...route(), name: 'Left unsaved at revision 6' });
    writeUnsaved(sync, { base: 6, savedAt: '2026-01-01T00:00:00Z', tab: 'a', text: mine });
    const b = await openPage(kv, sync, 'b');
    expect(b.store.getState().project.name).toBe('Saved later in another tab');
    expect((await listKeptCopies(kv)).map((c) => c.text)).toEqual([mine]);
  });
});
