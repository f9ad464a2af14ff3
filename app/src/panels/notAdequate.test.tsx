import { describe, it, expect, afterEach } from 'vitest';
import { render, cleanup } from '@testing-library/react';
import { analyse, parseProject, type Project } from '@mainbrace/solver';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { ScheduleTable } from './ScheduleTable.js';
import { FittingResults } from './FittingResults.js';
import { chain, DN300 } from '../testFixtures.js';

afterEach(cleanup);

/**
 * A 90° bend on PVC asked to be held by restrained joints: the app sizes joint lengths for ductile iron
 * only, so nothing holds this fitting and its findings carry an error (the invariant these screens
 * must show, whatever the figures).
 */
function pvcJoints(): Project {
  const base = chain([0, 0], [100, 0], [100, 60]);
  const r = parseProject({
    ...base,
    pipes: base.pipes.map((p) => ({ ...p, material: 'pvc' })),
    nodes: base.nodes.map((n) => (n.id === 'n2' ? { ...n, restraint: 'joints' } : n)),
  });
  if (!r.ok) throw new Error(r.problems.map((p) => p.message).join('; '));
  return r.project;
}

describe('a fitting nothing holds is flagged, never "none needed"', () => {
  const project = pvcJoints();
  const f = analyse(project).byNode.get('n2')!;

  it('the case holds: an error among the bend’s findings', () => {
    expect(f.diagnostics.some((d) => d.severity === 'error')).toBe(true);
  });

  it('the fitting’s panel says NOT ADEQUATE where it listed "None needed."', () => {
    const store = createAppStore(project, DN300);
    const { container } = render(
      <StoreProvider store={store} actions={createActions(store)}>
        <FittingResults fitting={f} project={project} />
      </StoreProvider>,
    );
    const list = container.querySelector('ul.restraint')!;
    expect(list.textContent).not.toContain('None needed');
    expect(list.querySelector('[data-testid=not-adequate]')?.textContent).toMatch(/^NOT ADEQUATE/);
  });

  it('the schedule marks the row and heads its note NOT ADEQUATE', () => {
    const store = createAppStore(project, DN300);
    const { container } = render(
      <StoreProvider store={store} actions={createActions(store)}>
        <ScheduleTable />
      </StoreProvider>,
    );
    const row = container.querySelector('[data-testid=row-n2]')!;
    expect(row.classList.contains('not-adequate')).toBe(true);
    expect(row.querySelector('td.mark')?.textContent).toContain('not adequate');
    // the restraint cell says so on its own (a black-and-white print, a filtered CSV), not "—"
    expect(row.querySelector('td[data-col=restraint]')?.textContent).toBe(
      'NOT ADEQUATE (see the notes): no restraint sized',
    );
    const notes = [...container.querySelectorAll('[data-testid=schedule-notes] li.note-error')];
    expect(notes.length).toBeGreaterThan(0);
    for (const n of notes) expect(n.textContent).toMatch(/^NOT ADEQUATE\. /);
  });
});
