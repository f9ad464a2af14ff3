import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseProject, parseProjectText } from '../src/model/parseProject.js';
import { analyse } from '../src/analysis/analyse.js';
import { scheduleOf } from '../src/schedule/scheduleOf.js';
import { randomRoute } from './randomRoutes.js';
import { route } from './projectBuilder.js';

const demo = JSON.parse(
  readFileSync(fileURLToPath(new URL('../../../public/demo/larkspur-rise.json', import.meta.url)), 'utf8'),
);
const runs = { seed: 424242, numRuns: 300 };

/** Every refusal names where: a path into the file, or the line and column of broken JSON. */
function expectNamedRefusal(r: ReturnType<typeof parseProject>) {
  if (r.ok) return;
  expect(r.problems.length).toBeGreaterThan(0);
  for (const p of r.problems) {
    expect(p.message.length).toBeGreaterThan(0);
    expect(p.path.length > 0 || /^not valid JSON( at line \d+, column \d+)?/.test(p.message)).toBe(true);
  }
}

/** A copy of the demo with one value somewhere replaced by an arbitrary JSON value. */
function mutate(doc: unknown, path: number[], value: unknown): unknown {
  const copy = structuredClone(doc) as Record<string, unknown>;
  let at: unknown = copy;
  for (let i = 0; i < path.length; i++) {
    if (at === null || typeof at !== 'object') break;
    const keys = Object.keys(at as object);
    if (keys.length === 0) break;
    const key = keys[path[i]! % keys.length]!;
    if (i === path.length - 1) (at as Record<string, unknown>)[key] = value;
    else at = (at as Record<string, unknown>)[key];
  }
  return copy;
}

describe('the project-file parser under random and mutated input (fast-check, fixed seed)', () => {
  it('never throws on arbitrary JSON values, and every refusal names a path', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => expectNamedRefusal(parseProject(v))),
      runs,
    );
  });

  it('never throws on arbitrary text, and names the line and column of broken JSON', () => {
    fc.assert(
      fc.property(fc.string(), (t) => expectNamedRefusal(parseProjectText(t))),
      runs,
    );
  });

  it('never throws on the demo with one value replaced anywhere, and a refusal names a path', () => {
    fc.assert(
      fc.property(fc.array(fc.nat(40), { minLength: 1, maxLength: 5 }), fc.jsonValue(), (path, value) => {
        const r = parseProject(mutate(demo, path, value));
        expectNamedRefusal(r);
        if (r.ok) expect(() => scheduleOf(analyse(r.project))).not.toThrow();
      }),
      runs,
    );
    // a fixed number of runs, each a whole analysis: on a loaded machine it outlasts the default 5 s,
    // and speed is the benchmarks' business, not this test's
  }, 30_000);
});

const finiteEverywhere = (v: unknown): boolean => {
  if (typeof v === 'number') return Number.isFinite(v);
  if (Array.isArray(v)) return v.every(finiteEverywhere);
  if (v && typeof v === 'object') return Object.values(v).every(finiteEverywhere);
  return true;
};

describe('schedules of random routes', () => {
  it('hold no NaN or Infinity anywhere, whatever the soils, cases, groundwater and restraint methods', () => {
    fc.assert(
      fc.property(
        randomRoute({ flows: true }),
        fc.record({
          bearing: fc.constantFrom(0, 47880, 191520),
          cohesion: fc.constantFrom(0, 12000),
          phi: fc.constantFrom(0, 28, 36),
          gw: fc.constantFrom(null, 90, 105, 130),
          joints: fc.boolean(),
          pressure: fc.constantFrom(0, 400e3, 1.4e6),
          datum: fc.constantFrom(undefined, 80, 140),
          cover: fc.constantFrom(0.1, 1.2, 4),
        }),
        (r, o) => {
          const project = route({
            cases: [
              {
                id: 'w',
                pressure: o.pressure,
                ...(o.datum !== undefined ? { datumElevation: o.datum } : {}),
                flowFactor: 1,
              },
              { id: 't', pressure: o.pressure * 1.5, datumElevation: 90, flowFactor: 0 },
            ],
            soils: [{ id: 's', bearing: o.bearing, unitWeight: 18000, frictionAngle: o.phi, cohesion: o.cohesion }],
            design: { groundwaterElevation: o.gw },
            nodes: r.nodes.map((n, i) => ({
              ...n,
              cover: o.cover,
              ...(o.joints && i % 2 ? { restraint: 'joints' } : {}),
            })),
            pipes: r.pipes,
          });
          expect(finiteEverywhere(scheduleOf(analyse(project)))).toBe(true);
        },
      ),
      { seed: 777, numRuns: 200 },
    );
  });
});
