import { expect } from 'vitest';

/** Asserts |actual − expected| ≤ rel·|expected| (+ abs): the one tolerance rule of the tests. */
export function expectClose(actual: number, expected: number, rel = 1e-4, abs = 1e-9): void {
  const tol = rel * Math.abs(expected) + abs;
  if (!(Math.abs(actual - expected) <= tol)) {
    expect.fail(`expected ${actual} to be within ${tol} of ${expected}`);
  }
}

/** Component-wise expectClose on vectors; abs tolerance scaled to the expected vector's size. */
export function expectVecClose(actual: readonly number[], expected: readonly number[], rel = 1e-4): void {
  const size = Math.hypot(...expected);
  expected.forEach((e, i) => expectClose(actual[i]!, e, 0, rel * size + 1e-9));
}

/** Published values printed to a whole number: within one unit of the last printed digit. */
export function expectPrinted(actual: number, printed: number, unit = 1): void {
  expectClose(actual, printed, 0, unit);
}
