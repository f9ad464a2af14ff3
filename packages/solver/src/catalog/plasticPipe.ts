import { INCH } from '../units/conversions.js';
import { C151_OD } from './ductileIronAwwa.js';
import { sizeFromWall, type PipeSeries } from './pipeSeries.js';
import type { Material } from '../model/projectSchema.js';

/** IPS outside diameters, in — ASME B36.10 steel-pipe ODs used by AWWA C906 (domain reference §7.3). */
const IPS_OD: Readonly<Record<string, number>> = {
  3: 3.5, 4: 4.5, 6: 6.625, 8: 8.625, 10: 10.75, 12: 12.75, 14: 14, 16: 16, 18: 18, 20: 20, 22: 22,
  24: 24, 26: 26, 28: 28, 30: 30, 32: 32, 34: 34, 36: 36, 42: 42, 48: 48, 54: 54,
};

/**
 * DIPS outside diameters, in — the ductile-iron ODs (AWWA C151) as used by AWWA C906; the PE
 * producer's table gives 57.10 for 54 in, C151 57.56 (domain reference §7.3); the C151 value is used.
 */
const DIPS_NOMINALS = ['3', '4', '6', '8', '10', '12', '14', '16', '18', '20', '24', '30', '36', '42', '48', '54'];

/** AWWA C900 (DI-OD, "CIOD") sizes, in; C900-16 spans 4–60 in, the range kept here is 4–24 in. */
const C900_NOMINALS = ['4', '6', '8', '10', '12', '14', '16', '18', '20', '24'];

/** A series whose minimum wall is OD/DR (the dimension-ratio rule of AWWA C900 and C906). */
function drSeries(
  id: string,
  label: string,
  material: Material,
  standard: string,
  dr: number,
  ods: readonly [string, number][],
): PipeSeries {
  return {
    id,
    label,
    material,
    standard,
    wallBasis: `minimum wall t = OD/${dr}; ID = OD − 2t`,
    sizes: ods.map(([n, od]) => sizeFromWall(n, `${n} in`, od * INCH, (od * INCH) / dr)),
  };
}

const dips = DIPS_NOMINALS.map((n) => [n, C151_OD[n]!] as [string, number]);
const ips = Object.entries(IPS_OD);
const ciod = C900_NOMINALS.map((n) => [n, C151_OD[n]!] as [string, number]);

export const PLASTIC_SERIES: readonly PipeSeries[] = [
  drSeries('pvc-c900-dr18', 'PVC, AWWA C900, DR 18', 'pvc', 'AWWA C900, ductile-iron OD series', 18, ciod),
  drSeries('pvc-c900-dr14', 'PVC, AWWA C900, DR 14', 'pvc', 'AWWA C900, ductile-iron OD series', 14, ciod),
  drSeries('hdpe-dips-dr11', 'HDPE, AWWA C906, DIPS, DR 11', 'hdpe', 'AWWA C906, ductile-iron pipe size ODs', 11, dips),
  drSeries('hdpe-dips-dr17', 'HDPE, AWWA C906, DIPS, DR 17', 'hdpe', 'AWWA C906, ductile-iron pipe size ODs', 17, dips),
  drSeries('hdpe-ips-dr11', 'HDPE, AWWA C906, IPS, DR 11', 'hdpe', 'AWWA C906, iron pipe size ODs (ASME B36.10)', 11, ips),
  drSeries('hdpe-ips-dr17', 'HDPE, AWWA C906, IPS, DR 17', 'hdpe', 'AWWA C906, iron pipe size ODs (ASME B36.10)', 17, ips),
];
