/**
 * The least and greatest of a list of numbers, by a loop. `Math.min(...list)` passes every element as
 * an argument and throws RangeError past about 125,000 of them: a long route's levels, or its
 * pressures over many cases, reach that.
 */
export function extentOf(values: Iterable<number>): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}
