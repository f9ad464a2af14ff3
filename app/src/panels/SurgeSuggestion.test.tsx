import { describe, it, expect, afterEach } from 'vitest';
import { render, cleanup, fireEvent, screen } from '@testing-library/react';
import { surgeEstimate } from '@mainbrace/solver';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { DN300, project } from '../testFixtures.js';
import { SurgeSuggestion } from './SurgeSuggestion.js';

afterEach(cleanup);

const flowing = (cases?: Parameters<typeof project>[2]) =>
  project(
    [
      { id: 'a', x: 0, y: 0 },
      { id: 'b', x: 50, y: 0 },
      { id: 'c', x: 50, y: 50 },
    ],
    [
      { from: 'a', to: 'b', flow: 0.08 },
      { from: 'b', to: 'c', flow: 0.08 },
    ],
    cases,
  );

function mount(p: ReturnType<typeof flowing>) {
  const store = createAppStore(p, DN300);
  const actions = createActions(store);
  render(
    <StoreProvider store={store} actions={actions}>
      <SurgeSuggestion />
    </StoreProvider>,
  );
  return store;
}

describe('the surge suggestion in the cases panel', () => {
  it('adds the suggested surge case only when the user accepts it', () => {
    const p = flowing([{ id: 'working', kind: 'working', pressure: 600e3 }]);
    const expected = surgeEstimate(p)!.suggestedPressure;
    const store = mount(p);
    expect(store.getState().project.loadCases).toHaveLength(1);
    fireEvent.click(screen.getByTestId('surge-accept'));
    const cases = store.getState().project.loadCases;
    expect(cases).toHaveLength(2);
    expect(cases[1]).toMatchObject({ kind: 'surge', pressure: expected });
  });

  it('sets an existing surge case instead of adding a second', () => {
    const store = mount(
      flowing([
        { id: 'working', kind: 'working', pressure: 600e3 },
        { id: 's', kind: 'surge', pressure: 700e3 },
      ]),
    );
    expect(screen.getByTestId('surge-accept').textContent).toMatch(/^Set “s” to this/);
    fireEvent.click(screen.getByTestId('surge-accept'));
    const cases = store.getState().project.loadCases;
    expect(cases).toHaveLength(2);
    expect(cases[1]!.pressure).toBeGreaterThan(700e3);
  });

  it('words the per-pipe list when it is opened: one line per pipe, named by its ends', () => {
    mount(flowing([{ id: 'working', kind: 'working', pressure: 600e3 }]));
    const details = screen.getByText('Every pipe').closest('details')!;
    expect(details.querySelectorAll('li')).toHaveLength(0);
    details.open = true;
    fireEvent(details, new Event('toggle'));
    const lines = [...details.querySelectorAll('li')].map((li) => li.textContent);
    expect(lines).toHaveLength(2);
    expect(lines[0]).toMatch(/^the pipe from .+ to .+: a /);
  });

  it('says what is missing when no pipe carries flow', () => {
    const p = flowing();
    mount({ ...p, pipes: p.pipes.map((x) => ({ ...x, flow: 0 })) });
    expect(screen.queryByTestId('surge-accept')).toBeNull();
    expect(screen.getByTestId('surge-suggestion').textContent).toMatch(/Give the pipes their flows/);
  });
});
