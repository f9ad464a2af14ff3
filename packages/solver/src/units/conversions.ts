/**
 * Display-unit conversion factors to SI. Exact values are from NIST SP 811 (2008), Appendix B.8/B.9;
 * the inch and foot are exact by the 1959 international yard and pound agreement.
 */
export const INCH = 0.0254; // m, exact
export const FOOT = 0.3048; // m, exact
export const POUND_FORCE = 4.4482216152605; // N, exact (lbf = 0.45359237 kg × 9.80665 m/s²)
export const PSI = POUND_FORCE / (INCH * INCH); // Pa, 6894.757...
export const PSF = POUND_FORCE / (FOOT * FOOT); // Pa, 47.88026...
export const CUBIC_YARD = Math.pow(3 * FOOT, 3); // m³, 0.764554857984 exact
export const US_GALLON = 231 * Math.pow(INCH, 3); // m³, exact (231 in³)
export const POUND_PER_CUBIC_FOOT_WEIGHT = POUND_FORCE / Math.pow(FOOT, 3); // N/m³ for lbf/ft³
export const KIP = 1000 * POUND_FORCE; // N

export type UnitSystem = 'si' | 'us';

/** A physical dimension the app displays. */
export type Dimension =
  | 'length'
  | 'elevation'
  | 'diameter'
  | 'area'
  | 'volume'
  | 'force'
  | 'pressure'
  | 'stress'
  | 'unitWeight'
  | 'flow'
  | 'density'
  | 'angle'
  | 'velocity'
  | 'forcePerLength'
  | 'stressGradient'
  | 'ratio';

export interface DisplayUnit {
  /** symbol shown after the number */
  symbol: string;
  /** SI value of one display unit */
  factor: number;
}

/** One display unit per dimension and system; forces may switch to kip at format time. */
export const DISPLAY_UNITS: Record<UnitSystem, Record<Dimension, DisplayUnit>> = {
  si: {
    length: { symbol: 'm', factor: 1 },
    elevation: { symbol: 'm', factor: 1 },
    diameter: { symbol: 'mm', factor: 1e-3 },
    area: { symbol: 'm²', factor: 1 },
    volume: { symbol: 'm³', factor: 1 },
    force: { symbol: 'kN', factor: 1e3 },
    pressure: { symbol: 'kPa', factor: 1e3 },
    stress: { symbol: 'kPa', factor: 1e3 },
    unitWeight: { symbol: 'kN/m³', factor: 1e3 },
    flow: { symbol: 'L/s', factor: 1e-3 },
    density: { symbol: 'kg/m³', factor: 1 },
    angle: { symbol: '°', factor: 1 },
    velocity: { symbol: 'm/s', factor: 1 },
    forcePerLength: { symbol: 'kN/m', factor: 1e3 },
    stressGradient: { symbol: 'kPa/m', factor: 1e3 },
    ratio: { symbol: '', factor: 1 },
  },
  us: {
    length: { symbol: 'ft', factor: FOOT },
    elevation: { symbol: 'ft', factor: FOOT },
    diameter: { symbol: 'in', factor: INCH },
    area: { symbol: 'ft²', factor: FOOT * FOOT },
    volume: { symbol: 'yd³', factor: CUBIC_YARD },
    force: { symbol: 'lbf', factor: POUND_FORCE },
    pressure: { symbol: 'psi', factor: PSI },
    stress: { symbol: 'psf', factor: PSF },
    unitWeight: { symbol: 'lb/ft³', factor: POUND_PER_CUBIC_FOOT_WEIGHT },
    flow: { symbol: 'gpm', factor: US_GALLON / 60 },
    density: { symbol: 'lb/ft³', factor: 0.45359237 / Math.pow(FOOT, 3) },
    angle: { symbol: '°', factor: 1 },
    velocity: { symbol: 'ft/s', factor: FOOT },
    forcePerLength: { symbol: 'lbf/ft', factor: POUND_FORCE / FOOT },
    stressGradient: { symbol: 'psf/ft', factor: PSF / FOOT },
    ratio: { symbol: '', factor: 1 },
  },
};

/** SI value → display value. */
export const toDisplay = (si: number, dim: Dimension, system: UnitSystem): number =>
  si / DISPLAY_UNITS[system][dim].factor;

/** Display value → SI value. */
export const fromDisplay = (shown: number, dim: Dimension, system: UnitSystem): number =>
  shown * DISPLAY_UNITS[system][dim].factor;

export const unitSymbol = (dim: Dimension, system: UnitSystem): string => DISPLAY_UNITS[system][dim].symbol;
