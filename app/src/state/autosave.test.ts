import { describe, it, expect, afterEach, vi } from 'vitest';
import type { Project } from '@mainbrace/solver';
import { createAppStore } from './store.js';
import { createActions } from './actions.js';
import { memoryStore, type KeyValueStore } from './keyValue.js';
import { restoreProject, startAutosave, type Autosave } from './autosave.js';
import { PROJECT_KEY, readRecord } from './storedProject.js';
import { listKeptCopies } from './keptCopies.js';
import type { TabChannel, TabMessage } from './tabChannel.js';
import { DN300, project } from '../testFixtures.js';

const route = () =>
  project(
    [
      { id: 'n1', x: 0, y: 0 },
      { id: 'n2', x: 30, y: 0 },
      { id: 'n3', x: 30, y: 30 },
    ],
    [
      { from: 'n1', to: 'n2' },
      { from: 'n2', to: 'n3' },
    ],
    [{ id: 'working', pressure: 620_000 }],
  );

/** BroadcastChannels between tabs of one process: a message reaches every other tab, later. */
function linkedChannels(n: number): TabChannel[] {
  const handlers: ((m: TabMessage) => void)[][] = Array.from({ length: n }, () => []);
  return handlers.map((_, i) => ({
    post: (m) => handlers.forEach((hs, j) => j !== i && hs.forEach((h) => setTimeout(() => h(structuredClone(m))))),
    listen: (h) => {
      handlers[i]!.push(h);
      return () => handlers[i]!.splice(handlers[i]!.indexOf(h), 1);
    },
  }));
}

const running: Autosave[] = [];
afterEach(() => running.splice(0).forEach((a) => a.stop()));

/** A tab as main.tsx starts one: restore from storage, then autosave into it. */
async function openTab(kv: KeyValueStore, channel: TabChannel | null, tab: string) {
  const kept = await restoreProject(kv);
  if (kept.kind !== 'project') throw new Error(`tab ${tab} found ${kept.kind}`);
  const store = createAppStore(kept.project, DN300);
  const actions = createActions(store);
  const autosave = startAutosave(store, {
    kv,
    channel,
    tab,
    base: kept.revision,
    notify: actions.notify,
    adopt: actions.replaceProject,
    delayMs: 5,
  });
  running.push(autosave);
  return { store, actions, autosave, project: () => store.getState().project };
}

const settle = () => new Promise((r) => setTimeout(r, 40));
const stored = async (kv: KeyValueStore): Promise<Project> => JSON.parse((await readRecord(kv))!.text);
const pressureOf = (p: Project) => p.loadCases[0]!.pressure;

describe('two tabs on one kept project', () => {
  it('never lets a tab overwrite a newer copy another tab saved (no channel between them)', async () => {
    const kv = memoryStore({ [PROJECT_KEY]: JSON.stringify(route()) });
    const a = await openTab(kv, null, 'a');
    const b = await openTab(kv, null, 'b');
    a.actions.updateCase('working', { pressure: 1_500_000 });
    await settle();
    b.actions.renameProject('Fenwick Row main');
    await settle();
    // B's rename did not replace A's pressure in storage…
    expect(pressureOf(await stored(kv))).toBe(1_500_000);
    expect((await stored(kv)).name).toBe('Test main, Lowmoor Lane');
    // …B's version is kept, dated, and B is asked which version goes on.
    const copies = await listKeptCopies(kv);
    expect(copies).toHaveLength(1);
    expect(JSON.parse(copies[0]!.text).name).toBe('Fenwick Row main');
    expect(copies[0]!.keptAt).toMatch(/^\d{4}-\d\d-\d\dT/);
    const notice = b.store.getState().notice!;
    expect(notice.title).toMatch(/changed in another tab: nothing was overwritten/);
    expect(notice.actions!.map((x) => x.label)).toEqual(
      expect.arrayContaining(['Keep this tab’s version', 'Open the other tab’s version']),
    );
    // B's further edits go to its kept copy, still not over A's.
    b.actions.renameProject('Fenwick Row main, phase 2');
    await settle();
    expect((await stored(kv)).name).toBe('Test main, Lowmoor Lane');
    expect(JSON.parse((await listKeptCopies(kv))[0]!.text).name).toBe('Fenwick Row main, phase 2');
  });

  it('keeps both versions whichever one the user chooses to go on with', async () => {
    const kv = memoryStore({ [PROJECT_KEY]: JSON.stringify(route()) });
    const a = await openTab(kv, null, 'a');
    const b = await openTab(kv, null, 'b');
    a.actions.updateCase('working', { pressure: 1_500_000 });
    await settle();
    b.actions.renameProject('Fenwick Row main');
    await settle();
    b.store
      .getState()
      .notice!.actions!.find((x) => x.label === 'Keep this tab’s version')!
      .run();
    await settle();
    expect((await stored(kv)).name).toBe('Fenwick Row main');
    const copies = await listKeptCopies(kv);
    expect(copies.map((c) => pressureOf(JSON.parse(c.text)))).toEqual([1_500_000]);

    // Now A is behind: it is asked in turn, and opening B's version keeps A's as a copy.
    a.actions.updateCase('working', { pressure: 1_600_000 });
    await settle();
    a.store
      .getState()
      .notice!.actions!.find((x) => x.label === 'Open the other tab’s version')!
      .run();
    await settle();
    expect(a.project().name).toBe('Fenwick Row main');
    expect(pressureOf(a.project())).toBe(620_000);
    const pressures = (await listKeptCopies(kv)).map((c) => pressureOf(JSON.parse(c.text)));
    expect(pressures).toEqual(expect.arrayContaining([1_500_000, 1_600_000]));
  });

  it('brings an idle tab up to date from the other tab, so both edits survive (the issue’s case)', async () => {
    const kv = memoryStore({ [PROJECT_KEY]: JSON.stringify(route()) });
    const [ca, cb] = linkedChannels(2);
    const a = await openTab(kv, ca!, 'a');
    const b = await openTab(kv, cb!, 'b');
    a.actions.updateCase('working', { pressure: 1_500_000 });
    // the save and the other tab's read take longer than one settle on a loaded machine
    await vi.waitFor(() => expect(pressureOf(b.project())).toBe(1_500_000));
    expect(b.store.getState().notice?.title).toMatch(/Updated with the changes saved in another tab/);
    b.actions.renameProject('Fenwick Row main');
    await settle();
    const reloaded = await restoreProject(kv);
    expect(reloaded.kind === 'project' && [reloaded.project.name, pressureOf(reloaded.project)]).toEqual([
      'Fenwick Row main',
      1_500_000,
    ]);
    expect(a.project().name).toBe('Fenwick Row main');
    expect(await listKeptCopies(kv)).toEqual([]);
  });
});

describe('what is kept in storage', () => {
  it('tells an empty stored record apart from no record, so the demo never opens silently', async () => {
    expect((await restoreProject(memoryStore())).kind).toBe('none');
    expect((await restoreProject(memoryStore({ [PROJECT_KEY]: '' }))).kind).toBe('empty');
    expect((await restoreProject(memoryStore({ [PROJECT_KEY]: { revision: 3, text: '  ' } }))).kind).toBe('empty');
  });

  it('keeps every damaged copy with its date: a second one never overwrites the first', async () => {
    const kv = memoryStore({ [PROJECT_KEY]: '{"name": "Wrenfield main", "nodes": [' });
    const first = await restoreProject(kv);
    expect(first.kind).toBe('unreadable');
    // Found again at the next start (nothing was saved over it yet): still one copy.
    await restoreProject(kv);
    expect(await listKeptCopies(kv)).toHaveLength(1);
    await kv.set(PROJECT_KEY, '{"name": "Wrenfield main, second damage"');
    const second = await restoreProject(kv);
    expect(second.kind === 'unreadable' && second.lines[0]).toMatch(/^not valid JSON/);
    const copies = await listKeptCopies(kv);
    expect(copies.map((c) => c.text)).toEqual(
      expect.arrayContaining(['{"name": "Wrenfield main", "nodes": [', '{"name": "Wrenfield main, second damage"']),
    );
    expect(copies).toHaveLength(2);
  });

  it('moves the single backup of earlier releases into the dated list', async () => {
    const kv = memoryStore({ 'mainbrace.project.v1.unreadable': '{"name":"Old backup"' });
    const copies = await listKeptCopies(kv);
    expect(copies.map((c) => c.text)).toEqual(['{"name":"Old backup"']);
    expect(kv.data.has('mainbrace.project.v1.unreadable')).toBe(false);
  });

  it('reads a project kept by an earlier release as bare text, and saves the next revision over it', async () => {
    const kv = memoryStore({ [PROJECT_KEY]: JSON.stringify(route()) });
    const a = await openTab(kv, null, 'a');
    a.actions.renameProject('Holloway Bank main');
    await settle();
    const record = await readRecord(kv);
    expect(record?.revision).toBe(1);
    expect(JSON.parse(record!.text).name).toBe('Holloway Bank main');
  });
});
