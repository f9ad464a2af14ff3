import { INCH } from '../units/conversions.js';
import { C151_OD } from './ductileIronAwwa.js';
import { sizeFromDr, type PipeSeries } from './pipeSeries.js';
import { c900Rating } from './pressureRatings.js';

/**
 * AWWA C900 PVC is made to the ductile-iron (CI/DI) outside diameters of AWWA C151 (AWWA C900-16,
 * scope [read for 4–12 in: a pipe producer's note]). C900-16, which absorbed C905, spans 4–60 in [read: title].
 * DR 14 is kept to 4–24 in; DR 18 and DR 25 run on to 36 in (which DR is made in which size above
 * 24 in is from memory, and 42–60 in are left out until the standard's table is read).
 */
const C900_NOMINALS: Readonly<Record<14 | 18 | 25, readonly string[]>> = {
  14: ['4', '6', '8', '10', '12', '14', '16', '18', '20', '24'],
  18: ['4', '6', '8', '10', '12', '14', '16', '18', '20', '24', '30', '36'],
  25: ['4', '6', '8', '10', '12', '14', '16', '18', '20', '24', '30', '36'],
};

/**
 * Minimum wall t = OD/DR, unrounded (the standard tabulates it to 0.001 in, from memory).
 * Pressure class by DR from C900-16 (register: rating.pvc-c900).
 */
function c900Series(dr: 14 | 18 | 25): PipeSeries {
  const rating = c900Rating(dr);
  return {
    id: `pvc-c900-dr${dr}`,
    label: `PVC, AWWA C900, DR ${dr} (${rating.label})`,
    material: 'pvc',
    sizing: 'inch',
    standard: 'AWWA C900-16 (DI-OD series); outside diameters of AWWA C151',
    wallBasis: `minimum wall t = OD/${dr}; ID = OD − 2t`,
    sizes: C900_NOMINALS[dr].map((n) => sizeFromDr(n, `${n} in`, C151_OD[n]! * INCH, dr, rating)),
  };
}

export const PVC_C900_DR18 = c900Series(18);
export const PVC_C900_DR14 = c900Series(14);
export const PVC_C900_DR25 = c900Series(25);
