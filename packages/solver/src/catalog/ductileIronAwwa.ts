import { INCH } from '../units/conversions.js';
import { sizeFromWall, type PipeSeries } from './pipeSeries.js';
import { awwaDuctileIronRating } from './pressureRatings.js';

/**
 * Ductile-iron outside diameters, in, AWWA C151/A21.51; one OD for every pressure class
 * (AWWA C151/A21.51 thickness tables [read: reproduced in a utility specification and a pipe
 * producer's table]). Also the OD series of AWWA C900 PVC.
 */
// prettier-ignore
export const C151_OD: Readonly<Record<string, number>> = {
  3: 3.96, 4: 4.8, 6: 6.9, 8: 9.05, 10: 11.1, 12: 13.2, 14: 15.3, 16: 17.4, 18: 19.5, 20: 21.6,
  24: 25.8, 30: 32.0, 36: 38.3, 42: 44.5, 48: 50.8, 54: 57.56, 60: 61.61, 64: 65.67,
};

/**
 * Nominal wall, in, pressure class 350, AWWA C150/A21.50 and C151/A21.51 standard pressure-class
 * table [read: reproduced as a pipe producer's table 3-8 (4–64 in) and in a utility specification
 * (3–64 in)]. Class 350 is listed in every size 3–64 in. One web datasheet gives 0.28 for 10 in;
 * both copies of the table give 0.26, used here.
 */
// prettier-ignore
const PC350_WALL: Readonly<Record<string, number>> = {
  3: 0.25, 4: 0.25, 6: 0.25, 8: 0.25, 10: 0.26, 12: 0.28, 14: 0.31, 16: 0.34, 18: 0.36, 20: 0.38,
  24: 0.43, 30: 0.49, 36: 0.56, 42: 0.63, 48: 0.7, 54: 0.79, 60: 0.83, 64: 0.87,
};

/**
 * Nominal wall, in, pressure class 250, same table [read, 14–64 in]. The table lists no class 250
 * below 14 in (3–12 in are made only as class 350), so those sizes are left out of this series.
 */
// prettier-ignore
const PC250_WALL: Readonly<Record<string, number>> = {
  14: 0.28, 16: 0.3, 18: 0.31, 20: 0.33, 24: 0.37, 30: 0.42, 36: 0.47, 42: 0.52, 48: 0.58,
  54: 0.65, 60: 0.68, 64: 0.72,
};

/** Sizes in ascending OD from a wall table in inches, stored in metres, rated at the pressure class (psi). */
const sizesFrom = (walls: Readonly<Record<string, number>>, pressureClass: number) =>
  Object.keys(walls)
    .map((n) => sizeFromWall(n, `${n} in`, C151_OD[n]! * INCH, walls[n]! * INCH, awwaDuctileIronRating(pressureClass)))
    .sort((a, b) => a.outsideDiameter - b.outsideDiameter);

const STANDARD = 'AWWA C151/A21.51 outside diameters; AWWA C150/A21.50 standard pressure-class wall table';

export const DI_AWWA_PC350: PipeSeries = {
  id: 'di-awwa-pc350',
  label: 'Ductile iron, AWWA C151, pressure class 350',
  material: 'ductile-iron',
  sizing: 'inch',
  standard: STANDARD,
  wallBasis: 'ID = OD − 2 × t, t the pressure class 350 nominal wall of AWWA C150/C151 (cement lining not deducted)',
  sizes: sizesFrom(PC350_WALL, 350),
};

export const DI_AWWA_PC250: PipeSeries = {
  id: 'di-awwa-pc250',
  label: 'Ductile iron, AWWA C151, pressure class 250',
  material: 'ductile-iron',
  sizing: 'inch',
  standard: STANDARD,
  wallBasis:
    'ID = OD − 2 × t, t the pressure class 250 nominal wall of AWWA C150/C151 (cement lining not deducted); ' +
    'class 250 is not listed below 14 in',
  sizes: sizesFrom(PC250_WALL, 250),
};
