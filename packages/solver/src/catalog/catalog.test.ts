import { describe, it, expect } from 'vitest';
import { CATALOG, findSeries, findSize, nearestSize } from './catalog.js';
import { pipeWeightPerLength } from './materialDensity.js';
import { INCH } from '../units/conversions.js';
import { expectClose } from '../../test/tolerance.js';

const od = (series: string, nominal: string) => findSize(series, nominal)!.outsideDiameter;

describe('pipe catalog', () => {
  it('gives every AWWA C151 ductile-iron OD of domain reference §7.1 [read]', () => {
    const table: [string, number][] = [
      ['3', 3.96], ['4', 4.8], ['6', 6.9], ['8', 9.05], ['10', 11.1], ['12', 13.2], ['14', 15.3], ['16', 17.4], ['18', 19.5],
      ['20', 21.6], ['24', 25.8], ['30', 32.0], ['36', 38.3], ['42', 44.5], ['48', 50.8], ['54', 57.56], ['60', 61.61], ['64', 65.67],
    ];
    for (const [n, inches] of table) expectClose(od('di-awwa-pc350', n), inches * INCH, 1e-12);
  });

  it('gives every EN 545 external diameter of domain reference §7.4', () => {
    const table: [number, number][] = [
      [80, 98], [100, 118], [125, 144], [150, 170], [200, 222], [250, 274], [300, 326], [350, 378], [400, 429], [450, 480],
      [500, 532], [600, 635], [700, 738], [800, 842], [900, 945], [1000, 1048], [1100, 1152], [1200, 1255],
    ];
    for (const [dn, mm] of table) expectClose(od('di-en545', `DN${dn}`), mm / 1000, 1e-12);
  });

  it('gives the IPS and DIPS ODs of AWWA C906 in domain reference §7.3', () => {
    const ips: [string, number][] = [['4', 4.5], ['6', 6.625], ['8', 8.625], ['12', 12.75], ['24', 24], ['36', 36], ['54', 54]];
    for (const [n, inches] of ips) expectClose(od('hdpe-ips-dr11', n), inches * INCH, 1e-12);
    const dips: [string, number][] = [['4', 4.8], ['8', 9.05], ['12', 13.2], ['24', 25.8], ['48', 50.8]];
    for (const [n, inches] of dips) expectClose(od('hdpe-dips-dr17', n), inches * INCH, 1e-12);
  });

  it('makes AWWA C900 PVC to the ductile-iron ODs of the same nominal size', () => {
    for (const s of findSeries('pvc-c900-dr18')!.sizes) expectClose(s.outsideDiameter, od('di-awwa-pc350', s.nominal), 1e-12);
  });

  it('keeps the dimension-ratio rule t = OD/DR on every plastic series', () => {
    for (const series of CATALOG.filter((s) => s.id.includes('-dr'))) {
      const dr = Number(/dr(\d+)$/.exec(series.id)![1]);
      for (const s of series.sizes) expectClose(s.wall, s.outsideDiameter / dr, 1e-12);
    }
  });

  it('has unique series ids, unique sizes per series, and ID < OD everywhere', () => {
    expect(new Set(CATALOG.map((s) => s.id)).size).toBe(CATALOG.length);
    for (const series of CATALOG) {
      expect(new Set(series.sizes.map((s) => s.nominal)).size).toBe(series.sizes.length);
      for (const s of series.sizes) expect(s.insideDiameter).toBeLessThan(s.outsideDiameter);
      expect(series.standard.length).toBeGreaterThan(5);
    }
  });

  it('reads 12-in pressure class 350 with a 0.28 in wall, ID 12.64 in (AWWA C150 table, read in a utility specification)', () => {
    expectClose(findSize('di-awwa-pc350', '12')!.insideDiameter / INCH, 13.2 - 0.56, 1e-12);
  });

  it('finds the nearest size by OD', () => {
    expect(nearestSize('di-en545', 0.33)?.nominal).toBe('DN300');
  });

  it('weighs 8-in PC350 ductile iron barrel at 21.15 lb/ft (hand calculation)', () => {
    // OD 9.05 in, wall 0.25 in: π/4·(9.05² − 8.55²) = 6.912 in² of iron; × 12 in × 0.255 lb/in³ = 21.15 lb/ft
    // (barrel only, no bell or lining); 7,060 kg/m³ is 0.2551 lb/in³.
    const s = findSize('di-awwa-pc350', '8')!;
    const nPerM = pipeWeightPerLength('ductile-iron', s.outsideDiameter, s.insideDiameter);
    const lbPerFt = (nPerM * 0.3048) / 4.4482216152605;
    expectClose(lbPerFt, 21.15, 2e-3);
  });
});
