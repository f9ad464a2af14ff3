import fc from 'fast-check';
import type { NodeSpec, PipeSpec } from './projectBuilder.js';

/** Outside diameters drawn for random routes, m (EN 545 DN100–DN600, domain reference §7.4). */
const ODS = [0.118, 0.17, 0.222, 0.274, 0.326, 0.429, 0.532, 0.635];

export interface RandomRoute {
  nodes: NodeSpec[];
  pipes: PipeSpec[];
}

/**
 * A random tree of pipes: node i joins a random earlier node, points on a 1 m grid kept apart so
 * no pipe has zero length; optional random elevations and flows.
 */
export function randomRoute(opts: { level?: boolean; flows?: boolean } = {}): fc.Arbitrary<RandomRoute> {
  return fc
    .integer({ min: 2, max: 14 })
    .chain((n) =>
      fc.record({
        points: fc.uniqueArray(fc.tuple(fc.integer({ min: -60, max: 60 }), fc.integer({ min: -60, max: 60 })), {
          minLength: n,
          maxLength: n,
          selector: ([x, y]) => `${x},${y}`,
        }),
        parents: fc.array(fc.nat(), { minLength: n, maxLength: n }),
        sizes: fc.array(fc.constantFrom(...ODS), { minLength: n, maxLength: n }),
        elevations: fc.array(fc.integer({ min: 80, max: 120 }), { minLength: n, maxLength: n }),
        flows: fc.array(fc.integer({ min: -200, max: 200 }), { minLength: n, maxLength: n }),
      }),
    )
    .map(({ points, parents, sizes, elevations, flows }) => ({
      nodes: points.map(([x, y], i) => ({ id: `n${i}`, x, y, z: opts.level ? 100 : elevations[i]! })),
      pipes: points.slice(1).map((_, k) => {
        const i = k + 1;
        return {
          id: `p${i}`,
          from: `n${parents[i]! % i}`,
          to: `n${i}`,
          od: sizes[i]!,
          flow: opts.flows ? flows[i]! / 1000 : 0,
        };
      }),
    }));
}
