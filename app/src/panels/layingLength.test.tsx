import { describe, it, expect, afterEach } from 'vitest';
import { render, cleanup } from '@testing-library/react';
import { type UnitSystem } from '@mainbrace/solver';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { resultsOf } from '../state/results.js';
import { FittingResults } from './FittingResults.js';
import { demoProject, DN300 } from '../testFixtures.js';

afterEach(cleanup);

const project = demoProject();

describe('the laying length reads the same in the panel’s words and its sketch', () => {
  // The demo's 6 m pipes: 6 / 0.3048 = 19.685 ft, a length along the line shown to the tenth as the
  // chainage column shows one (columnUnits.ts): 19.7 ft; in SI 6.0 m.
  for (const [units, length] of [
    ['us', '19.7 ft'],
    ['si', '6.0 m'],
  ] as [UnitSystem, string][]) {
    it(`at A13, held by restrained joints, in ${units.toUpperCase()}: ${length}`, () => {
      expect(project.design.layingLength).toBe(6);
      const store = createAppStore({ ...project, units }, DN300);
      store.setState({ units });
      // The panel's own analysis: its sketch is drawn from that analysis's row.
      const doc = store.getState().project;
      const a = resultsOf(doc);
      const f = a.fittings.find((x) => x.mark === 'A13')!;
      expect(f.restraint.restrainedLegs.length).toBeGreaterThan(0);
      const { container } = render(
        <StoreProvider store={store} actions={createActions(store)}>
          <FittingResults fitting={f} project={doc} />
        </StoreProvider>,
      );
      const legs = [...container.querySelectorAll('[data-testid=restrained]')].map((li) => li.textContent!);
      expect(legs).toHaveLength(f.restraint.restrainedLegs.length);
      for (const l of legs) expect(l).toContain(`at ${length} laying length`);
      const sketch = [...container.querySelectorAll('[data-testid=sketch-A13] .sketch-lines li')].map(
        (li) => li.textContent!,
      );
      expect(sketch.join(' / ')).toContain(`: ${length} pipes, the first joint at the fitting`);
    });
  }
});
