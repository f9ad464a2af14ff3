import { describe, it, expect } from 'vitest';
import { expectClose } from '../../test/tolerance.js';
import { PSI } from '../units/conversions.js';
import { findSeries, findSize } from './catalog.js';
import { metricWall, pvcSdr, PE100_PN, PVC_SDR } from './metricPlastic.js';
import { BAR, plasticPressure } from './pressureRatings.js';
import { REGISTER } from '../provenance/register.js';

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

  it('gives metric PVC-U its PN from the design stress of its size: SDR 26 and SDR 21 both make PN 10', () => {
    // docs/check-values.md CV-31: 20·σs/(SDR − 1) bar = 20·12.5/25 = 10 (above 90 mm), 20·10/20 = 10 (to 90 mm);
    // PN 16: 20·12.5/16 = 15.6 and 20·10/12.6 = 15.9, the nominal PN the standard rounds to
    const stress = REGISTER['rating.pvc-iso1452-stress'].value;
    expectClose(plasticPressure(stress.above90mm, PVC_SDR[10].above90) / BAR, 10, 1e-12);
    expectClose(plasticPressure(stress.upTo90mm, PVC_SDR[10].upTo90) / BAR, 10, 1e-12);
    expectClose(plasticPressure(stress.above90mm, PVC_SDR[16].above90) / BAR, 16, 0.03);
    expectClose(plasticPressure(stress.upTo90mm, PVC_SDR[16].upTo90) / BAR, 16, 0.03);
    expect(pvcSdr(10, 90)).toBe(21);
    expect(pvcSdr(10, 110)).toBe(26);
    const pn10 = rating('pvcu-iso1452-pn10', 'dn110');
    expectClose(pn10.working / BAR, 10, 1e-12);
    expectClose(pn10.withSurge / BAR, 12.5, 1e-12);
    expectClose(pn10.test / BAR, 15, 1e-12);
  });

  it('gives PE 100 its PN from 8 MPa: SDR 11 is PN 16 and SDR 17 is PN 10', () => {
    // docs/check-values.md CV-31: 20·8/(11 − 1) = 16 bar, 20·8/(17 − 1) = 10 bar
    const sigma = REGISTER['rating.pe100-stress'].value;
    for (const sdr of [11, 17] as const) {
      expectClose(plasticPressure(sigma, sdr) / BAR, PE100_PN[sdr], 1e-12);
      expectClose(rating(`pe100-iso4427-sdr${sdr}`, 'dn160').working / BAR, PE100_PN[sdr], 1e-12);
    }
  });

  it('takes metric plastic walls as OD/SDR rounded up to 0.1 mm', () => {
    // hand: 110/26 = 4.231 → 4.3 mm; 63/21 = 3.000 → 3.0 mm; 160/11 = 14.545 → 14.6 mm; 90/13.6 = 6.618 → 6.7 mm
    expectClose(metricWall(110, 26), 4.3e-3, 1e-9);
    expectClose(metricWall(63, 21), 3.0e-3, 1e-9);
    expectClose(metricWall(160, 11), 14.6e-3, 1e-9);
    expectClose(metricWall(90, 13.6), 6.7e-3, 1e-9);
    const s = findSize('pe100-iso4427-sdr11', 'dn160')!;
    expectClose(s.outsideDiameter, 0.16, 1e-12);
    expectClose(s.insideDiameter, 0.16 - 2 * 14.6e-3, 1e-9);
    expect(findSeries('pvcu-iso1452-pn10')!.sizes.map((x) => x.nominal)).toContain('dn630');
    expect(findSeries('pe100-iso4427-sdr17')!.sizes.at(-1)!.nominal).toBe('dn1000');
  });
});
