import { value, type CalcStep } from '../analysis/calcRecord.js';
import { roundDownTo, roundUpTo } from './rounding.js';

export interface TrenchBottomBearing {
  /** m², required bearing area under the fitting SF·T_down/σ_v */
  bearingArea: number;
  /** m, across the trench: the trench width taken down to the step, so that the pad fits between its walls */
  width: number;
  /** m, along the pipe, rounded up to the step */
  length: number;
}

/**
 * Downward thrust at a sag bend bears on the trench bottom (the vector sum of the pressure forces
 * has a −z part): the
 * same bearing equation as a block, A = SF·T/σ_v, with the soil's vertical bearing value; the pad is
 * as wide as the trench allows in whole steps (a pad rounded up past the trench width cannot be cast in
 * it) and as long as the area needs at that width (at least one OD).
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
  const stepped = roundDownTo(trenchWidth, step);
  const width = stepped > 0 ? stepped : trenchWidth;
  const length = Math.max(roundUpTo(bearingArea / width, step), roundUpTo(outsideDiameter, step));
  return {
    bearing: { bearingArea, width, length },
    steps: !record
      ? []
      : [
          {
            title: 'Bearing on the trench bottom',
            formula: 'A = SF · T_down / σ_v;  width = trench width down to the step;  length = A / width',
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
