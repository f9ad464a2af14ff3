import { describe, it, expect, afterEach } from 'vitest';
import { render, cleanup } from '@testing-library/react';
import { columnUnit, horizontalNorm, type UnitSystem } from '@mainbrace/solver';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { resultsOf } from '../state/results.js';
import { FittingResults } from './FittingResults.js';
import { thrustLabel } from '../plan/thrustLabel.js';
import { demoProject, DN300 } from '../testFixtures.js';
import { scheduleViewOf } from '../state/scheduleViewOf.js';

afterEach(cleanup);

const demo = demoProject;

/**
 * Invariant: a quantity the schedule has a column for reads the same in the fitting's panel and on the
 * plan as in the schedule (and so the CSV, the print and the CLI, which share its cells): one unit, one
 * precision, thousands written the same way.
 */
describe('the panel and the plan give a fitting’s figures as the schedule does', () => {
  for (const units of ['si', 'us'] as UnitSystem[]) {
    it(`for every fitting of the demo in ${units.toUpperCase()}`, () => {
      const project = { ...demo(), units };
      const store = createAppStore(project, DN300);
      store.setState({ units });
      const analysis = resultsOf(store.getState().project);
      const view = scheduleViewOf(analysis, units);
      const withUnit = (cell: string, kind: 'chainage' | 'pressure' | 'force') => `${cell} ${columnUnit(kind, units)}`;
      for (const [i, f] of analysis.fittings.entries()) {
        const cells = view.rows[i]!.cells;
        const { container } = render(
          <StoreProvider store={store} actions={createActions(store)}>
            <FittingResults fitting={f} project={store.getState().project} />
          </StoreProvider>,
        );
        const fact = (name: string) =>
          [...container.querySelectorAll('dl.facts dt')].find((dt) => dt.textContent === name)!.nextElementSibling!
            .textContent;
        expect(fact('Chainage'), f.mark).toBe(withUnit(cells.chainage!, 'chainage'));
        expect(fact('Design pressure'), f.mark).toBe(withUnit(cells.pressure!, 'pressure'));
        const thrust = container.querySelector('[data-testid=governing-thrust]')!.textContent!;
        if (cells.horizontal !== '' && Number(cells.horizontal) > 0)
          expect(thrust, f.mark).toContain(`horizontal ${withUnit(cells.horizontal!, 'force')}`);
        if (cells.upward) expect(thrust, f.mark).toContain(`upward ${withUnit(cells.upward, 'force')}`);
        if (cells.downward) expect(thrust, f.mark).toContain(`downward ${withUnit(cells.downward, 'force')}`);
        // The governing case's column of the panel's case table: its pressure is the design pressure.
        const governing = [...container.querySelectorAll('.cases-table tbody tr')].map(
          (tr) => tr.querySelector('td.governing')?.textContent,
        );
        expect(governing[0], f.mark).toBe(cells.pressure);
        // The plan's label of the governing thrust (planScene.ts): each part it shows is the schedule's cell.
        const total = f.envelope.governing.total;
        for (const part of thrustLabel(horizontalNorm(total), total[2], units).split('  ').filter(Boolean)) {
          const expected = part.startsWith('↑')
            ? `↑ ${withUnit(cells.upward!, 'force')}`
            : part.startsWith('↓')
              ? `↓ ${withUnit(cells.downward!, 'force')}`
              : withUnit(cells.horizontal!, 'force');
          expect(part, f.mark).toBe(expected);
        }
        cleanup();
      }
    }, 30_000); // one panel per fitting, sketch and all
  }
});
