import { describe, it, expect, vi, afterEach } from 'vitest';
import { render, screen, cleanup, act, fireEvent } from '@testing-library/react';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { NoticeBar } from './NoticeBar.js';
import { DN300, project } from '../testFixtures.js';

afterEach(() => {
  cleanup();
  vi.useRealTimers();
});

function shown() {
  const store = createAppStore(project([], []), DN300);
  const actions = createActions(store);
  render(
    <StoreProvider store={store} actions={actions}>
      <NoticeBar />
    </StoreProvider>,
  );
  return actions;
}

describe('the notice over the plan', () => {
  it('lets a plain confirmation pass after a while', () => {
    vi.useFakeTimers();
    const actions = shown();
    act(() => actions.notify({ tone: 'info', title: 'Opened main.json', lines: [] }));
    expect(screen.getByTestId('notice').textContent).toContain('Opened main.json');
    act(() => vi.advanceTimersByTime(9_000));
    expect(screen.queryByTestId('notice')).not.toBeNull();
    act(() => vi.advanceTimersByTime(2_000));
    expect(screen.queryByTestId('notice')).toBeNull();
  });

  it('keeps a refusal, and a notice with lines to read, until dismissed', () => {
    vi.useFakeTimers();
    const actions = shown();
    act(() => actions.notify({ tone: 'error', title: 'bad.json was not opened', lines: [] }));
    act(() => vi.advanceTimersByTime(60_000));
    expect(screen.getByTestId('notice').textContent).toContain('bad.json was not opened');
    act(() => actions.notify({ tone: 'info', title: 'Imported survey.csv', lines: ['2 points had no level'] }));
    act(() => vi.advanceTimersByTime(60_000));
    expect(screen.getByTestId('notice').textContent).toContain('2 points had no level');
    act(() => screen.getByRole('button', { name: 'Dismiss' }).click());
    expect(screen.queryByTestId('notice')).toBeNull();
  });

  it('stays while the pointer is over it or the keyboard is on its Dismiss, and passes once let go', () => {
    vi.useFakeTimers();
    const actions = shown();
    act(() => actions.notify({ tone: 'info', title: 'Saved main.json', lines: [] }));
    const notice = screen.getByTestId('notice');
    fireEvent.pointerEnter(notice);
    act(() => vi.advanceTimersByTime(30_000));
    expect(screen.queryByTestId('notice')).not.toBeNull();
    fireEvent.pointerLeave(notice);
    act(() => screen.getByRole('button', { name: 'Dismiss' }).focus());
    act(() => vi.advanceTimersByTime(30_000));
    expect(screen.queryByTestId('notice')).not.toBeNull();
    act(() => screen.getByRole('button', { name: 'Dismiss' }).blur());
    // the full time again from when it was let go
    act(() => vi.advanceTimersByTime(9_000));
    expect(screen.queryByTestId('notice')).not.toBeNull();
    act(() => vi.advanceTimersByTime(2_000));
    expect(screen.queryByTestId('notice')).toBeNull();
  });

  it('lets the next confirmation pass after a dismissal made under the pointer', () => {
    vi.useFakeTimers();
    const actions = shown();
    act(() => actions.notify({ tone: 'info', title: 'Saved main.json', lines: [] }));
    fireEvent.pointerEnter(screen.getByTestId('notice'));
    act(() => screen.getByRole('button', { name: 'Dismiss' }).click());
    act(() => actions.notify({ tone: 'info', title: 'Opened other.json', lines: [] }));
    act(() => vi.advanceTimersByTime(11_000));
    expect(screen.queryByTestId('notice')).toBeNull();
  });
});
