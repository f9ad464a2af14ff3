import { pathText, type Problem } from './problems.js';

/**
 * Below this magnitude (SI units) a nonzero number is no measurement of a water main: a flow of one drop
 * a year is about 2e-15 m³/s. Such values (a pressure of 1e-100 Pa) come from a slip or a damaged file,
 * and their squares underflow to zero inside the momentum balance.
 */
export const SMALLEST_VALUE = 1e-30;

/** One problem per nonzero number in the project smaller than SMALLEST_VALUE, naming its field. */
export function tinyNumberProblems(value: unknown, path: (string | number)[] = []): Problem[] {
  if (typeof value === 'number') {
    return value !== 0 && Math.abs(value) < SMALLEST_VALUE
      ? [
          {
            path: pathText(path),
            message: `${value} is too small to be a real value (nonzero numbers below ${SMALLEST_VALUE} in SI units are refused); write 0 or check the unit`,
          },
        ]
      : [];
  }
  if (Array.isArray(value)) return value.flatMap((v, i) => tinyNumberProblems(v, [...path, i]));
  if (value !== null && typeof value === 'object')
    return Object.entries(value).flatMap(([k, v]) => tinyNumberProblems(v, [...path, k]));
  return [];
}
