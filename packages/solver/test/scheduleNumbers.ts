import fc from 'fast-check';

/**
 * Numbers of the sizes a schedule carries, for the JSON number writers' property tests: a mantissa in
 * [−1, 1] times 10^−8 … 10^16, so that every digit count and exponent form JSON.stringify uses comes up.
 */
export const scheduleSizedNumbers = fc
  .tuple(fc.double({ min: -1, max: 1, noNaN: true }), fc.integer({ min: -8, max: 16 }))
  .map(([m, e]) => m * 10 ** e);
