import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { analyse } from '../analysis/analyse.js';
import { concretePieces } from '../schedule/concrete.js';
import { route } from '../../test/projectBuilder.js';

/**
 * Raising the pressure never lowers the concrete at a fitting (invariant). The thrust
 * of every part grows in proportion to the pressure, so the restraint that holds it must not shrink:
 * a block that just fails to hold an uplift by its weight is thickened, or joined by an anchor, but is
 * never swapped for less concrete.
 */
interface Shape {
  /** plan angle of the outgoing pipe, degrees */
  turn: number;
  /** rise of the outgoing pipe over 10 m of run, m */
  rise: number;
  /** a dead end instead of a bend */
  deadEnd: boolean;
  /** groundwater elevation, or null */
  groundwater: number | null;
  frictionAngle: number;
  cohesion: number;
  bearing: number;
  od: number;
}

const project = (s: Shape, pressure: number) => {
  const r = (s.turn * Math.PI) / 180;
  const nodes = s.deadEnd
    ? [
        { id: 'a', x: -10, y: 0, z: 100 - s.rise },
        { id: 'c', x: 0, y: 0, z: 100 },
      ]
    : [
        { id: 'a', x: -20, y: 0, z: 100 },
        { id: 'c', x: 0, y: 0, z: 100 },
        { id: 'b', x: 10 * Math.cos(r), y: 10 * Math.sin(r), z: 100 + s.rise },
      ];
  const pipes = s.deadEnd
    ? [{ from: 'a', to: 'c', od: s.od }]
    : [
        { from: 'a', to: 'c', od: s.od },
        { from: 'c', to: 'b', od: s.od },
      ];
  return route({
    pressure,
    nodes,
    pipes,
    soils: [
      {
        id: 's',
        bearing: s.bearing,
        unitWeight: 18000,
        frictionAngle: s.frictionAngle,
        cohesion: s.cohesion,
      },
    ],
    design: { groundwaterElevation: s.groundwater },
  });
};

/**
 * The concrete of the blocks and the anchor at the fitting, or null where no concrete holds and the
 * fitting carries an error instead. A trench-bottom pad is left out: it is needed only while the block's
 * base is too small for the downward thrust, so a block grown by more pressure may make it unneeded.
 */
const concreteAt = (s: Shape, pressure: number): number | null => {
  // A straight joint is no fitting and needs no concrete.
  const a = analyse(project(s, pressure));
  const f = a.byNode.get('c');
  if (!f) return 0;
  if (f.diagnostics.some((d) => d.severity === 'error')) return null;
  return concretePieces(f.restraint, a.project.design.dimensionStep, 'si')
    .filter((p) => p.element !== 'pad')
    .reduce((v, p) => v + p.volume, 0);
};

const shapes = fc.record({
  turn: fc.integer({ min: 0, max: 900 }).map((t) => t / 10),
  rise: fc.integer({ min: -80, max: 80 }).map((r) => r / 10),
  deadEnd: fc.boolean(),
  groundwater: fc.option(fc.double({ min: 97, max: 102, noNaN: true }), { nil: null }),
  frictionAngle: fc.double({ min: 15, max: 40, noNaN: true }),
  cohesion: fc.constantFrom(0, 5000, 20000),
  bearing: fc.double({ min: 50e3, max: 300e3, noNaN: true }),
  od: fc.double({ min: 0.1, max: 0.9, noNaN: true }),
});

describe('quantities grow with pressure (invariant)', () => {
  it('a dead end rising 1 in 10: the concrete never falls over 100 kPa … 3 MPa in 1 % steps', () => {
    const s: Shape = {
      turn: 0,
      rise: 1,
      deadEnd: true,
      groundwater: null,
      frictionAngle: 30,
      cohesion: 0,
      bearing: 95761,
      od: 0.326,
    };
    let last = 0;
    for (let p = 100e3; p <= 3e6; p *= 1.01) {
      const v = concreteAt(s, p);
      expect(v).not.toBeNull();
      expect(v!).toBeGreaterThanOrEqual(last - 1e-12);
      last = v!;
    }
  });

  it('for random bends and dead ends, soils and groundwater, more pressure never means less concrete', () => {
    fc.assert(
      fc.property(shapes, fc.double({ min: 100e3, max: 2.5e6, noNaN: true }), (s, p) => {
        const lower = concreteAt(s, p);
        if (lower === null) return; // already not adequate: an error, restrained joints instead
        for (const k of [1.01, 1.1, 1.5]) {
          // More concrete, or none that holds — then an error diagnostic says so, never a silent drop.
          const higher = concreteAt(s, p * k);
          if (higher !== null) expect(higher).toBeGreaterThanOrEqual(lower - 1e-12);
        }
      }),
      { numRuns: 80, seed: 17 },
    );
  });
});
