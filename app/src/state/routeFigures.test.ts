import { describe, expect, it } from 'vitest';
import { analyseProject, norm, type Analysis, type FittingAnalysis } from '@mainbrace/solver';
import { largestThrusts, networkLength, routeSummary, tightestMargins } from './routeFigures.js';
import { chain } from '../testFixtures.js';

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

/** A stand-in analysis whose fittings carry only a block's passive margin, or no block (null). */
const withMargins = (ratios: (number | null)[]): Analysis =>
  ({
    fittings: ratios.map((r, i) => ({
      mark: `A${i + 1}`,
      restraint: { block: r === null ? null : { passiveRatio: r } },
    })),
  }) as unknown as Analysis;

describe('the tightest passive margins of a route', () => {
  it('are the first of a stable sort of the blocked fittings, ties in route order (pseudo-random margins)', () => {
    let seed = 11;
    const next = () => ((seed = (seed * 16807) % 2147483647) % 9) / 4;
    for (let trial = 0; trial < 200; trial++) {
      const ratios = Array.from({ length: trial % 19 }, () => (next() > 1.5 ? null : next()));
      const a = withMargins(ratios);
      const bySortedMargin = a.fittings
        .filter((f) => f.restraint.block)
        .sort((x, y) => x.restraint.block!.passiveRatio - y.restraint.block!.passiveRatio);
      for (const n of [0, 1, 5, 30])
        expect(tightestMargins(a, n).map((f) => f.mark)).toEqual(bySortedMargin.slice(0, n).map((f) => f.mark));
    }
  });
});

describe('the route summary, kept across edits that leave the route', () => {
  // Hand count: a 30 m leg east and a 40 m leg north (3-4-5 triangle) is 70 m of main in one piece.
  const doc = () => chain([0, 0], [30, 0], [30, 40]);

  it('gives the length and pieces of the route it was asked about, edit after edit', () => {
    const p = doc();
    const a = analyseProject(p);
    expect(routeSummary(a).length).toBeCloseTo(70, 9);
    expect(routeSummary(a).pieces).toBe(1);
    const pressed = analyseProject({ ...p, loadCases: p.loadCases.map((c) => ({ ...c, pressure: 2e6 })) });
    expect(routeSummary(pressed).pieces).toBe(1);
    // A lone 10 m pipe away from the main: a second piece and 80 m in all.
    const apart = {
      ...p,
      nodes: [...p.nodes, { ...p.nodes[0]!, id: 'n4', x: 100 }, { ...p.nodes[0]!, id: 'n5', x: 110 }],
      pipes: [...p.pipes, { ...p.pipes[0]!, id: 'p9', from: 'n4', to: 'n5' }],
    };
    const b = analyseProject(apart);
    expect(routeSummary(b).pieces).toBe(2);
    expect(networkLength(b)).toBeCloseTo(80, 9);
    // The same pipes with a node moved: the pieces are counted again, not taken from the pipes alone.
    expect(routeSummary(analyseProject({ ...apart, nodes: apart.nodes.slice(0, 3) })).pieces).toBe(1);
  });
});
