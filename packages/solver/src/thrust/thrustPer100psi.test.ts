import { describe, it } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { bendRoute, inches, psi, route, LBF } from '../../test/projectBuilder.js';
import { expectClose, expectPrinted } from '../../test/tolerance.js';

/** Ductile-iron outside diameters, in — AWWA C151/A21.51, as read in domain reference §7.1. */
const C151_OD: [number, number][] = [
  [4, 4.8],
  [6, 6.9],
  [8, 9.05],
  [10, 11.1],
  [12, 13.2],
  [14, 15.3],
  [16, 17.4],
  [18, 19.5],
  [20, 21.6],
  [24, 25.8],
  [30, 32.0],
  [36, 38.3],
  [42, 44.5],
  [48, 50.8],
];

const deadEnd = (od: number) =>
  route({
    pressure: psi(100),
    nodes: [
      { id: 'n1', x: 0, y: 0 },
      { id: 'n2', x: 12, y: 3 },
    ],
    pipes: [{ from: 'n1', to: 'n2', od }],
  });

const thrustLb = (p: ReturnType<typeof route>, node: string) =>
  Math.hypot(...analyse(p).byNode.get(node)!.envelope.governing.total) / LBF;

describe('thrust per 100 psi on ductile iron, P × A on the C151 OD (hand formula)', () => {
  // Expected values by the textbook special cases: dead end P·A, bend 2·P·A·sin(Δ/2), A = π/4·OD².
  for (const [nominal, od] of C151_OD) {
    const pa = 100 * (Math.PI / 4) * od * od; // lb
    it(`${nominal}-in: dead end ${pa.toFixed(0)} lb and every standard bend`, () => {
      expectClose(thrustLb(deadEnd(inches(od)), 'n2'), pa, 1e-9);
      for (const deg of [90, 45, 22.5, 11.25]) {
        const expected = 2 * pa * Math.sin((deg * Math.PI) / 360);
        expectClose(thrustLb(bendRoute(deg, inches(od), psi(100)), 'n2'), expected, 1e-9);
      }
    });
  }

  it('4-in matches the classic thrust-per-100-psi table: 1,810 / 2,559 / 1,385 / 706 / 355 lb (CV-8; table values from memory)', () => {
    expectPrinted(thrustLb(deadEnd(inches(4.8)), 'n2'), 1_810);
    expectPrinted(thrustLb(bendRoute(90, inches(4.8), psi(100)), 'n2'), 2_559);
    expectPrinted(thrustLb(bendRoute(45, inches(4.8), psi(100)), 'n2'), 1_385);
    expectPrinted(thrustLb(bendRoute(22.5, inches(4.8), psi(100)), 'n2'), 706);
    expectPrinted(thrustLb(bendRoute(11.25, inches(4.8), psi(100)), 'n2'), 355);
  });

  it('the bend factor 2·sin(Δ/2) is 1.414214, 0.765367, 0.390181, 0.196034, 1.000000 for 90°, 45°, 22.5°, 11.25°, 60° (CV-1)', () => {
    const od = inches(12);
    const pa = thrustLb(deadEnd(od), 'n2');
    const factors: [number, number][] = [
      [90, 1.414214],
      [45, 0.765367],
      [22.5, 0.390181],
      [11.25, 0.196034],
      [60, 1.0],
    ];
    // printed to six decimals: within half a unit of the last digit
    for (const [deg, factor] of factors)
      expectClose(thrustLb(bendRoute(deg, od, psi(100)), 'n2') / pa, factor, 0, 5e-7);
  });
});
