import { CUBIC_YARD, FOOT, INCH, KIP, PSI, type UnitSystem } from '../units/conversions.js';
import { ceilTo, feetAndInches, formatDimension, roundTo, shownDimension } from '../units/format.js';

/**
 * The kinds of quantity a schedule column holds. Each has one unit and one precision per unit system
 * (screens.md: one unit per column), and built quantities round up.
 */
export type ColumnKind =
  | 'chainage'
  | 'coordinate'
  | 'level'
  | 'diameter'
  | 'angle'
  | 'pressure'
  | 'force'
  | 'area'
  | 'built'
  | 'topDepth'
  | 'baseDepth'
  | 'volume'
  | 'restrained'
  | 'text';

/** Which way a shown value rounds: to nearest, up (never less than computed) or down. */
type Rounding = 'nearest' | 'up' | 'down';

interface Display {
  symbol: string;
  /** SI value of one display unit */
  factor: number;
  decimals: number;
  round: Rounding;
}

const d = (symbol: string, factor: number, decimals: number, round: Rounding = 'nearest'): Display => ({
  symbol,
  factor,
  decimals,
  round,
});

/** Kinds written as a crew reads a length: feet and inches in US units ("4 ft 7 in"). */
type DimensionKind = 'built' | 'topDepth' | 'baseDepth';
/** Kinds written as a plain number in their unit. */
type NumberKind = Exclude<ColumnKind, 'text' | DimensionKind>;

/** Whether a kind's cells are feet-and-inches text in US units rather than a plain number. */
export const isDimensionKind = (kind: ColumnKind): kind is DimensionKind =>
  kind === 'built' || kind === 'topDepth' || kind === 'baseDepth';

/**
 * Units and precision of each numeric column kind ('built' is formatted by `formatDimension`).
 *
 * Depths below ground are the levels a crew sets out and digs to, to the centimetre or the inch. They
 * round so that the concrete built holds the concrete designed: the base down into the ground (the
 * crew digs at least as deep as designed) and the top up toward it. A block's top is printed as its
 * base less its printed height (`blockTopShown`), so a rounded top never cuts the face short.
 */
export const COLUMN_UNITS: Record<Exclude<ColumnKind, 'text'>, Record<UnitSystem, Display>> = {
  chainage: { si: d('m', 1, 1), us: d('ft', FOOT, 1) },
  coordinate: { si: d('m', 1, 2), us: d('ft', FOOT, 2) },
  level: { si: d('m', 1, 2), us: d('ft', FOOT, 2) },
  diameter: { si: d('mm', 1e-3, 0), us: d('in', INCH, 2) },
  angle: { si: d('°', 1, 2), us: d('°', 1, 2) },
  pressure: { si: d('kPa', 1e3, 0), us: d('psi', PSI, 1) },
  force: { si: d('kN', 1e3, 1), us: d('kip', KIP, 2) },
  area: { si: d('m²', 1, 2), us: d('ft²', FOOT * FOOT, 1) },
  built: { si: d('m', 1, 2, 'up'), us: d('ft-in', FOOT, 0, 'up') },
  topDepth: { si: d('m', 1, 2, 'down'), us: d('ft-in', INCH, 0, 'down') },
  baseDepth: { si: d('m', 1, 2, 'up'), us: d('ft-in', INCH, 0, 'up') },
  volume: { si: d('m³', 1, 2, 'up'), us: d('yd³', CUBIC_YARD, 2, 'up') },
  restrained: { si: d('m', 1, 1, 'up'), us: d('ft', FOOT, 0, 'up') },
};

/** Trailing zeros after the point dropped for angles: 22.5, 11.25, 90. */
const trim = (text: string) => (text.includes('.') ? text.replace(/\.?0+$/, '') : text);

/** `si` in the column's display unit, rounded as the column shows it (built quantities up). */
function displayed(si: number, kind: Exclude<ColumnKind, 'text' | 'built'>, units: UnitSystem): number {
  const u = COLUMN_UNITS[kind][units];
  const shown = si / u.factor;
  if (u.round === 'up') return ceilTo(shown, u.decimals);
  return u.round === 'down' ? -ceilTo(-shown, u.decimals) : roundTo(shown, u.decimals);
}

/**
 * A depth below ground as every output writes it ("1.41", "4 ft 7 in"): rounded as `COLUMN_UNITS`
 * says for its kind. Never above the ground: concrete is not set there, and the finding on a block
 * taller than the cover allows says why.
 */
function depthNumber(si: number, kind: 'topDepth' | 'baseDepth', units: UnitSystem): string {
  const shown = Math.max(0, displayed(si, kind, units));
  return units === 'us' ? feetAndInches(shown) : shown.toFixed(COLUMN_UNITS[kind].si.decimals);
}

/**
 * m, a bearing block's top below ground as every output prints it: its printed base less its printed
 * height, so that the three figures a crew reads add up (rounded apart, a 2 ft 10 in face could read
 * top 2 ft 10 in, base 5 ft 9 in). The base still rounds deeper and the face taller than designed.
 */
export const blockTopShown = (b: { baseDepth: number; faceHeight: number }, units: UnitSystem): number =>
  displayed(b.baseDepth, 'baseDepth', units) * COLUMN_UNITS.baseDepth[units].factor -
  shownDimension(b.faceHeight, units);

/** An SI value as a column shows it: the number only, its unit is in the column heading. */
export function columnNumber(si: number, kind: Exclude<ColumnKind, 'text'>, units: UnitSystem): string {
  if (!Number.isFinite(si)) return '—';
  if (kind === 'built') return formatDimension(si, units).replace(/ m$/, '');
  if (kind === 'topDepth' || kind === 'baseDepth') return depthNumber(si, kind, units);
  const text = displayed(si, kind, units).toFixed(COLUMN_UNITS[kind][units].decimals);
  const clean = /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
  return kind === 'angle' ? trim(clean) : clean;
}

/**
 * The SI value a column shows for `si`, rounded as it shows it (built quantities up): totals add these,
 * so that a total is the sum of what its rows print.
 */
export const shownValue = (si: number, kind: NumberKind, units: UnitSystem): number =>
  displayed(si, kind, units) * COLUMN_UNITS[kind][units].factor;

/**
 * Whether a value reads as zero in its column (0.04 kN is "0.0"): a part of a result that small is left
 * out rather than listed as nothing, whichever screen or file words it.
 */
export const readsZero = (si: number, kind: NumberKind, units: UnitSystem): boolean => displayed(si, kind, units) === 0;

/** A column's unit as its heading shows it: "kN", "ft-in". */
export const columnUnit = (kind: Exclude<ColumnKind, 'text'>, units: UnitSystem): string =>
  COLUMN_UNITS[kind][units].symbol;

/** A value with its unit, as running text uses it: "12.5 m", "2 ft 4 in", "45°". */
export function quantityText(si: number, kind: Exclude<ColumnKind, 'text'>, units: UnitSystem): string {
  if (kind === 'built') return formatDimension(si, units);
  const n = columnNumber(si, kind, units);
  if (isDimensionKind(kind)) return units === 'us' ? n : `${n} m`;
  const unit = columnUnit(kind, units);
  return kind === 'angle' ? `${n}${unit}` : `${n} ${unit}`;
}
