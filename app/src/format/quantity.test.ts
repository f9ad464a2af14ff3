import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { Dimension, UnitSystem } from '@mainbrace/solver';
import { editable, parseTyped } from './typedQuantity.js';
import { expectClose } from '../testFixtures.js';

/** Exact factors: 1 ft = 0.3048 m, 1 in = 0.0254 m (1959 yard and pound agreement); 1 psi = 6894.757 Pa (NIST SP 811). */
const FT = 0.3048;
const PSI = 6894.757293168361;

const si = (text: string, dim: Dimension, units: UnitSystem) => {
  const r = parseTyped(text, dim, units);
  if (!r.ok) throw new Error(r.message);
  return r.si;
};

describe('parseTyped', () => {
  it('accepts thousands separators and spaces: "1,234.5" ft is 376.2756 m, " 1 234.5 " kPa is 1 234 500 Pa', () => {
    expectClose(si('1,234.5', 'length', 'us'), 1234.5 * FT, 1e-9);
    expectClose(si(' 1 234.5 ', 'pressure', 'si'), 1234.5e3, 1e-6);
  });

  it('accepts signs, a bare decimal point and exponents: "-3.5" m, ".25" in, "1.5e3" psi', () => {
    expectClose(si('-3.5', 'elevation', 'si'), -3.5);
    expectClose(si('.25', 'diameter', 'us'), 0.25 * 0.0254, 1e-12);
    expectClose(si('1.5e3', 'pressure', 'us'), 1500 * PSI, 1e-6);
  });

  it.each([
    ['abc', 'pressure', 'us', 'psi'],
    ['abc', 'pressure', 'si', 'kPa'],
    ['', 'flow', 'us', 'gpm'],
    ['1.2.3', 'diameter', 'si', 'mm'],
    ['12 kg', 'length', 'us', 'ft'],
    ['12 psi', 'length', 'si', 'm'],
  ] as const)('refuses %j as a %s in %s units with a message naming %s', (text, dim, units, unit) => {
    const r = parseTyped(text, dim, units);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain(unit);
  });

  it('takes a unit typed after the number, in either system: 54 in, 1.2 m, 150 psi, 4 ft', () => {
    // 1 in = 0.0254 m and 1 ft = 0.3048 m exactly (international yard and pound, 1959); 1 psi is
    // 6894.757 Pa (NIST SP 811, B.8).
    expectClose(si('54 in', 'length', 'us'), 54 * 0.0254, 1e-12);
    expectClose(si('54in', 'elevation', 'si'), 54 * 0.0254, 1e-12);
    expectClose(si('1.2 m', 'length', 'us'), 1.2, 1e-12);
    expectClose(si('4 ft', 'length', 'si'), 4 * 0.3048, 1e-12);
    expectClose(si('150 psi', 'pressure', 'si'), 150 * 6894.757, 0.1);
    expectClose(si('1,035 kPa', 'pressure', 'us'), 1035e3, 1e-6);
    expectClose(si('300 mm', 'diameter', 'us'), 0.3, 1e-12);
  });

  it('names plain units when the quantity has no unit (a ratio)', () => {
    const r = parseTyped('x', 'ratio', 'si');
    expect(r.ok ? '' : r.message).toContain('plain units');
  });
});

describe('editable and parseTyped round trip', () => {
  it('shows 0.3048 m as "1" ft and 1 000 000 Pa as "1000" kPa (exact factors)', () => {
    expect(editable(0.3048, 'length', 'us')).toBe('1');
    expect(editable(1e6, 'pressure', 'si')).toBe('1000');
  });

  it('shows a value typed in US units as typed: 2000 psf, 4.5 ft and 90 psi, not their conversions back', () => {
    expect(editable(si('2000', 'stress', 'us'), 'stress', 'us')).toBe('2000');
    expect(editable(si('4.5', 'length', 'us'), 'length', 'us')).toBe('4.5');
    expect(editable(si('90', 'pressure', 'us'), 'pressure', 'us')).toBe('90');
  });

  it('shows a value typed in SI to four significant figures in US units: 1.5 m is 4.921 ft, 620 kPa is 89.92 psi', () => {
    // 1.5 / 0.3048 = 4.92126 ft; 620 000 / 6894.757 = 89.923 psi (exact factors above)
    expect(editable(1.5, 'length', 'us')).toBe('4.921');
    expect(editable(620e3, 'pressure', 'us')).toBe('89.92');
  });

  it('reads back what it shows, to four significant figures in display units, in both unit systems (invariant)', () => {
    const dims: Dimension[] = [
      'length',
      'elevation',
      'diameter',
      'area',
      'volume',
      'force',
      'pressure',
      'stress',
      'unitWeight',
      'flow',
      'density',
      'angle',
      'ratio',
    ];
    fc.assert(
      fc.property(
        fc.constantFrom(...dims),
        fc.constantFrom<UnitSystem>('si', 'us'),
        fc.double({ min: -1e7, max: 1e7, noNaN: true }),
        (dim, units, value) => {
          const factor = si('1', dim, units); // SI value of one display unit
          const back = si(editable(value, dim, units), dim, units);
          // four significant figures: within 5 parts in 10⁴ of the value (and exact when it is short)
          expectClose(back, value, 5e-4 * Math.abs(value) * (1 + 1e-9) + 1e-12 * factor);
        },
      ),
      { seed: 1234, numRuns: 400 },
    );
  });
});

describe('units typed after the number beyond the shown ones', () => {
  it('reads bar and MPa for a pressure, MPa and ksf for a soil strength (1 bar = 10⁵ Pa; 1 ksf = 1,000 lbf/ft²)', () => {
    const bar = parseTyped('10.35 bar', 'pressure', 'si');
    expect(bar.ok && bar.si).toBeCloseTo(1_035_000, 6);
    const mpa = parseTyped('1.035 MPa', 'pressure', 'us');
    expect(mpa.ok && mpa.si).toBeCloseTo(1_035_000, 6);
    // 1 lbf/ft² = 4.4482216152605 N / 0.09290304 m² = 47.880259 Pa (NIST SP 811 appendix B)
    const ksf = parseTyped('3 ksf', 'stress', 'us');
    expect(ksf.ok && ksf.si).toBeCloseTo(3 * 47_880.259, 2);
    const refused = parseTyped('3 ksf', 'pressure', 'si');
    expect(refused.ok).toBe(false);
    if (!refused.ok) expect(refused.message).toMatch(/kPa.*psi, bar, MPa/);
  });
});

describe('decimal commas and feet-and-inches', () => {
  it('reads 1,5 as one and a half, 1,500 as fifteen hundred, and refuses an ambiguous 1,50,0', () => {
    const one = parseTyped('1,5', 'length', 'si');
    expect(one.ok && one.si).toBe(1.5);
    const thousand = parseTyped('1,500', 'pressure', 'si');
    expect(thousand.ok && thousand.si).toBe(1_500_000);
    const bad = parseTyped('1,50,0', 'length', 'si');
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.message).toMatch(/decimals with a point/);
  });

  it('reads 4\'6" and 4 ft 6 in as 4.5 ft = 1.3716 m (1 ft = 0.3048 m exact)', () => {
    for (const text of [`4'6"`, `4' 6`, '4 ft 6 in', '4.5 ft']) {
      const r = parseTyped(text, 'length', 'us');
      expect(r.ok && Math.abs(r.si - 1.3716) < 1e-12).toBe(true);
    }
  });
});
