import { describe, it, expect, vi, afterEach } from 'vitest';
import { render, screen, cleanup, act, fireEvent } from '@testing-library/react';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { memoryStore } from '../state/keyValue.js';
import { PROJECT_KEY } from '../state/storedProject.js';
import { listKeptCopies } from '../state/keptCopies.js';
import type { Autosave } from '../state/autosave.js';
import { ErrorBoundary } from './ErrorBoundary.js';
import { createRecovery } from './recoveryActions.js';
import { DN300, project } from '../testFixtures.js';

afterEach(() => {
  cleanup();
  vi.restoreAllMocks();
});

const kestrel = () => ({
  ...project(
    [
      { id: 'n1', x: 0, y: 0 },
      { id: 'n2', x: 30, y: 0 },
      { id: 'n3', x: 30, y: 30 },
    ],
    [
      { from: 'n1', to: 'n2' },
      { from: 'n2', to: 'n3' },
    ],
  ),
  name: 'Kestrel Way main',
});

/** A screen that fails while the kept project is the one that breaks it (a crash on every reload). */
function setUp() {
  const kept = kestrel();
  const kv = memoryStore({ [PROJECT_KEY]: { revision: 4, savedAt: null, tab: 'x', text: JSON.stringify(kept) } });
  const store = createAppStore(kept, DN300);
  const actions = createActions(store);
  const autosave: Autosave = { flush: vi.fn(async () => true), claim: vi.fn(), stop: vi.fn() };
  const recovery = createRecovery(kv, store, actions, autosave);
  const Failing = () => {
    if (store.getState().project.name === 'Kestrel Way main') throw new Error('drawing failed');
    return <p>plan drawn</p>;
  };
  vi.spyOn(console, 'error').mockImplementation(() => undefined);
  render(
    <ErrorBoundary store={store} recovery={recovery}>
      <Failing />
    </ErrorBoundary>,
  );
  return { kv, store, autosave };
}

describe('the recovery screen', () => {
  it('offers every way out of a crash that returns on each reload', () => {
    setUp();
    expect(screen.getByTestId('recovery').textContent).toMatch(/Your project “Kestrel Way main” is safe/);
    expect(screen.getByText(/What went wrong: drawing failed/)).toBeTruthy();
    for (const name of [
      'Download the kept project',
      'Start without the kept project',
      'Open a project file…',
      'New project',
    ])
      expect(screen.getByRole('button', { name })).toBeTruthy();
  });

  it('starts without the kept project only after setting it aside as a dated kept copy', async () => {
    const { kv, autosave } = setUp();
    const reload = vi.fn();
    vi.spyOn(window, 'location', 'get').mockReturnValue({ ...window.location, reload });
    await act(async () => {
      fireEvent.click(screen.getByRole('button', { name: 'Start without the kept project' }));
      await new Promise((r) => setTimeout(r, 20));
    });
    expect(autosave.stop).toHaveBeenCalled();
    expect(kv.data.has(PROJECT_KEY)).toBe(false);
    const copies = await listKeptCopies(kv);
    expect(copies.map((c) => c.name)).toEqual(['Kestrel Way main']);
    expect(reload).toHaveBeenCalled();
  });

  it('opens a new project in place of the failing one, keeping the failing one', async () => {
    const { kv, store } = setUp();
    await act(async () => {
      fireEvent.click(screen.getByRole('button', { name: 'New project' }));
      await new Promise((r) => setTimeout(r, 20));
    });
    // the blank project's module loads when it is first needed
    expect(await screen.findByText('plan drawn', {}, { timeout: 5000 })).toBeTruthy();
    expect(store.getState().project.nodes).toHaveLength(0);
    expect((await listKeptCopies(kv)).map((c) => c.name)).toEqual(['Kestrel Way main']);
  });

  it('downloads the kept project exactly as stored', async () => {
    setUp();
    const created: Blob[] = [];
    vi.spyOn(URL, 'createObjectURL').mockImplementation((b) => {
      created.push(b as Blob);
      return 'blob:kept';
    });
    await act(async () => {
      fireEvent.click(screen.getByRole('button', { name: 'Download the kept project' }));
      await new Promise((r) => setTimeout(r, 20));
    });
    expect(JSON.parse(await created[0]!.text()).name).toBe('Kestrel Way main');
  });
});
