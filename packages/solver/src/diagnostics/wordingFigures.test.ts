import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { demoInput, validProject } from '../../test/projectBuilder.js';
import { scheduleView } from '../schedule/scheduleView.js';
import { WORDING } from './codeMeanings.js';

describe('a note’s forces and pressures read as the schedule’s columns give them', () => {
  // Invariant: the demo's valve (A10), closed with the same pressure on either side, reverses its thrust
  // by as much as it pushes: its note's figure is its row's horizontal-thrust cell, in each unit system.
  for (const units of ['si', 'us'] as const) {
    it(`in ${units.toUpperCase()}`, () => {
      const view = scheduleView(analyse(validProject(demoInput())), units, WORDING);
      const reverse = view.notes.find((n) => n.code === 'block.thrust-reverses');
      expect(reverse).toBeDefined();
      const row = view.rows.find((r) => r.fitting.mark === 'A10')!;
      const unit = units === 'si' ? 'kN' : 'kip';
      expect(reverse!.text).toContain(`${row.cells.horizontal} ${unit}`);
      // no thousands separators in a note's figures, as in the columns
      for (const n of view.notes) expect(n.text).not.toMatch(/\d,\d{3}\s*(kPa|psi|kN|kip|lbf)/);
    });
  }
});
