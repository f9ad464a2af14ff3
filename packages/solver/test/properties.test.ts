import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { analyse } from '../src/analysis/analyse.js';
import { legsByNode } from '../src/network/legs.js';
import { fittingGeometry } from '../src/network/fittingKind.js';
import { fittingThrust } from '../src/thrust/fittingThrust.js';
import { DISPLAY_UNITS, fromDisplay, toDisplay, type Dimension } from '../src/units/conversions.js';
import { route } from './projectBuilder.js';
import { randomRoute, type RandomRoute } from './randomRoutes.js';
import { expectClose, expectVecClose } from './tolerance.js';

const SEED = 20261202;
const runs = { seed: SEED, numRuns: 150 };

/** Force at every node (schedule or not) of a random route, by node id. */
function allForces(r: RandomRoute, pressure: number, transform?: (x: number, y: number) => [number, number]) {
  const p = route({
    pressure,
    nodes: r.nodes.map((n) => {
      const [x, y] = transform ? transform(n.x, n.y) : [n.x, n.y];
      return { ...n, x, y };
    }),
    pipes: r.pipes,
  });
  const legs = legsByNode(p);
  return new Map(
    p.nodes.map((n) => {
      const l = legs.get(n.id) ?? [];
      const g = fittingGeometry(n, l);
      return [n.id, fittingThrust(n, g.kind, l, p.loadCases, p.water.density)[0]!.total];
    }),
  );
}

describe('invariants of the momentum balance on random routes (fast-check, fixed seed)', () => {
  it('a level network of capped pipes at one pressure, without flow, has forces that sum to zero', () => {
    fc.assert(
      fc.property(randomRoute({ level: true }), (r) => {
        const forces = [...allForces(r, 1e6).values()];
        const sum = forces.reduce((a, f) => [a[0] + f[0], a[1] + f[1], a[2] + f[2]], [0, 0, 0]);
        const scale = Math.max(...forces.map((f) => Math.hypot(...f)));
        expect(Math.hypot(...sum)).toBeLessThan(1e-9 * scale + 1e-6);
      }),
      runs,
    );
  });

  it('rotating the whole route rotates every force', () => {
    fc.assert(
      fc.property(randomRoute({ flows: true }), fc.integer({ min: 1, max: 359 }), (r, deg) => {
        const c = Math.cos((deg * Math.PI) / 180);
        const s = Math.sin((deg * Math.PI) / 180);
        const rot = (x: number, y: number): [number, number] => [c * x - s * y, s * x + c * y];
        const before = allForces(r, 8e5);
        const after = allForces(r, 8e5, rot);
        for (const [id, f] of before) {
          const [x, y] = rot(f[0], f[1]);
          expectVecClose(after.get(id)!, [x, y, f[2]], 1e-9);
        }
      }),
      runs,
    );
  });

  it('mirroring the whole route east–west mirrors every force', () => {
    fc.assert(
      fc.property(randomRoute({ flows: true }), (r) => {
        const before = allForces(r, 8e5);
        const after = allForces(r, 8e5, (x, y) => [-x, y]);
        for (const [id, f] of before) expectVecClose(after.get(id)!, [-f[0], f[1], f[2]], 1e-9);
      }),
      runs,
    );
  });

  it('thrust grows with pressure at every fitting', () => {
    fc.assert(
      fc.property(
        randomRoute(),
        fc.integer({ min: 100, max: 2000 }),
        fc.integer({ min: 1, max: 1000 }),
        (r, kpa, more) => {
          const low = allForces(r, kpa * 1000);
          const high = allForces(r, (kpa + more) * 1000);
          for (const [id, f] of low) expect(Math.hypot(...high.get(id)!)).toBeGreaterThanOrEqual(Math.hypot(...f));
        },
      ),
      runs,
    );
  });

  it('a straight run of equal pipes has no fitting but its two ends', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 3, max: 30 }),
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        fc.array(fc.double({ min: 1, max: 80, noNaN: true }), { minLength: 30, maxLength: 30 }),
        (n, heading, steps) => {
          let d = 0;
          const nodes = Array.from({ length: n }, (_, i) => {
            if (i > 0) d += steps[i]!;
            // To the nanometre, as a file would hold it (no 1e-322 from a heading of 5e-324).
            const nm = (v: number) => Math.round(v * 1e9) / 1e9;
            return { id: `n${i}`, x: nm(d * Math.cos(heading)), y: nm(d * Math.sin(heading)) };
          });
          const pipes = nodes.slice(1).map((nd, i) => ({ from: `n${i}`, to: nd.id, od: 0.326, flow: 0.05 }));
          const fittings = analyse(route({ pressure: 1e6, nodes, pipes })).fittings.map((f) => f.node.id);
          expect(fittings).toEqual([`n0`, `n${n - 1}`]);
        },
      ),
      runs,
    );
  });
});

describe('display units', () => {
  it('every dimension converts to display units and back to the same SI value', () => {
    const dims = Object.keys(DISPLAY_UNITS.si) as Dimension[];
    fc.assert(
      fc.property(
        fc.constantFrom(...dims),
        fc.constantFrom('si' as const, 'us' as const),
        fc.double({ min: -1e9, max: 1e9, noNaN: true }),
        (dim, sys, v) => {
          expectClose(fromDisplay(toDisplay(v, dim, sys), dim, sys), v, 1e-12, 1e-12);
        },
      ),
      runs,
    );
  });
});
