import { describe, it, expect, vi, afterEach } from 'vitest';
import { render, screen, cleanup, act } from '@testing-library/react';
import { scheduleCsv, analyse } from '@mainbrace/solver';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { DetailsPanel } from '../panels/DetailsPanel.js';
import { MAX_FILE_BYTES, readProjectFile } from '../files/projectFile.js';
import { DN300, project } from '../testFixtures.js';
import { scheduleViewOf } from '../state/scheduleViewOf.js';

afterEach(cleanup);

const HOSTILE = '<img src=x onerror="window.__pwned=1">';
const route = () =>
  project(
    [
      { id: 'n1', x: 0, y: 0 },
      { id: 'n2', x: 30, y: 0 },
      { id: 'n3', x: 30, y: 30 },
    ],
    [
      { from: 'n1', to: 'n2' },
      { from: 'n2', to: 'n3' },
    ],
  );

describe('robustness of the app at its edges', () => {
  it('shows a label made of HTML as text, never as markup', async () => {
    const p = route();
    const hostile = { ...p, nodes: p.nodes.map((n) => (n.id === 'n2' ? { ...n, label: HOSTILE } : n)) };
    const store = createAppStore(hostile, DN300);
    const actions = createActions(store);
    actions.selectNode('n2');
    const { container } = render(
      <StoreProvider store={store} actions={actions}>
        <DetailsPanel />
      </StoreProvider>,
    );
    // the node's details are a lazy part: wait for them
    expect(await screen.findByDisplayValue(HOSTILE)).toBeTruthy();
    expect(container.querySelector('img')).toBeNull();
    expect((window as unknown as { __pwned?: number }).__pwned).toBeUndefined();
  });

  it('draws the details and the schedule of a project with values far below drawing precision', async () => {
    const { ScheduleTable } = await import('../panels/ScheduleTable.js');
    const p = route();
    // 1e-100 Pa once made number formatting throw on every render, and so on every reload.
    const tiny = { ...p, loadCases: [{ ...p.loadCases[0]!, pressure: 1e-100 }], water: { density: 1e-300 } };
    const store = createAppStore(tiny, DN300);
    const actions = createActions(store);
    actions.selectNode('n2');
    vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const { container } = render(
      <StoreProvider store={store} actions={actions}>
        <DetailsPanel />
        <ScheduleTable />
      </StoreProvider>,
    );
    expect(container.textContent).toMatch(/e-1\d\d/);
  });

  it('keeps a label that a spreadsheet would run as a formula inert in the CSV export', () => {
    const p = route();
    const withFormula = { ...p, nodes: p.nodes.map((n) => (n.id === 'n2' ? { ...n, label: '=HYPERLINK("x")' } : n)) };
    const csv = scheduleCsv(scheduleViewOf(analyse(withFormula), 'si'));
    expect(csv).toContain(`"'=HYPERLINK(""x"")"`);
  });

  it('refuses a project file over 20 MB with a message, before reading it', async () => {
    const big = { name: 'huge.json', size: MAX_FILE_BYTES + 1, text: vi.fn() } as unknown as File;
    const r = await readProjectFile(big);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.lines[0]).toMatch(/over 20 MB are refused/);
    expect((big as unknown as { text: ReturnType<typeof vi.fn> }).text).not.toHaveBeenCalled();
  });

  it('names the problems of a bad file and leaves the open project as it was', async () => {
    const file = new File(
      [JSON.stringify({ format: 'mainbrace-project', version: 1, loadCases: [], soils: [] })],
      'bad.json',
    );
    const r = await readProjectFile(file);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.lines).toContain('loadCases: must have at least one load case');
  });

  it('shows that autosave failed when storage refuses the project, with a detail that is never blank', async () => {
    const { startAutosave } = await import('../state/autosave.js');
    const { memoryStore } = await import('../state/keyValue.js');
    // IndexedDB often rejects with a DOMException whose message is empty.
    for (const refusal of [new DOMException('', 'QuotaExceededError'), undefined, new Error('')]) {
      const store = createAppStore(route(), DN300);
      const actions = createActions(store);
      const kv = { ...memoryStore(), update: () => Promise.reject(refusal) };
      const autosave = startAutosave(store, {
        kv,
        channel: null,
        tab: 'a',
        base: 0,
        notify: actions.notify,
        adopt: actions.replaceProject,
        delayMs: 10,
      });
      actions.renameProject('Kestrel Way main');
      await act(async () => {
        await new Promise((r) => setTimeout(r, 60));
      });
      autosave.stop();
      expect(store.getState().notice?.title).toMatch(/^Autosave failed/);
      const detail = store.getState().notice?.lines[0] ?? '';
      expect(detail.trim().length).toBeGreaterThan(20);
      if (refusal instanceof DOMException)
        expect(detail).toMatch(/QuotaExceededError: the browser’s storage for this site is full/);
      expect(store.getState().notice?.actions?.map((a) => a.label)).toContain('Save to a file');
    }
  });
});
