import { describe, it, expect } from 'vitest';
import { formatDimension, shownDimension, formatNumber, formatQuantity } from './format.js';
import { LBF } from '../../test/projectBuilder.js';

describe('numbers as an engineer writes them', () => {
  it('keeps three significant figures but never drops integer digits', () => {
    expect(formatNumber(29_029.8)).toBe('29,030');
    expect(formatNumber(0.765367)).toBe('0.765');
    expect(formatNumber(-12.345)).toBe('-12.3');
    expect(formatNumber(1_234_567.8)).toBe('1,234,568');
    expect(formatNumber(-0.0004)).toBe('-0.000400');
  });

  it('never throws, whatever the number: tiny, subnormal, huge or not a number', () => {
    for (const v of [1e-100, 1e-300, 4.8e-305, 5e-324, -1e-200, 1e300, -1.7e308, Infinity, -Infinity, NaN])
      for (const significant of [3, 4]) expect(() => formatNumber(v, significant)).not.toThrow();
    // A value far below drawing precision keeps its power of ten: it must not read as zero.
    expect(formatNumber(1e-100)).toBe('1.00e-100');
    expect(formatNumber(4.8e-305, 4)).toBe('4.800e-305');
    expect(formatNumber(Infinity)).toBe('—');
    expect(formatNumber(NaN)).toBe('—');
    for (const dim of ['pressure', 'force', 'length', 'volume', 'angle', 'density'] as const)
      for (const v of [1e-300, 1e300, NaN]) expect(() => formatQuantity(v, dim, 'us')).not.toThrow();
    expect(formatDimension(1e-300, 'si')).toBe('0.00 m');
  });

  it('writes forces above 10,000 lbf in kip (screens.md) and carries the unit', () => {
    expect(formatQuantity(29_030 * LBF, 'force', 'us').text).toBe('29.0 kip');
    expect(formatQuantity(7_385 * LBF, 'force', 'us').text).toBe('7,385 lbf');
    expect(formatQuantity(118_040, 'force', 'si').text).toBe('118 kN');
    expect(formatQuantity(22.5, 'angle', 'si').text).toBe('22.5°');
  });

  it('gives built dimensions in metres to the centimetre or in feet and inches (26 in = 2 ft 2 in)', () => {
    expect(formatDimension(0.75, 'si')).toBe('0.75 m');
    expect(formatDimension(26 * 0.0254, 'us')).toBe('2 ft 2 in');
    expect(formatDimension(48 * 0.0254, 'us')).toBe('4 ft');
    expect(formatDimension(10 * 0.0254, 'us')).toBe('10 in');
  });

  it('gives the built dimension as shown, so that an area worked from it is the face a crew builds', () => {
    // 0.35 m = 13.78 in, shown 1 ft 2 in = 14 in = 0.3556 m (1 in = 0.0254 m exactly, NIST SP 811)
    expect(formatDimension(0.35, 'us')).toBe('1 ft 2 in');
    expect(shownDimension(0.35, 'us')).toBeCloseTo(14 * 0.0254, 12);
    // 0.3501 m: the centimetre (0.36) would add 9 mm, so the millimetre (0.351 m) is shown
    expect(formatDimension(0.3501, 'si')).toBe('0.351 m');
    expect(shownDimension(0.3501, 'si')).toBeCloseTo(0.351, 12);
    expect(shownDimension(0.75, 'si')).toBe(0.75);
  });
});
