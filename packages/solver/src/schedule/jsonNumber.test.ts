import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { ceilTo, roundTo } from '../units/format.js';
import { decimalText } from './jsonNumber.js';
import { scheduleSizedNumbers } from '../../test/scheduleNumbers.js';

/** What the schedule wrote before: the rounded number through JSON.stringify. */
const reference = (x: number) => JSON.stringify(x);

describe('decimalText writes a rounded number as JSON.stringify does', () => {
  it('for any double rounded or rounded up to 0–6 decimals (fast-check, fixed seed)', () => {
    fc.assert(
      fc.property(fc.double(), fc.integer({ min: 0, max: 6 }), (v, d) => {
        for (const x of [roundTo(v, d), ceilTo(v, d)]) expect(decimalText(x, d)).toBe(reference(x));
      }),
      { seed: 20261203, numRuns: 20000 },
    );
  });

  it('for values of the sizes a schedule carries (fast-check, fixed seed)', () => {
    fc.assert(
      fc.property(scheduleSizedNumbers, fc.integer({ min: 0, max: 6 }), (v, d) => {
        for (const x of [roundTo(v, d), ceilTo(v, d)]) expect(decimalText(x, d)).toBe(reference(x));
      }),
      { seed: 20261203, numRuns: 50000 },
    );
  });

  it('at the edges: zero and minus zero, trailing zeros, the 15-digit bound, exponents, non-finite values', () => {
    const cases: [number, number][] = [
      [0, 3],
      [-0, 3],
      [-0, 0],
      [roundTo(-0.0004, 3), 3], // rounds to -0
      [0.5, 6],
      [0.000001, 6],
      [-0.000001, 6],
      [1.1, 1],
      [-2.25, 4],
      [123456789012.345, 3],
      [999999999999.999, 3],
      [1e15, 0],
      [123456789012345.6, 1],
      [1e21, 0],
      [-1e22, 3],
      [0.1 + 0.2, 3],
      [NaN, 3],
      [Infinity, 1],
      [-Infinity, 0],
    ];
    for (const [x, d] of cases) expect(decimalText(x, d), `${x} at ${d}`).toBe(reference(x));
    // JSON.stringify writes NaN and the infinities as null.
    expect(decimalText(NaN, 3)).toBe('null');
    expect(decimalText(-0, 3)).toBe('0');
    expect(decimalText(2.5, 3)).toBe('2.5');
  });
});
