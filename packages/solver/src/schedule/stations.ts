import type { ChainageStyle } from '../model/projectSchema.js';
import { FOOT, type UnitSystem } from '../units/conversions.js';
import { roundTo } from '../units/format.js';

/** One station: 100 ft in US units (9+31.8 is 931.8 ft), 1 km in SI (0+931.8 is 931.8 m). */
const STATION = { us: { unit: FOOT, per: 100, digits: 2 }, si: { unit: 1, per: 1000, digits: 3 } } as const;

/**
 * A chainage as a station, to a tenth of the display unit: "9+31.8" (US, hundreds of feet + feet),
 * "1+005.0" (SI, kilometres + metres). Rounded first so that 99.96 ft reads 1+00.0, never 0+100.0.
 */
export function stationText(meters: number, units: UnitSystem): string {
  if (!Number.isFinite(meters)) return '—';
  const s = STATION[units];
  const tenths = Math.round(roundTo(Math.abs(meters) / s.unit, 1) * 10);
  const whole = Math.floor(tenths / (s.per * 10));
  const rest = (tenths - whole * s.per * 10) / 10;
  const [int, frac] = rest.toFixed(1).split('.');
  return `${meters < 0 && tenths > 0 ? '-' : ''}${whole}+${int!.padStart(s.digits, '0')}.${frac}`;
}

/** Ids of the schedule columns that give a fitting's position along its run, in the project's style. */
export function positionColumns(style: ChainageStyle | undefined): string[] {
  if (style === 'stations') return ['station'];
  if (style === 'both') return ['chainage', 'station'];
  return ['chainage'];
}
