import { describe, it, expect } from 'vitest';
import { readsZero } from './columnUnits.js';
import { KIP } from '../units/conversions.js';

// The force column's precision (columnUnits.ts): kN to 0.1 in SI, kip to 0.01 in US units. By hand:
// 40 N = 0.04 kN → "0.0"; 60 N = 0.06 kN → "0.1"; 0.004 kip → "0.00"; 0.006 kip → "0.01".
describe('a value that reads as zero in its column', () => {
  it('is one that rounds to nothing at the column’s precision, in either unit system', () => {
    expect(readsZero(40, 'force', 'si')).toBe(true);
    expect(readsZero(60, 'force', 'si')).toBe(false);
    expect(readsZero(0.004 * KIP, 'force', 'us')).toBe(true);
    expect(readsZero(0.006 * KIP, 'force', 'us')).toBe(false);
  });

  it('takes in the leftovers of a sum that nearly cancels, and zero itself', () => {
    expect(readsZero(2.32e-8, 'force', 'si')).toBe(true);
    expect(readsZero(0, 'force', 'us')).toBe(true);
  });
});
