import fc from 'fast-check';
import { route, type NodeSpec, type PipeSpec } from './projectBuilder.js';
import type { Project } from '../src/model/projectSchema.js';
import { OVERLAP_ANGLE } from '../src/model/routeRules.js';

/** Outside diameters drawn for random routes, m (EN 545:2010 external diameters, DN100–DN600). */
const ODS = [0.118, 0.17, 0.222, 0.274, 0.326, 0.429, 0.532, 0.635];

export interface RandomRoute {
  nodes: NodeSpec[];
  pipes: PipeSpec[];
}

/** True when no two pipes leave a node within OVERLAP_ANGLE of one line (the project format refuses that). */
function noOverlap(r: RandomRoute): boolean {
  const at = new Map(r.nodes.map((n) => [n.id, n]));
  const leaving = new Map<string, number[][]>();
  const limit = Math.cos((OVERLAP_ANGLE * Math.PI) / 180);
  for (const p of r.pipes) {
    const a = at.get(p.from)!;
    const b = at.get(p.to)!;
    const d = [b.x - a.x, b.y - a.y, (b.z ?? 100) - (a.z ?? 100)];
    const len = Math.hypot(d[0]!, d[1]!, d[2]!);
    const u = d.map((v) => v / len);
    for (const [id, dir] of [
      [a.id, u],
      [b.id, u.map((v) => -v)],
    ] as const) {
      const list = leaving.get(id) ?? [];
      if (list.some((o) => o[0]! * dir[0]! + o[1]! * dir[1]! + o[2]! * dir[2]! > limit)) return false;
      leaving.set(id, [...list, dir]);
    }
  }
  return true;
}

/**
 * A random tree of pipes: node i joins a random earlier node, points on a 1 m grid kept apart so
 * no pipe has zero length and no two pipes leave a node along one line; optional random elevations
 * and flows.
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
    }))
    .filter(noOverlap);
}

/** Flags, cases and soils drawn beside a random route, so that valves, joints and reversals occur. */
export const routeExtras = fc.record({
  valves: fc.array(fc.boolean(), { minLength: 14, maxLength: 14 }),
  joints: fc.array(fc.boolean(), { minLength: 14, maxLength: 14 }),
  caps: fc.array(fc.boolean(), { minLength: 14, maxLength: 14 }),
  working: fc.integer({ min: 0, max: 2500 }).map((k) => k * 1e3),
  test: fc.integer({ min: 0, max: 3000 }).map((k) => k * 1e3),
  datum: fc.option(fc.integer({ min: 80, max: 120 }), { nil: undefined }),
  bearing: fc.constantFrom(0, 50e3, 150e3),
  groundwater: fc.option(fc.integer({ min: 80, max: 125 }), { nil: null }),
  inside: fc.boolean(),
});

export type RouteExtras = typeof routeExtras extends fc.Arbitrary<infer T> ? T : never;

/** A random route with the drawn flags, cases and soils applied. */
export function routeWithExtras(r: RandomRoute, x: RouteExtras): Project {
  return route({
    nodes: r.nodes.map((n, i) => ({
      ...n,
      ...(x.valves[i] ? { valve: true } : {}),
      ...(x.joints[i] ? { restraint: 'joints' } : {}),
      ...(x.caps[i] ? {} : { end: 'tie-in' }),
    })),
    pipes: r.pipes.map((p, i) => (i % 3 === 2 ? { ...p, material: 'pvc' } : p)),
    cases: [
      { id: 'working', pressure: x.working, ...(x.datum !== undefined ? { datumElevation: x.datum } : {}) },
      { id: 'surge', pressure: x.working * 1.5 + 1e5, flowFactor: 0.5 },
      { id: 'test', pressure: x.test, flowFactor: 0, datumElevation: 95 },
    ],
    soils: [
      { id: 'clay', bearing: x.bearing, cohesion: 20e3, frictionAngle: 20 },
      { id: 'sand', bearing: 120e3 },
    ],
    design: { groundwaterElevation: x.groundwater, thrustArea: x.inside ? 'inside' : 'outside' },
  });
}
