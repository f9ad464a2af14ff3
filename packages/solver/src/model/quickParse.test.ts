import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { quickParse, QUICK_FIELDS } from './quickParse.js';
import { parseProject } from './parseProject.js';
import {
  designSchema,
  loadCaseSchema,
  nodeSchema,
  pipeSchema,
  projectShape,
  soilSchema,
  waterSchema,
} from './projectSchema.js';
import { generateRoute } from '../../bench/generateRoute.js';
import { routeInput } from '../../test/projectBuilder.js';
import { randomRoute } from '../../test/randomRoutes.js';

const demo = JSON.parse(
  readFileSync(fileURLToPath(new URL('../../../../public/demo/larkspur-rise.json', import.meta.url)), 'utf8'),
) as unknown;

/** As a file would hold it: through JSON text and back. */
const asFile = (v: unknown): unknown => JSON.parse(JSON.stringify(v) ?? 'null');

/** The hand path accepts exactly what the schema accepts, and gives the same project, defaults and all. */
function expectAgreement(input: unknown): boolean {
  const quick = quickParse(input);
  const schema = parseProject(input);
  expect(quick !== null, JSON.stringify(schema.ok ? 'schema accepts' : schema.problems).slice(0, 300)).toBe(schema.ok);
  if (schema.ok) expect(quick).toStrictEqual(schema.project);
  return schema.ok;
}

/** A copy of `doc` with the value at a path (indices into each level's keys) replaced or removed. */
function mutate(doc: unknown, path: readonly number[], value: unknown): unknown {
  const copy = structuredClone(doc) as Record<string, unknown>;
  let at: unknown = copy;
  for (let i = 0; i < path.length; i++) {
    if (at === null || typeof at !== 'object') break;
    const keys = Object.keys(at as object);
    if (keys.length === 0) break;
    const key = keys[path[i]! % keys.length]!;
    if (i === path.length - 1 || typeof (at as Record<string, unknown>)[key] !== 'object') {
      (at as Record<string, unknown>)[key] = value;
      break;
    }
    at = (at as Record<string, unknown>)[key];
  }
  return asFile(copy);
}

/** Values near every limit and of every wrong kind (model/limits.ts, projectSchema.ts). */
const EDGE = [
  0,
  -0.5,
  0.5,
  1,
  1.2,
  2,
  4,
  5,
  5.5,
  6,
  10,
  59,
  60,
  900,
  1100,
  1e4,
  1.0001e4,
  15000,
  30000,
  40000,
  5e6,
  1e7,
  1.1e7,
  2e7,
  2.1e7,
  -1e4,
  -1.1e4,
  1e-31,
  1e-29,
  -1e-31,
  0.001,
  0.0009,
  0.005,
  0.3,
  0.31,
  100,
  101,
  -101,
  1e5,
  1.1e5,
  3.5,
  '',
  'x',
  'a'.repeat(64),
  'a'.repeat(65),
  'a'.repeat(80),
  'a'.repeat(81),
  'a'.repeat(201),
  'cap',
  'tie-in',
  'block',
  'joints',
  'pvc',
  'hdpe',
  'steel',
  'none',
  'polyethylene',
  'inside',
  'outside',
  'us',
  'si',
  'test',
  'n1',
  'p1',
  'clay',
  null,
  true,
  false,
  [],
  {},
  [1],
  { id: 'x' },
  undefined,
];

describe('the hand check of a project file agrees with the schema (fixtures and fast-check, fixed seed)', () => {
  it('accepts the demo and generated routes, with the same defaults', () => {
    expect(expectAgreement(asFile(demo))).toBe(true);
    expect(expectAgreement(asFile(generateRoute(300)))).toBe(true);
  });

  it('agrees on random routes with random flags', () => {
    fc.assert(
      fc.property(randomRoute({ flows: true }), fc.boolean(), (r, flag) => {
        const input = routeInput({
          nodes: r.nodes.map((n, i) => (flag && i % 2 ? { ...n, valve: true, restraint: 'joints' } : n)),
          pipes: r.pipes.map((p, i) => (flag && i % 3 === 0 ? { ...p, material: 'pvc', trenchType: 4 } : p)),
        });
        expect(expectAgreement(asFile(input))).toBe(true);
      }),
      { seed: 7, numRuns: 80 },
    );
  });

  it('agrees on the demo with one value replaced or removed anywhere, accepting and refusing alike', () => {
    let accepted = 0;
    let refused = 0;
    fc.assert(
      fc.property(fc.array(fc.nat(40), { minLength: 1, maxLength: 4 }), fc.constantFrom(...EDGE), (path, value) => {
        if (expectAgreement(mutate(demo, path, value))) accepted++;
        else refused++;
      }),
      { seed: 20261203, numRuns: 1500 },
    );
    // The fixtures reach both answers many times over.
    expect(accepted).toBeGreaterThan(100);
    expect(refused).toBeGreaterThan(100);
  }, 120_000);

  it('agrees on files that break a rule across fields: duplicate ids, a missing node, a zero-length pipe', () => {
    const d = asFile(demo) as {
      nodes: { id: string; x: number; y: number; elevation: number }[];
      pipes: { from: string; to: string }[];
    };
    const dup = structuredClone(d);
    dup.nodes[1]!.id = dup.nodes[0]!.id;
    const missing = structuredClone(d);
    missing.pipes[0]!.to = 'nowhere';
    const onTop = structuredClone(d);
    onTop.nodes[1]!.x = onTop.nodes[0]!.x;
    onTop.nodes[1]!.y = onTop.nodes[0]!.y;
    onTop.nodes[1]!.elevation = onTop.nodes[0]!.elevation;
    for (const f of [dup, missing, onTop, [], 'text', null, 3]) expect(expectAgreement(f)).toBe(false);
  });

  it('knows exactly the fields of the schema (a field added there must be added here)', () => {
    const keys = (s: { shape: object }) => Object.keys(s.shape).sort();
    expect([...QUICK_FIELDS.project].sort()).toEqual(keys(projectShape));
    expect([...QUICK_FIELDS.water].sort()).toEqual(keys(waterSchema));
    expect([...QUICK_FIELDS.design].sort()).toEqual(keys(designSchema));
    expect([...QUICK_FIELDS.loadCase].sort()).toEqual(keys(loadCaseSchema));
    expect([...QUICK_FIELDS.soil].sort()).toEqual(keys(soilSchema));
    expect([...QUICK_FIELDS.node].sort()).toEqual(keys(nodeSchema));
    expect([...QUICK_FIELDS.pipe].sort()).toEqual(keys(pipeSchema));
  });
});
