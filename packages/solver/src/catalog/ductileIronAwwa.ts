import { INCH } from '../units/conversions.js';
import { sizeFromWall, type PipeSeries } from './pipeSeries.js';

/**
 * Ductile-iron outside diameters, in — AWWA C151/A21.51 (constant for every pressure class),
 * as read in domain reference §7.1.
 */
export const C151_OD: Readonly<Record<string, number>> = {
  3: 3.96, 4: 4.8, 6: 6.9, 8: 9.05, 10: 11.1, 12: 13.2, 14: 15.3, 16: 17.4, 18: 19.5, 20: 21.6,
  24: 25.8, 30: 32.0, 36: 38.3, 42: 44.5, 48: 50.8, 54: 57.56, 60: 61.61, 64: 65.67,
};

/**
 * Nominal wall, in, pressure class 350 — AWWA C150/C151 pressure-class table, read as reproduced in
 * a county utility specification (3–64 in).
 */
const PC350_WALL: Readonly<Record<string, number>> = {
  3: 0.25, 4: 0.25, 6: 0.25, 8: 0.25, 10: 0.26, 12: 0.28, 14: 0.31, 16: 0.34, 18: 0.36, 20: 0.38,
  24: 0.43, 30: 0.49, 36: 0.56, 42: 0.63, 48: 0.7, 54: 0.79, 60: 0.83, 64: 0.87,
};

/**
 * Nominal wall, in, pressure class 250 — AWWA C150/C151. 54–64 in read from a manufacturer's
 * reproduction of the table; 14–48 in from memory. The class is not made below 14 in (the smallest
 * class there is 350).
 */
const PC250_WALL: Readonly<Record<string, number>> = {
  14: 0.28, 16: 0.3, 18: 0.31, 20: 0.33, 24: 0.37, 30: 0.42, 36: 0.47, 42: 0.52, 48: 0.58,
  54: 0.65, 60: 0.68, 64: 0.72,
};

const series = (walls: Readonly<Record<string, number>>) =>
  Object.entries(walls)
    .map(([n, t]) => sizeFromWall(n, `${n} in`, C151_OD[n]! * INCH, t * INCH))
    .sort((a, b) => a.outsideDiameter - b.outsideDiameter);

export const DI_AWWA_PC350: PipeSeries = {
  id: 'di-awwa-pc350',
  label: 'Ductile iron, AWWA C151, pressure class 350',
  material: 'ductile-iron',
  standard: 'AWWA C151/A21.51 outside diameters; AWWA C150 pressure-class walls',
  wallBasis: 'ID = OD − 2 × nominal wall of pressure class 350 (lining not deducted)',
  sizes: series(PC350_WALL),
};

export const DI_AWWA_PC250: PipeSeries = {
  id: 'di-awwa-pc250',
  label: 'Ductile iron, AWWA C151, pressure class 250',
  material: 'ductile-iron',
  standard: 'AWWA C151/A21.51 outside diameters; AWWA C150 pressure-class walls',
  wallBasis: 'ID = OD − 2 × nominal wall of pressure class 250 (14–48 in from memory; lining not deducted)',
  sizes: series(PC250_WALL),
};
