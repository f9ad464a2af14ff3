import { describe, it, expect, afterEach } from 'vitest';
import { render, cleanup, fireEvent, screen } from '@testing-library/react';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { DN300, project } from '../testFixtures.js';
import { CasesPanel } from './CasesPanel.js';

afterEach(cleanup);

/** Two nodes on Quarry Bank Road, a working case and a field test, the test with no label. */
function mount() {
  const store = createAppStore(
    project(
      [
        { id: 'n1', x: 0, y: 0 },
        { id: 'n2', x: 40, y: 0 },
      ],
      [{ from: 'n1', to: 'n2' }],
      [
        { id: 'working', label: 'Working', kind: 'working', pressure: 600e3 },
        { id: 'test', kind: 'test', pressure: 900e3, flowFactor: 0 },
      ],
    ),
    DN300,
  );
  render(
    <StoreProvider store={store} actions={createActions(store)}>
      <CasesPanel />
    </StoreProvider>,
  );
  return store;
}

const labels = (store: ReturnType<typeof mount>) => store.getState().project.loadCases.map((c) => c.label);

describe('a case’s name, which every screen and sheet names the governing case by', () => {
  it('is not taken when another case already has it (its label, or its id where it has none)', () => {
    const store = mount();
    const name = screen.getByLabelText('Name of case working') as HTMLInputElement;
    fireEvent.change(name, { target: { value: 'test' } });
    expect(screen.getByRole('alert').textContent).toBe(
      '“test” already names another case: give each case a name of its own.',
    );
    expect(name.value).toBe('test');
    expect(name.getAttribute('aria-invalid')).toBe('true');
    expect(labels(store)).toEqual(['Working', undefined]);
    fireEvent.change(name, { target: { value: 'test 2' } });
    expect(screen.queryByRole('alert')).toBeNull();
    expect(labels(store)).toEqual(['test 2', undefined]);
  });

  it('goes back to the case’s own name when the field is left on a name taken', () => {
    const store = mount();
    const name = screen.getByLabelText('Name of case test') as HTMLInputElement;
    fireEvent.change(name, { target: { value: 'Working' } });
    fireEvent.blur(name);
    expect(name.value).toBe('');
    expect(screen.queryByRole('alert')).toBeNull();
    expect(labels(store)).toEqual(['Working', undefined]);
  });

  it('is a new one for each case added', () => {
    const store = mount();
    fireEvent.click(screen.getByText('Add a case'));
    fireEvent.click(screen.getByText('Add a case'));
    expect(labels(store)).toEqual(['Working', undefined, 'New case', 'New case 2']);
  });
});
