import { value, type CalcStep } from '../analysis/calcRecord.js';
import { roundUpTo } from './rounding.js';

export interface TrenchBottomBearing {
  /** m², required bearing area under the fitting SF·T_down/σ_v */
  bearingArea: number;
  /** m, across the trench: the trench width rounded up to the step (a built dimension) */
  width: number;
  /** m, along the pipe, rounded up to the step */
  length: number;
}

/**
 * Downward thrust at a sag bend bears on the trench bottom (the vector sum of the pressure forces
 * has a −z part): the
 * same bearing equation as a block, A = SF·T/σ_v, with the soil's vertical bearing value; the pad is
 * the trench's width and as long as the area needs (at least one OD).
 */
export function sizeTrenchBottom(
  downward: number,
  safetyFactor: number,
  verticalBearing: number,
  trenchWidth: number,
  outsideDiameter: number,
  step: number,
  record = false,
): { bearing: TrenchBottomBearing; steps: CalcStep[] } {
  const bearingArea = (safetyFactor * downward) / verticalBearing;
  const length = Math.max(roundUpTo(bearingArea / trenchWidth, step), roundUpTo(outsideDiameter, step));
  return {
    bearing: { bearingArea, width: roundUpTo(trenchWidth, step), length },
    steps: !record
      ? []
      : [
          {
            title: 'Bearing on the trench bottom',
            formula: 'A = SF · T_down / σ_v;  length = A / trench width',
            inputs: [
              value('T_down', 'largest downward thrust', downward, 'force', 'momentum balance'),
              value('SF', 'bearing safety factor', safetyFactor, 'ratio', 'project design'),
              value('σ_v', 'allowable vertical bearing', verticalBearing, 'stress', 'soil'),
              value('B', 'trench width', trenchWidth, 'length', 'design or OD + 0.6 m'),
            ],
            result: value('A', 'required bearing area', bearingArea, 'area', 'computed'),
            reference: 'Bearing equation A = SF·T/σ (DIPRA) applied to the trench bottom',
          },
        ],
  };
}
