import { describe, it, expect } from 'vitest';
import { FOOT } from '../units/conversions.js';
import { positionColumns, stationText } from './stations.js';

// Stationing by hand: a station is 100 ft (US practice) or 1 km (SI); 931.8 ft = 9 stations + 31.8 ft.
describe('stations', () => {
  it('writes 931.8 ft as 9+31.8 and 5 ft as 0+05.0', () => {
    expect(stationText(931.8 * FOOT, 'us')).toBe('9+31.8');
    expect(stationText(5 * FOOT, 'us')).toBe('0+05.0');
    expect(stationText(0, 'us')).toBe('0+00.0');
  });

  it('rounds before splitting: 99.96 ft is 1+00.0, never 0+100.0', () => {
    expect(stationText(99.96 * FOOT, 'us')).toBe('1+00.0');
  });

  it('writes SI chainage as kilometres + metres: 1,005 m is 1+005.0, 931.84 m is 0+931.8', () => {
    expect(stationText(1005, 'si')).toBe('1+005.0');
    expect(stationText(931.84, 'si')).toBe('0+931.8');
  });

  it('chooses the position columns from the project setting, chainage when unset', () => {
    expect(positionColumns(undefined)).toEqual(['chainage']);
    expect(positionColumns('stations')).toEqual(['station']);
    expect(positionColumns('both')).toEqual(['chainage', 'station']);
  });
});
