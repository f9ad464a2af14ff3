import { describe, expect, it, vi } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { parseProject, problemText } from '@mainbrace/solver';
import { chain, DN300, project } from '../testFixtures.js';

const demo = JSON.parse(
  readFileSync(resolve(import.meta.dirname, '../../../public/demo/larkspur-rise.json'), 'utf8'),
) as unknown;

/** Fresh copies of the checks and the actions, with the schema checks not loaded yet (as at start). */
async function fresh() {
  vi.resetModules();
  const checks = await import('./checks.js');
  const { createActions } = await import('./actions.js');
  const { createAppStore } = await import('./store.js');
  return { checks, createActions, createAppStore };
}

describe('opening a project without the schema library', () => {
  it('opens the demo checked by hand, the same document as the schema gives, without loading the schema', async () => {
    const { checks } = await fresh();
    const r = await checks.validated(demo);
    expect(checks.checksReady()).toBe(false);
    const schema = parseProject(demo);
    expect(r.ok && schema.ok).toBe(true);
    // the same text as saved: same fields in the same order (the schema's output is the reference)
    expect(r.ok && JSON.stringify(r.project)).toBe(schema.ok && JSON.stringify(schema.project));
  });

  it('loads the schema to word a refusal, with the whole-file check’s words', async () => {
    const { checks } = await fresh();
    const bad = structuredClone(demo) as { nodes: { elevation: unknown }[] };
    bad.nodes[1]!.elevation = 'high';
    const r = await checks.validated(bad);
    expect(checks.checksReady()).toBe(true);
    const schema = parseProject(bad);
    expect(r).toEqual({ ok: false, lines: schema.ok ? [] : schema.problems.map(problemText) });
    expect(r.ok ? '' : r.lines[0]).toBe('nodes[1].elevation: expected a number, got the text "high"');
  });
});

/** One pipe at Saltmarsh Way, as the app opens it. */
const doc = () =>
  project(
    [
      { id: 'n1', x: 0, y: 0 },
      { id: 'n2', x: 25, y: 0 },
    ],
    [{ from: 'n1', to: 'n2' }],
  );

describe('edits made before the schema checks are loaded', () => {
  it('makes an edit the check by hand passes at once', async () => {
    const { checks, createActions, createAppStore } = await fresh();
    const store = createAppStore(doc(), DN300);
    createActions(store).updateNode('n2', { cover: 2.1 });
    expect(checks.checksReady()).toBe(false);
    expect(store.getState().project.nodes[1]!.cover).toBe(2.1);
  });

  it('refuses a bad edit with the schema’s words once they load, and keeps later edits in order', async () => {
    const { checks, createActions, createAppStore } = await fresh();
    const store = createAppStore(doc(), DN300);
    const actions = createActions(store);
    // The refusal is shown, then cleared by the later edit that goes through.
    const shown: NonNullable<ReturnType<typeof store.getState>['notice']>[] = [];
    store.subscribe((s) => void (s.notice && shown.push(s.notice)));
    actions.updateNode('n2', { cover: Number.NaN }); // waits for the schema checks
    actions.updateNode('n2', { cover: 1.7 }); // would pass by hand, but waits its turn
    expect(store.getState().project.nodes[1]!.cover).not.toBe(1.7);
    await checks.loadChecks();
    await vi.waitFor(() => expect(store.getState().project.nodes[1]!.cover).toBe(1.7));
    expect(shown[0]?.title).toBe('That change was not made: it would leave the project invalid');
    expect(shown[0]?.lines[0]).toMatch(/^Cover to top of pipe at node \w+: expected a number/);
    expect(store.temporal.getState().pastStates.length).toBe(1);
  });
});

describe('edits of the route’s shape made before their code is loaded', () => {
  it('wait for it, and the edits after them keep their turn', async () => {
    vi.resetModules();
    const routeEdits = await import('./routeEdits.js');
    const { createActions } = await import('./actions.js');
    const { createAppStore } = await import('./store.js');
    const store = createAppStore(doc(), DN300);
    const actions = createActions(store);
    expect(routeEdits.routeEdits()).toBeNull();
    actions.moveNodes(new Map([['n2', { x: 30, y: 4 }]]));
    actions.updateNode('n2', { cover: 1.4 }); // needs no route edit, but waits its turn
    expect(store.getState().project.nodes[1]).toMatchObject({ x: 25, y: 0 });
    expect(store.getState().project.nodes[1]!.cover).not.toBe(1.4);
    await vi.waitFor(() => expect(store.getState().project.nodes[1]).toMatchObject({ x: 30, y: 4, cover: 1.4 }));
    // two steps, undone in turn: the cover first, then the move
    actions.undo();
    expect(store.getState().project.nodes[1]).toMatchObject({ x: 30, y: 4 });
    actions.undo();
    expect(store.getState().project.nodes[1]).toMatchObject({ x: 25, y: 0 });
  });

  /** Fresh modules with the route's edits not loaded yet, as at start; a three-node route. */
  async function starting() {
    vi.resetModules();
    const routeEdits = await import('./routeEdits.js');
    const { createActions } = await import('./actions.js');
    const { createAppStore } = await import('./store.js');
    const store = createAppStore(chain([0, 0], [25, 0], [25, 30]), DN300);
    expect(routeEdits.routeEdits()).toBeNull();
    return { store, actions: createActions(store) };
  }

  it('delete what was selected when Delete was pressed, whatever is selected when their code arrives', async () => {
    const { store, actions } = await starting();
    actions.select({ nodes: new Set(['n3']), pipes: new Set() });
    actions.deleteSelection();
    actions.select({ nodes: new Set(['n1']), pipes: new Set() });
    await vi.waitFor(() => expect(store.getState().project.nodes.map((n) => n.id)).toEqual(['n1', 'n2']));
  });

  it('are what an undo pressed meanwhile undoes, as the last edit made', async () => {
    const { store, actions } = await starting();
    actions.updateNode('n2', { cover: 1.4 }); // made at once
    actions.moveNodes(new Map([['n3', { x: 40, y: 30 }]])); // waits for its code
    actions.undo();
    await vi.waitFor(() => expect(store.temporal.getState().futureStates.length).toBe(1));
    expect(store.getState().project.nodes[2]).toMatchObject({ x: 25, y: 30 });
    expect(store.getState().project.nodes[1]!.cover).toBe(1.4);
  });
});
