import { PSI } from '../units/conversions.js';
import { VALUES } from '../provenance/registerValues.js';
import type { PressureRating } from './pipeSeries.js';

/** Pa per bar (EN and ISO pressures are stated in bar). */
export const BAR = 1e5;

/**
 * AWWA C151 ductile iron of a pressure class (psi): the class is the rated working pressure; the
 * C150 wall is designed for it plus a 100 psi surge allowance, and C600 keeps the field test within
 * the pipe's design pressure, so both other limits are the class + 100 psi (register: rating.di-awwa).
 */
export function awwaDuctileIronRating(pressureClass: number): PressureRating {
  const working = pressureClass * PSI;
  const limit = working + VALUES['rating.di-awwa'].surgeAllowance;
  return { label: `PC ${pressureClass}`, working, withSurge: limit, test: limit, basis: 'rating.di-awwa' };
}

/**
 * AWWA C900-16 PVC of a DR: the pressure class is the working rating; working plus an occasional
 * surge may reach 1.6 × the class, and the field test is held within that same design limit
 * (register: rating.pvc-c900).
 */
export function c900Rating(dr: 14 | 18 | 25): PressureRating {
  const r = VALUES['rating.pvc-c900'];
  const working = r[`dr${dr}`];
  const limit = r.occasionalSurgeFactor * working;
  return {
    label: `PC ${Math.round(working / PSI)}`,
    working,
    withSurge: limit,
    test: limit,
    basis: 'rating.pvc-c900',
  };
}

/**
 * AWWA C906 PE 4710 of a DR: working ≤ the class, working plus an occasional surge ≤ 2 × the class,
 * field test ≤ 1.5 × the class (register: rating.pe-c906).
 */
export function c906Rating(dr: 11 | 17): PressureRating {
  const r = VALUES['rating.pe-c906'];
  const working = r[`dr${dr}`];
  return {
    label: `PC ${Math.round(working / PSI)}`,
    working,
    withSurge: r.occasionalSurgeFactor * working,
    test: r.testFactor * working,
    basis: 'rating.pe-c906',
  };
}

/** EN 545 ductile iron of class Cxx: PFA = xx bar, PMA = 1.2·PFA, PEA = 1.2·PFA + 5 bar (register: rating.en545). */
export function en545Rating(pressureClass: string): PressureRating {
  const pfa = Number(pressureClass.replace(/^C/, '')) * BAR;
  const r = VALUES['rating.en545'];
  return {
    label: pressureClass,
    working: pfa,
    withSurge: r.pmaFactor * pfa,
    test: r.pmaFactor * pfa + r.peaMargin,
    basis: 'rating.en545',
  };
}

/** Metric PVC-U or PE of nominal pressure PN (bar): PFA = PN, PMA = 1.25·PFA, PEA = 1.5·PFA (register: rating.plastic-metric). */
export function metricPlasticRating(pn: number): PressureRating {
  const r = VALUES['rating.plastic-metric'];
  const pfa = pn * BAR;
  return {
    label: `PN ${pn}`,
    working: pfa,
    withSurge: r.pmaFactor * pfa,
    test: r.peaFactor * pfa,
    basis: 'rating.plastic-metric',
  };
}

/**
 * Pressure a plastic pipe of a standard dimension ratio holds at its design stress, from the thin
 * wall hoop stress σ = p·(SDR − 1)/2 (Barlow with the mean diameter): p = 2·σs/(SDR − 1), Pa.
 */
export const plasticPressure = (designStress: number, sdr: number): number => (2 * designStress) / (sdr - 1);
