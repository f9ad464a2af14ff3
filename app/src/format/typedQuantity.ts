import { DISPLAY_UNITS, fromDisplay, INCH, toDisplay, type Dimension, type UnitSystem } from '@mainbrace/solver';
import { unitOf } from './quantity.js';

// A value as typed into a field and back (NumberField, the plan's typed entry): apart from the
// display formats of quantity.ts, since no field is on the first screen (docs/performance.md).

/** Same value to a part in 10⁹: what a typed number comes back as after conversion to SI and back. */
const same = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b), 1e-12);

/**
 * A value in display units for an input field: the shortest number (up to 6 significant digits) that
 * is the stored value — so "2000" psf typed shows as 2000, not 2000.0000001 — else, for a value typed
 * in the other system, four significant figures (never fewer than the whole number): 4.921 ft, 89.92 psi.
 * Showing never changes what is stored: a field left unchanged is not written back (NumberField).
 */
export function editable(si: number, dim: Dimension, units: UnitSystem): string {
  const v = toDisplay(si, dim, units);
  if (v === 0 || !Number.isFinite(v)) return String(v);
  for (let digits = 1; digits <= 6; digits++) {
    const shown = Number(v.toPrecision(digits));
    if (same(fromDisplay(shown, dim, units), si)) return String(shown);
  }
  const whole = Math.floor(Math.log10(Math.abs(v))) + 1;
  const decimals = Math.min(12, Math.max(0, 4 - whole));
  return String(Number(v.toFixed(decimals)));
}

/** Feet and inches as a site engineer writes them: 4'6", 4' 6, 4 ft 6 in, 4 ft. */
const FEET_INCHES = /^([-+]?\d+(?:\.\d+)?)\s*(?:'|ft)\s*(?:(\d+(?:\.\d+)?)\s*(?:"|in)?)?$/i;

/**
 * Units a pressure or a soil's strength is often written in beside the shown ones: bar and MPa on a
 * gauge or a specification, ksf in a US soil report (1 bar = 10⁵ Pa, 1 MPa = 10⁶ Pa by definition; 1 ksf
 * = 1,000 psf).
 */
const ALSO: Partial<Record<Dimension, { symbol: string; factor: number }[]>> = {
  pressure: [
    { symbol: 'bar', factor: 1e5 },
    { symbol: 'MPa', factor: 1e6 },
  ],
  stress: [
    { symbol: 'MPa', factor: 1e6 },
    { symbol: 'ksf', factor: 1000 * DISPLAY_UNITS.us.stress.factor },
  ],
  length: [{ symbol: 'in', factor: INCH }],
  elevation: [{ symbol: 'in', factor: INCH }],
};

/** The units a value of `dim` may be typed in, whichever system is shown: both systems' own, and others in use. */
function unitsFor(dim: Dimension): { symbol: string; factor: number }[] {
  const own = [DISPLAY_UNITS.si[dim], DISPLAY_UNITS.us[dim]].filter((u) => u.symbol !== '');
  return [...own, ...(ALSO[dim] ?? [])];
}

/** A unit written after the number ("54 in", "150 psi"): the number's text and the unit, or null. */
function typedUnit(text: string, dim: Dimension): { number: string; factor: number } | null {
  for (const u of unitsFor(dim).sort((a, b) => b.symbol.length - a.symbol.length)) {
    const at = text.length - u.symbol.length;
    if (at > 0 && text.slice(at).toLowerCase() === u.symbol.toLowerCase() && /[\d.\s]$/.test(text.slice(0, at)))
      return { number: text.slice(0, at).trim(), factor: u.factor };
  }
  return null;
}

/**
 * Text typed in display units → SI, or a message saying what was expected. Accepts 1,234.5 (commas
 * grouping thousands), a decimal comma where it cannot be a thousands group (1,5 = 1.5), feet and
 * inches for US lengths, and a unit after the number in either system (54 in, 1.2 m, 150 psi). An
 * ambiguous comma is refused rather than guessed.
 */
export function parseTyped(
  text: string,
  dim: Dimension,
  units: UnitSystem,
): { ok: true; si: number } | { ok: false; message: string } {
  const trimmed = text.trim();
  const shown = unitOf(dim, units);
  const other = unitsFor(dim)
    .map((u) => u.symbol)
    .filter((u) => u !== shown);
  const expected = `expected a number in ${shown || 'plain units'}${other.length ? ` (or with its unit: ${other.join(', ')})` : ''}`;
  const fi = units === 'us' && (dim === 'length' || dim === 'elevation') ? FEET_INCHES.exec(trimmed) : null;
  if (fi) {
    const feet = Number(fi[1]);
    const inches = Number(fi[2] ?? 0);
    return { ok: true, si: (feet + (Math.sign(feet || 1) * inches) / 12) * 0.3048 };
  }
  const unit = typedUnit(trimmed, dim);
  let cleaned = (unit ? unit.number : trimmed).replace(/\s/g, '');
  if (/^[-+]?\d{1,3}(,\d{3})+(\.\d*)?$/.test(cleaned)) cleaned = cleaned.replace(/,/g, '');
  else if (/^[-+]?\d+,\d+$/.test(cleaned) && !/^[-+]?\d+,\d{3}$/.test(cleaned)) cleaned = cleaned.replace(',', '.');
  else if (cleaned.includes(','))
    return {
      ok: false,
      message: `${expected}; write decimals with a point (1.5), or commas only between thousands (1,500)`,
    };
  if (cleaned === '' || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(cleaned)) return { ok: false, message: expected };
  return { ok: true, si: unit ? Number(cleaned) * unit.factor : fromDisplay(Number(cleaned), dim, units) };
}
