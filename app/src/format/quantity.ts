import {
  formatNumber,
  formatSi,
  fromDisplay,
  KIP,
  toDisplay,
  unitSymbol,
  type Dimension,
  type UnitSystem,
} from '@mainbrace/solver';

/** An SI value as the user reads it: number and unit in the chosen system. */
export const show = (si: number, dim: Dimension, units: UnitSystem, significant = 3): string =>
  formatSi(si, dim, units, significant);

/** A force in a table column: kN, or kip in US units, so that one column never mixes lbf and kip. */
export const showColumnForce = (si: number, units: UnitSystem): string =>
  units === 'us' ? `${formatNumber(si / KIP)} kip` : formatSi(si, 'force', 'si');

/** The unit symbol of a dimension in the chosen system. */
export const unitOf = (dim: Dimension, units: UnitSystem): string => unitSymbol(dim, units);

/** A value in display units for an input field, with as many digits as the user is likely to have typed. */
export function editable(si: number, dim: Dimension, units: UnitSystem): string {
  const v = toDisplay(si, dim, units);
  return String(Math.round(v * 10000) / 10000);
}

/** Feet and inches as a site engineer writes them: 4'6", 4' 6, 4 ft 6 in, 4 ft. */
const FEET_INCHES = /^([-+]?\d+(?:\.\d+)?)\s*(?:'|ft)\s*(?:(\d+(?:\.\d+)?)\s*(?:"|in)?)?$/i;

/**
 * Text typed in display units → SI, or a message saying what was expected. Accepts 1,234.5 (commas
 * grouping thousands), a decimal comma where it cannot be a thousands group (1,5 = 1.5), and feet and
 * inches for US lengths. An ambiguous comma is refused rather than guessed.
 */
export function parseTyped(
  text: string,
  dim: Dimension,
  units: UnitSystem,
): { ok: true; si: number } | { ok: false; message: string } {
  const trimmed = text.trim();
  const expected = `expected a number in ${unitOf(dim, units) || 'plain units'}`;
  const fi = units === 'us' && (dim === 'length' || dim === 'elevation') ? FEET_INCHES.exec(trimmed) : null;
  if (fi) {
    const feet = Number(fi[1]);
    const inches = Number(fi[2] ?? 0);
    return { ok: true, si: (feet + (Math.sign(feet || 1) * inches) / 12) * 0.3048 };
  }
  let cleaned = trimmed.replace(/\s/g, '');
  if (/^[-+]?\d{1,3}(,\d{3})+(\.\d*)?$/.test(cleaned)) cleaned = cleaned.replace(/,/g, '');
  else if (/^[-+]?\d+,\d+$/.test(cleaned) && !/^[-+]?\d+,\d{3}$/.test(cleaned)) cleaned = cleaned.replace(',', '.');
  else if (cleaned.includes(','))
    return {
      ok: false,
      message: `${expected}; write decimals with a point (1.5), or commas only between thousands (1,500)`,
    };
  if (cleaned === '' || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(cleaned)) return { ok: false, message: expected };
  return { ok: true, si: fromDisplay(Number(cleaned), dim, units) };
}
