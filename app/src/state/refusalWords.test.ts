import { describe, it, expect } from 'vitest';
import { createAppStore } from './store.js';
import { createActions } from './actions.js';
import { resultsOf } from './results.js';
import { DN300, project } from '../testFixtures.js';

/** Three nodes at Hartwell Common: a cap, a bend, a cap; one case named as the user named it. */
const doc = () =>
  project(
    [
      { id: 'n1', x: 0, y: 0 },
      { id: 'n2', x: 25, y: 0 },
      { id: 'n3', x: 25, y: 30 },
    ],
    [
      { from: 'n1', to: 'n2' },
      { from: 'n2', to: 'n3' },
    ],
    [{ id: 'working', label: 'Working', pressure: 600e3, datumElevation: 100 }],
  );

function open() {
  const store = createAppStore(doc(), DN300);
  return { store, actions: createActions(store) };
}

describe('a refused edit, in the words of the screen', () => {
  it('names a case’s field as labelled, with the bound in display units, and keeps the value in force', () => {
    const { store, actions } = open();
    // The hard elevation limit is 10 000 m (packages/solver/src/model/limits.ts).
    const lines = actions.updateCase('working', { datumElevation: 20_000 });
    expect(lines).toEqual(['Datum of Working: must be at most 10,000 m']);
    expect(store.getState().notice?.lines).toEqual(lines);
    expect(store.getState().project.loadCases[0]!.datumElevation).toBe(100);
    actions.setUnits('us');
    // 10 000 m / 0.3048 m/ft = 32 808.4 ft
    expect(actions.updateCase('working', { datumElevation: -20_000 })).toEqual([
      'Datum of Working: must be at least -32,808 ft',
    ]);
  });

  it('names a node by the mark the plan and the schedule give it, never by its place in the list', () => {
    const { actions } = open();
    const marks = resultsOf(doc()).marks;
    expect(marks.get('n2')).toMatch(/^[A-Z]\d+$/);
    expect(actions.updateNode('n2', { elevation: 20_000 })).toEqual([
      `Pipe centreline elevation at node ${marks.get('n2')}: must be at most 10,000 m`,
    ]);
    // A check across nodes names both nodes the same way.
    const [line] = actions.updateNode('n3', { x: 0, y: 0 });
    expect(line).toBe(
      `Node ${marks.get('n3')}: stands at the same point as node ${marks.get('n1')} but is not joined to it: merge the two nodes or move one`,
    );
  });

  it('clears the refusal once a later edit goes through, and leaves any other warning up', () => {
    const { store, actions } = open();
    actions.updateCase('working', { datumElevation: 20_000 });
    expect(store.getState().notice?.tone).toBe('error');
    actions.renameProject('Hartwell Common main');
    expect(store.getState().notice).toBeNull();
    const warning = { tone: 'warning' as const, title: 'Autosave failed', lines: [] };
    actions.notify(warning);
    actions.renameProject('Hartwell Common main, phase 2');
    expect(store.getState().notice).toBe(warning);
  });
});
