import { describe, it, expect } from 'vitest';
import { expectClose } from '../../test/tolerance.js';
import { PSI } from '../units/conversions.js';
import { findSize } from './catalog.js';
import { BAR, plasticPressure } from './pressureRatings.js';

const rating = (series: string, nominal: string) => {
  const r = findSize(series, nominal)?.rating;
  if (!r) throw new Error(`no rating for ${series} ${nominal}`);
  return r;
};

describe('pressure ratings of the catalogue series', () => {
  it('rates AWWA C151 ductile iron at its pressure class, plus the 100 psi surge allowance with surge and in test', () => {
    // docs/check-values.md CV-26: PC 350 → 350 psi working, 450 psi with surge; PC 250 → 250 / 350 psi
    const pc350 = rating('di-awwa-pc350', '12');
    expectClose(pc350.working, 350 * 6894.757293168361, 1e-12);
    expectClose(pc350.withSurge, 450 * 6894.757293168361, 1e-12);
    expectClose(pc350.test, 450 * 6894.757293168361, 1e-12);
    expect(pc350.label).toBe('PC 350');
    expectClose(rating('di-awwa-pc250', '24').withSurge / PSI, 350, 1e-12);
  });

  it('rates AWWA C900-16 PVC by DR: 305, 235 and 165 psi, and 1.6 × the class with an occasional surge', () => {
    // docs/check-values.md CV-27 (DR 14 and DR 18 read in a producer's C900 specification; DR 25 and 1.6 from memory)
    expectClose(rating('pvc-c900-dr14', '8').working / PSI, 305, 1e-12);
    expectClose(rating('pvc-c900-dr18', '8').working / PSI, 235, 1e-12);
    expectClose(rating('pvc-c900-dr25', '8').working / PSI, 165, 1e-12);
    expectClose(rating('pvc-c900-dr18', '8').withSurge / PSI, 376, 1e-12); // 1.6 × 235
    // invariant: a thicker wall (lower DR) never rates lower
    expect(rating('pvc-c900-dr14', '12').working).toBeGreaterThan(rating('pvc-c900-dr18', '12').working);
    expect(rating('pvc-c900-dr18', '12').working).toBeGreaterThan(rating('pvc-c900-dr25', '12').working);
  });

  it('keeps the C900 classes within 2 % of the hoop-stress rule 2·HDB/((DR − 1)·SF), HDB 4,000 psi, SF 2.0', () => {
    // docs/check-values.md CV-30 (HDB and SF from memory): DR 14 307.7, DR 18 235.3, DR 25 166.7 psi,
    // which the standard rounds down to a multiple of 5
    for (const dr of [14, 18, 25] as const) {
      const fromStress = plasticPressure(4000 * PSI, dr) / 2.0;
      const tabulated = rating(`pvc-c900-dr${dr}`, '6').working;
      expect(tabulated).toBeLessThanOrEqual(fromStress);
      expect(tabulated).toBeGreaterThan(0.98 * fromStress);
    }
  });

  it('rates AWWA C906 PE 4710 at 200 psi for DR 11 and 125 psi for DR 17, with 2 × in surge and 1.5 × in test', () => {
    // docs/check-values.md CV-29 (from memory); also 2·HDS/(DR − 1) with HDS 1,000 psi: 200 and 125 psi exactly
    for (const [dr, pc] of [
      [11, 200],
      [17, 125],
    ] as const) {
      const r = rating(`hdpe-dips-dr${dr}`, '8');
      expectClose(r.working / PSI, pc, 1e-12);
      expectClose(plasticPressure(1000 * PSI, dr) / PSI, pc, 1e-12);
      expectClose(r.withSurge / r.working, 2, 1e-12);
      expectClose(r.test / r.working, 1.5, 1e-12);
    }
  });

  it('rates EN 545 ductile iron by class: C40 PFA 40, PMA 48, PEA 53 bar', () => {
    // docs/check-values.md CV-28 (EN 545:2010 PFA/PMA/PEA rule, from memory)
    const c40 = rating('di-en545', 'DN300');
    expect(c40.label).toBe('C40');
    expectClose(c40.working / BAR, 40, 1e-12);
    expectClose(c40.withSurge / BAR, 48, 1e-12);
    expectClose(c40.test / BAR, 53, 1e-12);
    const c25 = rating('di-en545', 'DN800');
    expectClose(c25.withSurge / BAR, 30, 1e-12);
    expectClose(c25.test / BAR, 35, 1e-12);
  });
});
