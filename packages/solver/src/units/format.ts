import { DISPLAY_UNITS, KIP, type Dimension, type UnitSystem } from './conversions.js';

/**
 * Rounds to the figures an engineer writes on a drawing: three significant figures, but never
 * fewer digits than the integer part (12,345 lbf stays 12,345, not 12,300).
 */
export function roundForDrawing(value: number, significant = 3): number {
  if (!Number.isFinite(value) || value === 0) return value === 0 ? 0 : value;
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  const decimals = Math.max(0, significant - 1 - magnitude);
  const f = Math.pow(10, decimals);
  return Math.round(value * f) / f;
}

/** Number of decimals `roundForDrawing` keeps for this value. */
function decimalsFor(value: number, significant: number): number {
  if (!Number.isFinite(value) || value === 0) return 0;
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  return Math.max(0, significant - 1 - magnitude);
}

/** Thousands separators on the integer part: "29030.5" → "29,030.5" (no Intl: it is slow to start). */
function groupThousands(fixed: string): string {
  const negative = fixed.startsWith('-');
  const body = negative ? fixed.slice(1) : fixed;
  const dot = body.indexOf('.');
  const int = dot < 0 ? body : body.slice(0, dot);
  const frac = dot < 0 ? '' : body.slice(dot);
  const grouped = int.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return (negative ? '-' : '') + grouped + frac;
}

/** More decimals than this are written in powers of ten (toFixed throws beyond 100; no drawing needs 20). */
const MAX_FIXED_DECIMALS = 20;

/**
 * Plain number with thousands separators and drawing precision, e.g. 29,030 or 0.765. Never throws:
 * a value too small for fixed decimals (1e-100) reads 1.00e-100, never 0, so a unit slip stays visible.
 */
export function formatNumber(value: number, significant = 3): string {
  if (!Number.isFinite(value)) return '—';
  if (decimalsFor(value, significant) > MAX_FIXED_DECIMALS) return value.toPrecision(significant);
  const rounded = roundForDrawing(value, significant);
  const text = groupThousands(rounded.toFixed(decimalsFor(rounded, significant)));
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

export interface FormattedQuantity {
  value: string;
  unit: string;
  text: string;
}

/**
 * SI value → "number unit" in the chosen system. Forces above 10,000 lbf read as kip (screens.md).
 */
export function formatQuantity(si: number, dim: Dimension, system: UnitSystem, significant = 3): FormattedQuantity {
  let { symbol, factor } = DISPLAY_UNITS[system][dim];
  if (system === 'us' && dim === 'force' && Math.abs(si / factor) >= 10_000) {
    symbol = 'kip';
    factor = KIP;
  }
  // Angles read as an engineer writes them: 22.5°, 11.25°, 0.19° — two decimals at most.
  const value =
    dim === 'angle' ? String(Math.round((si / factor) * 100) / 100) : formatNumber(si / factor, significant);
  const joined = dim === 'angle' || symbol === '' ? `${value}${symbol}` : `${value} ${symbol}`;
  return { value, unit: symbol, text: joined };
}

export const formatSi = (si: number, dim: Dimension, system: UnitSystem, significant = 3) =>
  formatQuantity(si, dim, system, significant).text;

/**
 * Rounds up to `decimals` places: a built quantity shown on a drawing is never less than what was
 * computed. A relative slack of 1e-9 keeps 0.7000000000000001 at 0.70 instead of 0.71.
 */
export function ceilTo(value: number, decimals: number): number {
  const f = Math.pow(10, decimals);
  const scaled = value * f;
  const near = Math.round(scaled);
  const k = Math.abs(scaled - near) <= 1e-9 * Math.max(1, Math.abs(scaled)) ? near : Math.ceil(scaled);
  return k / f;
}

/** Rounds to `decimals` places, to nearest. */
export const roundTo = (value: number, decimals: number): number => {
  const f = Math.pow(10, decimals);
  return Math.round(value * f) / f;
};

/** Whole inches of a built length, rounded up. */
export const builtInches = (meters: number): number => ceilTo(meters / 0.0254, 0);

/** The SI built dimension as shown: to the centimetre, or the millimetre where the centimetre adds more. */
function builtMetres(meters: number): { value: number; decimals: 2 | 3 } {
  const mm = ceilTo(meters, 3);
  const cm = ceilTo(meters, 2);
  return cm - mm < 1e-9 ? { value: cm, decimals: 2 } : { value: mm, decimals: 3 };
}

/**
 * A built dimension as a crew reads it, rounded up so that it is never less than computed: metres to
 * the centimetre (to the millimetre where the centimetre would add more than a millimetre's worth) in
 * SI (0.75 m), feet and inches to the inch in US customary (2 ft 2 in).
 */
export function formatDimension(meters: number, system: UnitSystem): string {
  if (!Number.isFinite(meters)) return '—';
  if (system === 'si') {
    const { value, decimals } = builtMetres(meters);
    return `${value.toFixed(decimals)} m`;
  }
  return feetAndInches(builtInches(meters));
}

/** m, the built dimension as formatDimension shows it (so that an area worked from it is the one built). */
export const shownDimension = (meters: number, system: UnitSystem): number =>
  system === 'si' ? builtMetres(meters).value : builtInches(meters) * 0.0254;

/** Whole inches as a crew reads them: "7 in", "2 ft", "4 ft 7 in". */
export function feetAndInches(inches: number): string {
  const feet = Math.floor(inches / 12);
  const rest = inches - feet * 12;
  if (feet === 0) return `${rest} in`;
  return rest === 0 ? `${feet} ft` : `${feet} ft ${rest} in`;
}
