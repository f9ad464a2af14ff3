import { describe, it, expect, vi, afterEach } from 'vitest';
import { render, screen, cleanup, act, fireEvent } from '@testing-library/react';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { PlanHints } from './PlanHints.js';
import { chain, DN300 } from '../testFixtures.js';

afterEach(cleanup);

describe('the stack at the top of the plan', () => {
  it('puts a notice above the draw hint in one stack, so that it pushes the hint down instead of covering it', async () => {
    const store = createAppStore(chain([0, 0], [30, 0]), DN300);
    const actions = createActions(store);
    const planPress = vi.fn();
    render(
      <StoreProvider store={store} actions={actions}>
        <div onPointerDown={planPress}>
          <PlanHints />
        </div>
      </StoreProvider>,
    );
    act(() => {
      store.setState({ tool: 'draw' });
      actions.notify({ tone: 'warning', title: 'That run is not connected', lines: ['Join it to a node'] });
    });
    const notice = screen.getByTestId('notice');
    // the hint's words load after the first screen
    const hint = await vi.waitFor(() => {
      const h = document.querySelector('.plan-hint');
      if (!h) throw new Error('the draw hint is not shown yet');
      return h;
    });
    expect(hint.textContent).toMatch(/run/);
    // siblings in the same flow: the later one is laid out below the earlier, never under it
    expect(notice.parentElement).toBe(hint.parentElement);
    expect(notice.compareDocumentPosition(hint) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    // a press on the notice's Dismiss is the notice's, not the start of a gesture on the plan
    fireEvent.pointerDown(screen.getByRole('button', { name: 'Dismiss' }));
    expect(planPress).not.toHaveBeenCalled();
  });
});
