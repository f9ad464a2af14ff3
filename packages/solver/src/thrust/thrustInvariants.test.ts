import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { bendRoute, inches, psi, route, LBF } from '../../test/projectBuilder.js';
import { expectClose, expectPrinted } from '../../test/tolerance.js';

// Invariants of the static momentum balance, T = −Σ P·A·n over a fitting's openings: they hold whatever
// the pipe, so a slip in the vector sum, the area or a unit breaks one of them. No published
// thrust-per-100-psi table was read; the 4-in numbers below are hand-computed (docs/check-values.md CV-8).

const deadEnd = (od: number, pressure = psi(100)) =>
  route({
    pressure,
    nodes: [
      { id: 'n1', x: 0, y: 0 },
      { id: 'n2', x: 12, y: 3 },
    ],
    pipes: [{ from: 'n1', to: 'n2', od }],
  });

const thrust = (p: ReturnType<typeof route>, node: string) =>
  Math.hypot(...analyse(p).byNode.get(node)!.envelope.governing.total);

/** AWWA C151 ODs, in (docs/check-values.md CV-26), the sizes the invariants are swept over. */
const ODS = [4.8, 6.9, 9.05, 11.1, 13.2, 17.4, 25.8, 38.3, 50.8];

describe('invariants of the static thrust', () => {
  it('grows in proportion to the pressure and to the square of the outside diameter', () => {
    for (const od of ODS) {
      const base = thrust(deadEnd(inches(od)), 'n2');
      expectClose(thrust(deadEnd(inches(od), psi(250)), 'n2') / base, 2.5, 1e-12);
      expectClose(thrust(deadEnd(inches(2 * od)), 'n2') / base, 4, 1e-12);
    }
  });

  it('a bend pushes the resultant of two equal P·A forces: growing with Δ, equal to the dead end at 60°, √2 × that at 90°', () => {
    for (const od of ODS) {
      const pa = thrust(deadEnd(inches(od)), 'n2');
      // each bend's thrust is the chord of two unit vectors Δ apart: monotone in Δ, and 90° is √2 × 60°
      const at = (deg: number) => thrust(bendRoute(deg, inches(od), psi(100)), 'n2');
      expect(at(11.25)).toBeLessThan(at(22.5));
      expect(at(22.5)).toBeLessThan(at(45));
      expect(at(45)).toBeLessThan(at(90));
      expectClose(at(90) / at(60), Math.SQRT2, 1e-9);
      expectClose(at(60) / pa, 1, 1e-9); // a 60° bend's two forces and their resultant form an equilateral triangle
    }
  });

  it('a 90° bend pushes "nearly twice" a 45° bend: 1.848 × (a pipe manufacturer’s design bulletin; 2·sin 45° / 2·sin 22.5°, docs/check-values.md CV-1)', () => {
    const od = inches(12.75);
    expectClose(thrust(bendRoute(90, od, psi(100)), 'n2') / thrust(bendRoute(45, od, psi(100)), 'n2'), 1.847759, 1e-6);
  });

  it('the bend factor is 1.414214, 0.765367, 0.390181, 0.196034 for 90°, 45°, 22.5°, 11.25° (CV-1, six decimals)', () => {
    const od = inches(12);
    const pa = thrust(deadEnd(od), 'n2');
    for (const [deg, factor] of [
      [90, 1.414214],
      [45, 0.765367],
      [22.5, 0.390181],
      [11.25, 0.196034],
    ] as const)
      expectClose(thrust(bendRoute(deg, od, psi(100)), 'n2') / pa, factor, 0, 5e-7);
  });

  it('4-in (OD 4.80 in) at 100 psi, worked by hand: 1,810 / 2,559 / 1,385 / 706 / 355 lb (CV-8, computed)', () => {
    // A = π/4 × 4.8² = 18.0956 in²; P·A = 1,809.6 lb; × 1.414214, 0.765367, 0.390181, 0.196034
    // = 2,559.2, 1,385.0, 706.1, 354.7 lb.
    const od = inches(4.8);
    expectPrinted(thrust(deadEnd(od), 'n2') / LBF, 1_810);
    expectPrinted(thrust(bendRoute(90, od, psi(100)), 'n2') / LBF, 2_559);
    expectPrinted(thrust(bendRoute(45, od, psi(100)), 'n2') / LBF, 1_385);
    expectPrinted(thrust(bendRoute(22.5, od, psi(100)), 'n2') / LBF, 706);
    expectPrinted(thrust(bendRoute(11.25, od, psi(100)), 'n2') / LBF, 355);
  });
});
