import { describe, it, expect, afterEach } from 'vitest';
import type { ReactNode } from 'react';
import { render, cleanup, fireEvent, screen } from '@testing-library/react';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { resultsOf } from '../state/results.js';
import { DN300, project } from '../testFixtures.js';
import { CasesPanel } from './CasesPanel.js';
import { NodeDetails } from './NodeDetails.js';

afterEach(cleanup);

/** Three nodes at Hartwell Common, one case named Working with its datum at 100 m. */
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
    [{ id: 'working', label: 'Working', kind: 'working', pressure: 600e3, datumElevation: 100 }],
  );

function mount(ui: (p: ReturnType<typeof doc>) => ReactNode) {
  const store = createAppStore(doc(), DN300);
  const actions = createActions(store);
  render(
    <StoreProvider store={store} actions={actions}>
      {ui(store.getState().project)}
    </StoreProvider>,
  );
  return store;
}

function commit(input: HTMLElement, text: string) {
  fireEvent.change(input, { target: { value: text } });
  fireEvent.keyDown(input, { key: 'Enter' });
}

describe('a value the project cannot take, typed in a field', () => {
  it('is refused at the field as labelled, in display units, and the datum in force stays', () => {
    const store = mount(() => <CasesPanel />);
    const field = screen.getByTestId('case-datum-working');
    commit(field, '20000');
    // The hard elevation limit is 10 000 m (packages/solver/src/model/limits.ts).
    expect(screen.getByRole('alert').textContent).toBe('Datum of Working: must be at most 10,000 m');
    expect(field.getAttribute('aria-invalid')).toBe('true');
    expect(store.getState().project.loadCases[0]!.datumElevation).toBe(100);
    expect(store.getState().notice).toBeNull();
    commit(field, '95');
    expect(screen.queryByRole('alert')).toBeNull();
    expect(store.getState().project.loadCases[0]!.datumElevation).toBe(95);
  });

  it('shows the project’s own refusal beside the field too, naming the node by its mark', () => {
    const store = mount((p) => <NodeDetails node={p.nodes[2]!} project={p} pipeCount={1} />);
    const marks = resultsOf(doc()).marks;
    commit(screen.getByTestId('node-east'), '0');
    commit(screen.getByTestId('node-north'), '0');
    const north = screen.getByTestId('node-north');
    expect(north.getAttribute('aria-invalid')).toBe('true');
    // Folded back onto n1, n3 also lays the second pipe over the first.
    expect(screen.getByRole('alert').textContent).toBe(
      `Node ${marks.get('n3')}: stands at the same point as node ${marks.get('n1')} but is not joined to it: merge the two nodes or move one` +
        ` Pipe p2: leaves node ${marks.get('n2')} along the same line as pipe p1: the two lie on top of each other (is the route folded back on itself?)`,
    );
    expect(store.getState().project.nodes[2]).toMatchObject({ x: 0, y: 30 });
  });
});
