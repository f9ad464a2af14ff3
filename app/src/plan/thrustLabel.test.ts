import { describe, it, expect } from 'vitest';
import { thrustLabel } from './thrustLabel.js';

describe('the thrust label on the plan', () => {
  it('gives the horizontal and the vertical part where both matter', () => {
    expect(thrustLabel(54_700, 1_000, 'si')).toBe('54.7 kN'); // 1.8 % of the thrust: left out
    // The schedule's force precision (columnUnits.ts): kN to 0.1, kip to 0.01.
    expect(thrustLabel(40_600, 2_030, 'si')).toBe('40.6 kN  ↑ 2.0 kN');
    expect(thrustLabel(30_000, -20_000, 'si')).toBe('30.0 kN  ↓ 20.0 kN');
  });

  it('leaves out a part that is only noise of the other: a crest straight in plan reads as its uplift', () => {
    expect(thrustLabel(0.805, 40_600, 'si')).toBe('↑ 40.6 kN');
    expect(thrustLabel(0, 15_000, 'si')).toBe('↑ 15.0 kN');
    expect(thrustLabel(0, -15_000, 'si')).toBe('↓ 15.0 kN');
  });
});
