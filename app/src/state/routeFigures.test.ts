import { describe, expect, it } from 'vitest';
import { norm, type Analysis, type FittingAnalysis } from '@mainbrace/solver';
import { largestThrusts } from './routeFigures.js';

/** A stand-in analysis whose fittings carry only a governing thrust (all largestThrusts reads). */
const withThrusts = (forces: number[]): Analysis =>
  ({
    fittings: forces.map((x, i) => ({ mark: `A${i + 1}`, envelope: { governing: { total: [x, 0, 0] } } })),
  }) as unknown as Analysis;

/** The reference: a stable sort of every fitting, largest first (Array.prototype.sort is stable). */
const bySort = (a: Analysis, n: number): FittingAnalysis[] =>
  [...a.fittings].sort((x, y) => norm(y.envelope.governing.total) - norm(x.envelope.governing.total)).slice(0, n);

describe('the largest thrusts of a route', () => {
  it('are the first of a stable sort, ties in route order, for any count (pseudo-random forces)', () => {
    let seed = 7;
    const next = () => ((seed = (seed * 16807) % 2147483647) % 40) - 20;
    for (let trial = 0; trial < 200; trial++) {
      const a = withThrusts(Array.from({ length: trial % 23 }, next));
      for (const n of [0, 1, 5, 6, 30])
        expect(largestThrusts(a, n).map((f) => f.mark)).toEqual(bySort(a, n).map((f) => f.mark));
    }
  });
});
