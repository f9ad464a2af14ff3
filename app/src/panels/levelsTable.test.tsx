import { describe, it, expect, afterEach } from 'vitest';
import { render, cleanup, fireEvent, screen } from '@testing-library/react';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { resultsOf } from '../state/results.js';
import { DN300, expectClose, expectValid, project } from '../testFixtures.js';
import { LevelsTable } from './LevelsTable.js';
import { evenGrade } from './nodeLevels.js';

afterEach(cleanup);

/**
 * A main along Tansley Road, n1 → n4 at plan chainages 0, 30, 70, 100 m, falling from 100 m to 93 m with
 * two nodes between left at 100 m, and a spur n5 off n3 (DN300, OD 0.326 m). n2 has a surveyed ground.
 */
const doc = () =>
  project(
    [
      { id: 'n1', x: 0, y: 0, z: 100 },
      { id: 'n2', x: 30, y: 0, z: 100 },
      { id: 'n3', x: 70, y: 0, z: 100 },
      { id: 'n4', x: 100, y: 0, z: 93 },
      { id: 'n5', x: 70, y: 40, z: 100 },
    ],
    [
      { from: 'n1', to: 'n2' },
      { from: 'n2', to: 'n3' },
      { from: 'n3', to: 'n4' },
      { from: 'n3', to: 'n5' },
    ],
  );
const withGround = () => {
  const p = doc();
  return { ...p, nodes: p.nodes.map((n) => (n.id === 'n2' ? { ...n, groundLevel: 101.5 } : n)) };
};

describe('laying a stretch on an even grade', () => {
  it('puts every node between on the straight line by plan chainage, the ends unchanged (hand calculation)', () => {
    // Grade (93 − 100) / 100 = −7 %: n2 at 30 m → 100 − 2.1 = 97.9 m; n3 at 70 m → 100 − 4.9 = 95.1 m.
    const patches = evenGrade(withGround(), [
      { id: 'n1', chainage: 0 },
      { id: 'n2', chainage: 30 },
      { id: 'n3', chainage: 70 },
      { id: 'n4', chainage: 100 },
    ]);
    expect([...patches.keys()]).toEqual(['n2', 'n3']);
    expectClose(patches.get('n2')!.elevation!, 97.9, 1e-6);
    expectClose(patches.get('n3')!.elevation!, 95.1, 1e-6);
    // n2's surveyed ground stays and its cover follows: 101.5 − 97.9 − 0.326/2 = 3.437 m.
    expect(patches.get('n2')!.groundLevel).toBeUndefined();
    expectClose(patches.get('n2')!.cover!, 3.437, 1e-6);
  });

  it('has nothing to do for two neighbours, or a stretch already even', () => {
    expect(
      evenGrade(doc(), [
        { id: 'n1', chainage: 0 },
        { id: 'n2', chainage: 30 },
      ]).size,
    ).toBe(0);
    const flat = evenGrade(doc(), [
      { id: 'n1', chainage: 0 },
      { id: 'n2', chainage: 30 },
      { id: 'n3', chainage: 70 },
    ]);
    expect(flat.size).toBe(0);
  });
});

function mount() {
  const store = createAppStore(withGround(), DN300);
  const actions = createActions(store);
  const undo = () => actions.undo();
  const p = store.getState().project;
  render(
    <StoreProvider store={store} actions={actions}>
      <LevelsTable project={p} analysis={resultsOf(p)} />
    </StoreProvider>,
  );
  return { store, undo };
}

const commit = (input: HTMLElement, text: string) => {
  fireEvent.change(input, { target: { value: text } });
  fireEvent.keyDown(input, { key: 'Enter' });
};

describe('the levels table', () => {
  it('lays the chosen stretch evenly in one undo step and says what it did', () => {
    const { store, undo } = mount();
    const marks = resultsOf(store.getState().project).marks;
    const name = (id: string) => marks.get(id) ?? '';
    fireEvent.change(screen.getByTestId('grade-from'), { target: { value: '0:0' } });
    fireEvent.change(screen.getByTestId('grade-to'), { target: { value: '0:3' } });
    fireEvent.click(screen.getByTestId('grade-lay'));
    const after = store.getState().project;
    expectValid(after);
    const level = (id: string) => after.nodes.find((n) => n.id === id)!.elevation;
    expectClose(level('n2'), 97.9, 1e-6);
    expectClose(level('n3'), 95.1, 1e-6);
    expect(screen.getByTestId('grade-said').textContent).toContain('laid on an even grade of -7.00 %');
    expect(screen.getByTestId('grade-said').textContent).toContain(`from ${name('n1')}`);
    undo();
    expect(store.getState().project.nodes.map((n) => n.elevation)).toEqual([100, 100, 100, 93, 100]);
  });

  it('refuses a stretch whose ends lie on two runs, naming both', () => {
    const { store } = mount();
    fireEvent.change(screen.getByTestId('grade-from'), { target: { value: '0:0' } });
    fireEvent.change(screen.getByTestId('grade-to'), { target: { value: '1:1' } });
    fireEvent.click(screen.getByTestId('grade-lay'));
    expect(screen.getByTestId('grade-said').textContent).toMatch(
      /^Both ends must be on one run: .+ is on run A, .+ on run B\.$/,
    );
    expect(store.getState().project.nodes.map((n) => n.elevation)).toEqual([100, 100, 100, 93, 100]);
  });

  it('takes a typed ground level keeping the cover, and a typed pipe level keeping the ground', () => {
    const { store } = mount();
    const node = (id: string) => store.getState().project.nodes.find((n) => n.id === id)!;
    const marks = resultsOf(store.getState().project).marks;
    // n4 has no surveyed ground: its stated cover places the pipe under the typed ground.
    const cover = node('n4').cover;
    commit(screen.getByLabelText(`Ground level, ${marks.get('n4')}`), '95');
    expect(node('n4').groundLevel).toBe(95);
    expectClose(node('n4').elevation, 95 - cover - 0.326 / 2, 1e-6);
    // n2, the second row of run A: ground 101.5 m stays, cover = 101.5 − 99 − 0.163 = 2.337 m.
    commit(screen.getAllByLabelText(/^Pipe centreline elevation, /)[1]!, '99');
    expect(node('n2').elevation).toBe(99);
    expect(node('n2').groundLevel).toBe(101.5);
    expectClose(node('n2').cover, 2.337, 1e-6);
  });
});
