import { savedDocument } from './savedDocument.js';
import { describe, expect, it, vi } from 'vitest';
import { createAppStore } from './store.js';
import { createActions } from './actions.js';
import { DN300, emptyProject, project } from '../testFixtures.js';

/** A two-pipe main at Saltmarsh Way, as the app opens it. */
function app() {
  const doc = project(
    [
      { id: 'n1', x: 0, y: 0 },
      { id: 'n2', x: 25, y: 0 },
      { id: 'n3', x: 25, y: 35 },
    ],
    [
      { from: 'n1', to: 'n2' },
      { from: 'n2', to: 'n3' },
    ],
  );
  const store = createAppStore(doc, DN300);
  return { store, actions: createActions(store), doc, undoSteps: () => store.temporal.getState().pastStates.length };
}

describe('document edits and history', () => {
  it('undoes and redoes an edit, returning the very same documents', () => {
    const { store, actions, doc } = app();
    actions.updateNode('n2', { cover: 2.1 });
    const edited = store.getState().project;
    expect(edited.nodes[1]!.cover).toBe(2.1);
    actions.undo();
    expect(store.getState().project).toBe(doc);
    actions.redo();
    expect(store.getState().project).toBe(edited);
  });

  it('records one step per edit and none for an edit that changes nothing', () => {
    const { actions, undoSteps } = app();
    actions.renameProject('Saltmarsh Way rising main');
    actions.removeCase('working'); // the last case cannot go: no new document
    expect(undoSteps()).toBe(1);
  });

  it('switches display units as a view setting: no undo step, the same document, saved with the new units', () => {
    const { store, actions, undoSteps, doc } = app();
    actions.setUnits('us');
    expect(undoSteps()).toBe(0);
    expect(store.getState().project).toBe(doc);
    expect(store.getState().units).toBe('us');
    expect(savedDocument(store.getState()).units).toBe('us');
    expect(savedDocument(store.getState())).toBe(savedDocument(store.getState()));
  });

  it('sets bedding and wrap on every pipe as one undo step, and makes none when every pipe has them already', () => {
    const { store, actions, undoSteps, doc } = app();
    actions.setBeddingEverywhere({ trenchType: 4, encasement: 'polyethylene' });
    expect(store.getState().project.pipes.map((p) => [p.trenchType, p.encasement])).toEqual([
      [4, 'polyethylene'],
      [4, 'polyethylene'],
    ]);
    expect(undoSteps()).toBe(1);
    actions.setBeddingEverywhere({ trenchType: 4 });
    expect(undoSteps()).toBe(1);
    actions.undo();
    expect(store.getState().project).toBe(doc);
  });

  it('leaves no undo step for view, tool, selection, snapping or drawer changes', () => {
    const { actions, undoSteps } = app();
    actions.setViewport({ scale: 7, left: -3, top: 40 });
    actions.setTool('draw');
    actions.selectNode('n2');
    actions.toggleSnapping();
    actions.setCaseView({ kind: 'case', id: 'working' });
    actions.setDrawer('profile', 'high');
    actions.setDragPreview(new Map([['n2', { x: 1, y: 2 }]]));
    actions.clearSelection();
    expect(undoSteps()).toBe(0);
  });
});

describe('live edits (a slider being dragged)', () => {
  it('show each change at once and make one undo step for the whole gesture', () => {
    const { store, actions, doc, undoSteps } = app();
    actions.beginLiveEdit();
    for (const cover of [1.3, 1.6, 1.9, 2.4])
      actions.liveEdit((p) => ({ ...p, nodes: p.nodes.map((n) => (n.id === 'n2' ? { ...n, cover } : n)) }));
    expect(store.getState().project.nodes[1]!.cover).toBe(2.4);
    actions.endLiveEdit();
    expect(undoSteps()).toBe(1);
    expect(store.getState().project.nodes[1]!.cover).toBe(2.4);
    actions.undo();
    expect(store.getState().project).toBe(doc);
  });

  it('record later edits as their own steps again once the gesture has ended', () => {
    const { actions, undoSteps } = app();
    actions.beginLiveEdit();
    actions.liveEdit((p) => ({ ...p, name: 'draft' }));
    actions.endLiveEdit();
    actions.renameProject('Saltmarsh Way');
    expect(undoSteps()).toBe(2);
  });
});

describe('selection across history', () => {
  it('drops selected ids that an undo removes and keeps those that remain', () => {
    const { store, actions } = app();
    actions.addRun({ kind: 'node', id: 'n3' }, [{ x: 60, y: 35 }], null);
    expect(store.getState().project.pipes.map((p) => p.id)).toEqual(['p1', 'p2', 'p3']);
    actions.select({ nodes: new Set(['n2', 'n4']), pipes: new Set(['p1', 'p3']) });
    actions.undo();
    expect([...store.getState().selection.nodes]).toEqual(['n2']);
    expect([...store.getState().selection.pipes]).toEqual(['p1']);
  });

  it('deletes the selection as one undoable step and clears it', () => {
    const { store, actions, doc } = app();
    actions.select({ nodes: new Set(), pipes: new Set(['p2']) });
    actions.deleteSelection();
    expect(store.getState().project.nodes.map((n) => n.id)).toEqual(['n1', 'n2']);
    expect(store.getState().selection.pipes.size).toBe(0);
    actions.undo();
    expect(store.getState().project).toBe(doc);
  });
});

describe('replaceProject', () => {
  it('swaps the whole document as one undoable step, clearing the selection and any drawing', () => {
    const { store, actions, doc, undoSteps } = app();
    actions.selectNode('n2');
    actions.setDraw({
      phase: 'drawing',
      start: { kind: 'point', at: { x: 1, y: 1 } },
      startPoint: { x: 1, y: 1 },
      vertices: [],
      cursor: null,
    });
    const blank = emptyProject();
    actions.replaceProject(blank);
    expect(store.getState().project).toBe(blank);
    expect(store.getState().selection.nodes.size).toBe(0);
    expect(store.getState().draw.phase).toBe('idle');
    expect(undoSteps()).toBe(1);
    actions.undo();
    expect(store.getState().project).toBe(doc);
  });
});

describe('typing into a text field', () => {
  it('makes one undo step for a burst of keystrokes, and a new one after a pause', () => {
    const store = createAppStore(
      project(
        [
          { id: 'n1', x: 0, y: 0 },
          { id: 'n2', x: 10, y: 0 },
        ],
        [{ from: 'n1', to: 'n2' }],
      ),
      DN300,
    );
    const actions = createActions(store);
    const original = store.getState().project.name;
    vi.useFakeTimers();
    try {
      for (const name of ['F', 'Fe', 'Fen', 'Fenw']) actions.renameProject(name);
      vi.advanceTimersByTime(2000);
      actions.renameProject('Fenwick');
    } finally {
      vi.useRealTimers();
    }
    actions.undo();
    expect(store.getState().project.name).toBe('Fenw');
    actions.undo();
    expect(store.getState().project.name).toBe(original);
  });
});
