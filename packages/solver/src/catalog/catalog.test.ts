import { describe, it, expect } from 'vitest';
import { expectClose } from '../../test/tolerance.js';
import { INCH } from '../units/conversions.js';
import { CATALOG, findSeries, findSize, nearestSize, seriesChoices, seriesForMaterial } from './catalog.js';
import { EN545_CLASS } from './ductileIronEn545.js';
import { pipeWeightPerLength } from './materialDensity.js';

const size = (series: string, nominal: string) => {
  const s = findSize(series, nominal);
  if (!s) throw new Error(`no size ${nominal} in ${series}`);
  return s;
};
const odInches = (series: string, nominal: string) => size(series, nominal).outsideDiameter / INCH;

describe('the pipe catalogue', () => {
  it('gives every AWWA C151 ductile-iron outside diameter (docs/check-values.md CV-35)', () => {
    // AWWA C151 OD, in: docs/check-values.md CV-35, published
    // prettier-ignore
    const c151: [string, number][] = [
      ['3', 3.96], ['4', 4.8], ['6', 6.9], ['8', 9.05], ['10', 11.1], ['12', 13.2], ['14', 15.3], ['16', 17.4],
      ['18', 19.5], ['20', 21.6], ['24', 25.8], ['30', 32.0], ['36', 38.3], ['42', 44.5], ['48', 50.8],
      ['54', 57.56], ['60', 61.61], ['64', 65.67],
    ];
    expect(findSeries('di-awwa-pc350')!.sizes.map((s) => s.nominal)).toEqual(c151.map(([n]) => n));
    for (const [n, od] of c151) expectClose(odInches('di-awwa-pc350', n), od, 1e-12);
    // pressure class 250 keeps the same ODs where it is made (14–64 in)
    for (const [n, od] of c151.slice(6)) expectClose(odInches('di-awwa-pc250', n), od, 1e-12);
  });

  it('gives every EN 545 external diameter (docs/check-values.md CV-36)', () => {
    // EN 545:2010 / ISO 2531 DE, mm: docs/check-values.md CV-36, published except DN450, 1100, 1200 (from memory)
    // prettier-ignore
    const en545: [number, number][] = [
      [80, 98], [100, 118], [125, 144], [150, 170], [200, 222], [250, 274], [300, 326], [350, 378], [400, 429],
      [450, 480], [500, 532], [600, 635], [700, 738], [800, 842], [900, 945], [1000, 1048], [1100, 1152],
      [1200, 1255],
    ];
    expect(findSeries('di-en545')!.sizes.map((s) => s.nominal)).toEqual(en545.map(([dn]) => `DN${dn}`));
    for (const [dn, mm] of en545) expectClose(size('di-en545', `DN${dn}`).outsideDiameter, mm / 1000, 1e-12);
  });

  it('gives the IPS and DIPS outside diameters of AWWA C906 (docs/check-values.md CV-37, CV-38)', () => {
    // IPS OD, in: docs/check-values.md CV-37, published (a PE pipe producer's C906 table)
    // prettier-ignore
    const ips: [string, number][] = [
      ['4', 4.5], ['6', 6.625], ['8', 8.625], ['10', 10.75], ['12', 12.75], ['14', 14], ['16', 16], ['18', 18],
      ['20', 20], ['22', 22], ['24', 24], ['26', 26], ['28', 28], ['30', 30], ['32', 32], ['34', 34], ['36', 36],
      ['42', 42], ['48', 48], ['54', 54],
    ];
    // DIPS OD, in: docs/check-values.md CV-38, published (same table; 54 in is 57.10 there)
    // prettier-ignore
    const dips: [string, number][] = [
      ['4', 4.8], ['6', 6.9], ['8', 9.05], ['10', 11.1], ['12', 13.2], ['14', 15.3], ['16', 17.4], ['18', 19.5],
      ['20', 21.6], ['24', 25.8], ['30', 32.0], ['36', 38.3], ['42', 44.5], ['48', 50.8], ['54', 57.1],
    ];
    for (const id of ['hdpe-ips-dr11', 'hdpe-ips-dr17']) {
      expect(findSeries(id)!.sizes.length).toBe(ips.length);
      for (const [n, od] of ips) expectClose(odInches(id, n), od, 1e-12);
    }
    for (const id of ['hdpe-dips-dr11', 'hdpe-dips-dr17']) {
      expect(findSeries(id)!.sizes.length).toBe(dips.length);
      for (const [n, od] of dips) expectClose(odInches(id, n), od, 1e-12);
    }
  });

  it('makes AWWA C900 PVC to the ductile-iron outside diameter of the same nominal size', () => {
    // AWWA C900 DI-OD series = C151 ODs, docs/check-values.md CV-39 (AWWA C900-16 scope)
    const upTo24 = ['4', '6', '8', '10', '12', '14', '16', '18', '20', '24'];
    expect(findSeries('pvc-c900-dr14')!.sizes.map((s) => s.nominal)).toEqual(upTo24);
    // DR 18 and DR 25 go on above 24 in (C900-16 spans 4–60 in; the DR/size pairs above 24 in from memory)
    for (const id of ['pvc-c900-dr18', 'pvc-c900-dr25'])
      expect(findSeries(id)!.sizes.map((s) => s.nominal)).toEqual([...upTo24, '30', '36']);
    for (const id of ['pvc-c900-dr18', 'pvc-c900-dr14', 'pvc-c900-dr25']) {
      for (const s of findSeries(id)!.sizes)
        expect(s.outsideDiameter).toBe(size('di-awwa-pc350', s.nominal).outsideDiameter);
    }
    expectClose(odInches('pvc-c900-dr25', '36'), 38.3, 1e-12);
  });

  it('keeps the dimension-ratio rule t = OD/DR and ID = OD − 2t on every plastic series', () => {
    // prettier-ignore
    const dr: Record<string, number> = {
      'pvc-c900-dr18': 18, 'pvc-c900-dr14': 14, 'pvc-c900-dr25': 25,
      'hdpe-dips-dr11': 11, 'hdpe-dips-dr17': 17, 'hdpe-ips-dr11': 11, 'hdpe-ips-dr17': 17,
    };
    for (const [id, ratio] of Object.entries(dr)) {
      for (const s of findSeries(id)!.sizes) {
        expectClose(s.wall, s.outsideDiameter / ratio, 0, 1e-12);
        expectClose(s.insideDiameter, s.outsideDiameter - 2 * s.wall, 0, 1e-12);
      }
    }
  });

  it('reads the AWWA C150/C151 pressure-class walls and leaves class 250 out below 14 in', () => {
    // nominal wall, in, C150/C151 pressure-class table [read: producer's table 3-8 and a utility spec]
    expectClose(size('di-awwa-pc350', '3').wall / INCH, 0.25, 1e-12);
    expectClose(size('di-awwa-pc350', '12').insideDiameter / INCH, 13.2 - 2 * 0.28, 1e-12);
    expectClose(size('di-awwa-pc350', '64').wall / INCH, 0.87, 1e-12);
    expectClose(size('di-awwa-pc250', '24').wall / INCH, 0.37, 1e-12);
    expectClose(size('di-awwa-pc250', '54').wall / INCH, 0.65, 1e-12);
    expect(findSize('di-awwa-pc250', '12')).toBeUndefined();
    expect(findSeries('di-awwa-pc250')!.sizes[0]!.nominal).toBe('14');
  });

  it('takes EN 545 walls from the preferred class of each size', () => {
    // EN 545:2010 minimum wall, mm [read: producer's reproduction of the class table]
    expectClose(size('di-en545', 'DN300').wall * 1000, 4.6, 1e-12); // C40
    expectClose(size('di-en545', 'DN600').wall * 1000, 6.7, 1e-12); // C30
    expectClose(size('di-en545', 'DN1000').insideDiameter * 1000, 1048 - 2 * 9.3, 1e-12); // C25
    expect([EN545_CLASS.DN300, EN545_CLASS.DN350, EN545_CLASS.DN700]).toEqual(['C40', 'C30', 'C25']);
  });

  it('has unique series ids, unique sizes per series, a named standard, and ID < OD everywhere', () => {
    expect(new Set(CATALOG.map((s) => s.id)).size).toBe(CATALOG.length);
    expect(CATALOG.map((s) => s.id).sort()).toEqual([
      'di-awwa-pc250',
      'di-awwa-pc350',
      'di-en545',
      'hdpe-dips-dr11',
      'hdpe-dips-dr17',
      'hdpe-ips-dr11',
      'hdpe-ips-dr17',
      'pe100-iso4427-sdr11',
      'pe100-iso4427-sdr17',
      'pvc-c900-dr14',
      'pvc-c900-dr18',
      'pvc-c900-dr25',
      'pvcu-iso1452-pn10',
      'pvcu-iso1452-pn16',
    ]);
    for (const series of CATALOG) {
      expect(new Set(series.sizes.map((s) => s.nominal)).size).toBe(series.sizes.length);
      expect(series.standard).toMatch(/AWWA|EN 545|ISO 1452|ISO 4427/);
      expect(series.wallBasis).toMatch(/ID = OD − 2/);
      for (const s of series.sizes) {
        expect(s.insideDiameter).toBeGreaterThan(0);
        expect(s.insideDiameter).toBeLessThan(s.outsideDiameter);
        // every catalogue size is rated, and the limits never fall below the working rating
        expect(s.rating).toBeDefined();
        expect(s.rating!.withSurge).toBeGreaterThanOrEqual(s.rating!.working);
        expect(s.rating!.test).toBeGreaterThanOrEqual(s.rating!.working);
      }
    }
  });

  it('lists the series of a material and finds the nearest size by outside diameter', () => {
    expect(seriesForMaterial('ductile-iron').map((s) => s.id)).toEqual(['di-awwa-pc350', 'di-awwa-pc250', 'di-en545']);
    // a metric project is offered metric pipe first, a US project inch pipe first
    expect(seriesChoices('pvc', 'si')[0]!.id).toBe('pvcu-iso1452-pn10');
    expect(seriesChoices('hdpe', 'si')[0]!.id).toBe('pe100-iso4427-sdr11');
    expect(seriesChoices('pvc', 'us')[0]!.id).toBe('pvc-c900-dr18');
    expect(seriesChoices('ductile-iron', 'si')[0]!.id).toBe('di-en545');
    expect(seriesChoices('pvc', 'si')).toHaveLength(seriesForMaterial('pvc').length);
    expect(seriesForMaterial('pvc').map((s) => s.id)).toContain('pvcu-iso1452-pn10');
    expect(seriesForMaterial('hdpe').map((s) => s.id)).toContain('pe100-iso4427-sdr11');
    expect(seriesForMaterial('steel')).toEqual([]);
    expect(nearestSize('di-en545', 0.33)?.nominal).toBe('DN300'); // 326 mm is 4 mm away, 378 mm is 48
    expect(nearestSize('pvc-c900-dr18', 10 * INCH)?.nominal).toBe('8'); // 9.05 in is 0.95 away, 11.10 is 1.10
    expect(nearestSize('no-such-series', 0.2)).toBeUndefined();
  });

  it('weighs the barrel of 8-in pressure class 350 ductile iron at 308.28 N/m, as worked by hand', () => {
    // OD 9.05 in = 0.22987 m; t 0.25 in, ID 8.55 in = 0.21717 m.
    // OD² − ID² = (OD − ID)(OD + ID) = 0.0127 × 0.44704 = 0.005677408 m²; × π/4 = 0.00445903 m².
    // × 7,050 kg/m³ = 31.4361 kg/m; × 9.80665 m/s² = 308.28 N/m (21.12 lb/ft; no bell, no lining).
    const s = size('di-awwa-pc350', '8');
    expectClose(pipeWeightPerLength('ductile-iron', s.outsideDiameter, s.insideDiameter), 308.28, 1e-4);
  });
});
