import { INCH } from '../units/conversions.js';
import { sizeFromDr, type PipeSeries } from './pipeSeries.js';
import { c906Rating } from './pressureRatings.js';

/**
 * IPS outside diameters, in: the steel-pipe ODs of ASME B36.10 that AWWA C906 uses (AWWA C906,
 * dimension tables [read: a PE pipe producer's table]). 3 in lies below C906's 4-in lower limit and
 * 63/65 in are only from memory, so both are left out.
 */
// prettier-ignore
const IPS_OD: readonly [string, number][] = [
  ['4', 4.5], ['6', 6.625], ['8', 8.625], ['10', 10.75], ['12', 12.75], ['14', 14], ['16', 16], ['18', 18],
  ['20', 20], ['22', 22], ['24', 24], ['26', 26], ['28', 28], ['30', 30], ['32', 32], ['34', 34], ['36', 36],
  ['42', 42], ['48', 48], ['54', 54],
];

/**
 * DIPS outside diameters, in: the ductile-iron ODs as AWWA C906 PE pipe is made to them (AWWA C906,
 * dimension tables [read: same producer's table]). 54 in is 57.10 there, the older DI value; current
 * C151 gives 57.56, so a 54-in PE pipe may not fit a current DI fitting.
 */
// prettier-ignore
const DIPS_OD: readonly [string, number][] = [
  ['4', 4.8], ['6', 6.9], ['8', 9.05], ['10', 11.1], ['12', 13.2], ['14', 15.3], ['16', 17.4], ['18', 19.5],
  ['20', 21.6], ['24', 25.8], ['30', 32.0], ['36', 38.3], ['42', 44.5], ['48', 50.8], ['54', 57.1],
];

/**
 * Minimum wall t = OD/DR, ID = OD − 2t. The standard's table of which DR is made in which size was
 * not read: every size is listed at both DRs, and a producer may not make every pairing.
 */
function c906Series(odSeries: 'ips' | 'dips', dr: 11 | 17): PipeSeries {
  const ods = odSeries === 'ips' ? IPS_OD : DIPS_OD;
  const name = odSeries === 'ips' ? 'IPS' : 'DIPS';
  return {
    id: `hdpe-${odSeries}-dr${dr}`,
    label: `HDPE (PE 4710), AWWA C906, ${name}, DR ${dr} (${c906Rating(dr).label})`,
    material: 'hdpe',
    sizing: 'inch',
    standard:
      odSeries === 'ips'
        ? 'AWWA C906, iron pipe size (IPS) outside diameters of ASME B36.10'
        : 'AWWA C906, ductile-iron pipe size (DIPS) outside diameters',
    wallBasis: `minimum wall t = OD/${dr}; ID = OD − 2t`,
    sizes: ods.map(([n, od]) => sizeFromDr(n, `${n} in`, od * INCH, dr, c906Rating(dr))),
  };
}

export const HDPE_C906_SERIES: readonly PipeSeries[] = [
  c906Series('dips', 11),
  c906Series('dips', 17),
  c906Series('ips', 11),
  c906Series('ips', 17),
];
