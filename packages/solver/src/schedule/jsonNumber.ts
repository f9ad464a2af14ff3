/** 10^d for the decimals the JSON schedule keeps (0–6), exact. */
const POWERS = [1, 10, 100, 1000, 1e4, 1e5, 1e6, 1e7, 1e8];

/**
 * What JSON.stringify writes for `x`, a number already rounded to `decimals` places (roundTo, ceilTo:
 * k / 10^decimals for an integer k): its digits worked out from k, which is several times quicker in a
 * cold process than V8's shortest-digits search for a fraction (a 10,000-fitting schedule writes some
 * 700,000 numbers). Equal because a decimal of at most 15 significant digits is the shortest text that
 * reads back as the double nearest to it (IEEE 754 binary64 keeps 15 decimal digits: DBL_DIG); beyond
 * that, or for NaN, ±Infinity and more decimals, it falls back to String. A test holds the two equal.
 */
export function decimalText(x: number, decimals: number): string {
  const f = POWERS[decimals];
  if (f === undefined || !Number.isFinite(x)) return Number.isFinite(x) ? String(x) : 'null';
  const k = Math.round(x * f);
  if (!(Math.abs(k) < 1e15) || k / f !== x) return String(x);
  const negative = k < 0;
  const m = negative ? -k : k;
  const whole = Math.floor(m / f);
  let fraction = m - whole * f;
  // -0 is written 0, as JSON.stringify writes it.
  if (fraction === 0) return negative ? '-' + whole : whole === 0 ? '0' : String(whole);
  let p = f;
  while (fraction % 10 === 0) {
    fraction /= 10;
    p /= 10;
  }
  return (negative ? '-' : '') + whole + '.' + String(fraction + p).slice(1);
}
