import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { WORDING } from '../diagnostics/codeMeanings.js';
import { demoInput, validProject } from '../../test/projectBuilder.js';
import { scheduleView } from './scheduleView.js';
import { formatDimension } from '../units/format.js';
import type { UnitSystem } from '../units/conversions.js';

/** "5 ft 9 in", "2 ft", "7 in" → inches; "1.92" → metres × 100 (centimetres), as printed. */
const units = (text: string, system: UnitSystem): number => {
  if (system === 'si') return Math.round(parseFloat(text) * 100);
  const ft = /(\d+) ft/.exec(text)?.[1] ?? '0';
  const inch = /(\d+) in/.exec(text)?.[1] ?? '0';
  return Number(ft) * 12 + Number(inch);
};

describe('a block’s printed top, height and base add up (a crew checks the sum)', () => {
  const a = analyse(validProject(demoInput()));
  for (const system of ['si', 'us'] as const)
    it(`every block of the demo in ${system.toUpperCase()}: top + height = base, base no shallower than designed`, () => {
      const rows = scheduleView(a, system, WORDING).rows.filter((r) => r.fitting.restraint.block);
      expect(rows.length).toBeGreaterThan(5);
      for (const r of rows) {
        const b = r.fitting.restraint.block!;
        const top = units(r.cells.blockTop!, system);
        const base = units(r.cells.blockBase!, system);
        const height = units(formatDimension(b.faceHeight, system), system);
        expect(top + height, `${r.fitting.mark}: ${r.cells.blockTop} + ${b.faceHeight} m`).toBe(base);
        // the SI value behind the base cell is the designed depth: the printed one is no shallower
        expect(base).toBeGreaterThanOrEqual(r.values.blockBase! / (system === 'si' ? 0.01 : 0.0254) - 1e-6);
      }
    });
});
