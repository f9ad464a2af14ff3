import { INCH } from '../units/conversions.js';
import { C151_OD } from './ductileIronAwwa.js';
import { sizeFromDr, type PipeSeries } from './pipeSeries.js';

/**
 * AWWA C900 PVC is made to the ductile-iron (CI/DI) outside diameters of AWWA C151 (domain
 * reference §7.2 [read for 4–12 in]). C900-16 spans 4–60 in [read: title]; the range kept here is
 * 4–24 in, in which DR 14 and DR 18 are both made (14–24 in availability from memory).
 */
const C900_NOMINALS = ['4', '6', '8', '10', '12', '14', '16', '18', '20', '24'] as const;

/**
 * Minimum wall t = OD/DR, unrounded (the standard tabulates it to 0.001 in, from memory).
 * DR 18 is pressure class 235 and DR 14 pressure class 305 [read: a producer's C900 specification].
 */
function c900Series(dr: number, pressureClass: number): PipeSeries {
  return {
    id: `pvc-c900-dr${dr}`,
    label: `PVC, AWWA C900, DR ${dr} (PC ${pressureClass})`,
    material: 'pvc',
    standard: 'AWWA C900 (DI-OD series); outside diameters of AWWA C151',
    wallBasis: `minimum wall t = OD/${dr}; ID = OD − 2t`,
    sizes: C900_NOMINALS.map((n) => sizeFromDr(n, `${n} in`, C151_OD[n]! * INCH, dr)),
  };
}

export const PVC_C900_DR18 = c900Series(18, 235);
export const PVC_C900_DR14 = c900Series(14, 305);
