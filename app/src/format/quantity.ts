import { formatSi, fromDisplay, toDisplay, unitSymbol, type Dimension, type UnitSystem } from '@mainbrace/solver';

/** An SI value as the user reads it: number and unit in the chosen system. */
export const show = (si: number, dim: Dimension, units: UnitSystem, significant = 3): string => formatSi(si, dim, units, significant);

/** The unit symbol of a dimension in the chosen system. */
export const unitOf = (dim: Dimension, units: UnitSystem): string => unitSymbol(dim, units);

/** A value in display units for an input field, with as many digits as the user is likely to have typed. */
export function editable(si: number, dim: Dimension, units: UnitSystem): string {
  const v = toDisplay(si, dim, units);
  return String(Math.round(v * 10000) / 10000);
}

/** Text typed in display units → SI, or a message saying what was expected. Accepts 1,234.5 and spaces. */
export function parseTyped(text: string, dim: Dimension, units: UnitSystem): { ok: true; si: number } | { ok: false; message: string } {
  const cleaned = text.replace(/[\s,]/g, '');
  if (cleaned === '' || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(cleaned)) {
    return { ok: false, message: `expected a number in ${unitOf(dim, units) || 'plain units'}` };
  }
  return { ok: true, si: fromDisplay(Number(cleaned), dim, units) };
}
