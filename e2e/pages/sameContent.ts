/**
 * Where two JSON values differ: same keys, same texts, same booleans and nulls, numbers equal to a
 * relative 1e-12 or an absolute 1e-9 (floating-point noise between JavaScript engines; differences of near-equal angles). Returns the paths that differ.
 */
export function sameContent(a: unknown, b: unknown, path = '$'): string[] {
  if (typeof a === 'number' && typeof b === 'number') {
    return Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b)) + 1e-9 ? [] : [`${path}: ${a} ≠ ${b}`];
  }
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) return [`${path}: ${a.length} items ≠ ${b.length} items`];
    return a.flatMap((x, i) => sameContent(x, b[i], `${path}[${i}]`));
  }
  if (a && b && typeof a === 'object' && typeof b === 'object') {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    return [...keys].flatMap((k) =>
      k in a && k in b
        ? sameContent((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], `${path}.${k}`)
        : [`${path}.${k}: only on one side`],
    );
  }
  return a === b ? [] : [`${path}: ${JSON.stringify(a)} ≠ ${JSON.stringify(b)}`];
}
