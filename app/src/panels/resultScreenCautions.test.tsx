import { describe, it, expect, afterEach } from 'vitest';
import { render, cleanup } from '@testing-library/react';
import { createAppStore } from '../state/store.js';
import { createActions } from '../state/actions.js';
import { StoreProvider } from '../state/StoreContext.js';
import { ScheduleTable } from './ScheduleTable.js';
import { ProfilePanel } from './ProfilePanel.js';
import { SheetPanel } from './SheetPanel.js';
import { demoProject, DN300 } from '../testFixtures.js';

afterEach(cleanup);

/**
 * The five cautions every result screen carries (docs/project-format.md; the usual cautions of utility
 * specifications and the DIPRA thrust-restraint manual).
 */
const FIVE = [
  /design aid/i,
  /licensed engineer/i,
  /local codes.*utility’s standards/i,
  /undisturbed soil/i,
  /cure.*before/i,
];

describe('every result tab of the drawer carries the five cautions', () => {
  for (const [name, Panel] of [
    ['schedule', ScheduleTable],
    ['long section and pressures', ProfilePanel],
    ['sheet and quantities', SheetPanel],
  ] as const)
    it(name, () => {
      const store = createAppStore(demoProject(), DN300);
      const { container } = render(
        <StoreProvider store={store} actions={createActions(store)}>
          <Panel />
        </StoreProvider>,
      );
      const text = container.textContent ?? '';
      for (const c of FIVE) expect(text).toMatch(c);
    });
});
