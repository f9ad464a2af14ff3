import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { analyse, analyseInSteps, analyseNext, analyseProject, type Analysis } from '../src/analysis/analyse.js';
import type { Project } from '../src/model/projectSchema.js';
import { scheduleOf } from '../src/schedule/scheduleOf.js';
import { scheduleJson } from '../src/schedule/scheduleJson.js';
import { randomRoute, routeExtras as extras, routeWithExtras as project } from './randomRoutes.js';
import { analyseProject as oracle } from './oracle/analyseOracle.js';
import { RECENT_ANALYSES } from '../src/analysis/recentAnalyses.js';

const runs = { seed: 20261203, numRuns: 120 };

/**
 * Deep comparison that allows the last bits of a float: the structure-of-arrays analysis factors the
 * pressure out of the sum of the legs (p·Σ A_i·n_i instead of Σ p·A_i·n_i), which rounds differently
 * in the 15th digit. Everything else — kinds, marks, ids, choices, codes, the order of lists — must
 * be equal.
 */
function expectSame(actual: unknown, expected: unknown, path = '', rel = 1e-9): void {
  const fail = (why: string) => expect.fail(`${path || 'analysis'}: ${why}`);
  if (typeof expected === 'number' && typeof actual === 'number') {
    if (Object.is(actual, expected)) return;
    const tol = rel && rel * Math.max(Math.abs(actual), Math.abs(expected)) + 1e-9;
    if (!(Math.abs(actual - expected) <= tol)) fail(`${actual} differs from ${expected}`);
    return;
  }
  if (Array.isArray(expected)) {
    if (!Array.isArray(actual) || actual.length !== expected.length) return fail('lists differ in length');
    expected.forEach((e, i) => expectSame(actual[i], e, `${path}[${i}]`, rel));
    return;
  }
  if (expected instanceof Map) {
    if (!(actual instanceof Map) || actual.size !== expected.size) return fail('maps differ in size');
    const keys = [...actual.keys()];
    [...expected.keys()].forEach((k, i) => {
      if (keys[i] !== k) fail(`key ${String(k)} out of place`);
      expectSame(actual.get(k), expected.get(k), `${path}.get(${String(k)})`, rel);
    });
    return;
  }
  if (expected !== null && typeof expected === 'object') {
    if (actual === null || typeof actual !== 'object') return fail('not an object');
    const a = actual as Record<string, unknown>;
    const e = expected as Record<string, unknown>;
    const ka = Object.keys(a).sort().join();
    if (ka !== Object.keys(e).sort().join()) return fail(`fields ${ka} differ from ${Object.keys(e).sort().join()}`);
    for (const k of Object.keys(e)) expectSame(a[k], e[k], `${path}.${k}`, rel);
    return;
  }
  if (!Object.is(actual, expected)) fail(`${String(actual)} differs from ${String(expected)}`);
}

/** Everything an analysis holds that a reader can see (the project itself is the input). */
const visible = (a: Analysis) => ({
  fittings: a.fittings,
  byNode: a.byNode,
  legs: a.legs,
  runs: a.runs,
  runOf: a.runOf,
  chainage: a.chainage,
  marks: a.marks,
  diagnostics: a.diagnostics,
});

describe('the structure-of-arrays analysis against the object-per-state one it replaced (fast-check, fixed seed)', () => {
  it('gives the same fittings, thrusts, restraints and findings on random routes', () => {
    fc.assert(
      fc.property(randomRoute({ flows: true }), extras, (r, x) => {
        const p = project(r, x);
        expectSame(visible(analyseProject(p)), visible(oracle(p)));
      }),
      runs,
    );
  }, 120_000);

  it('prints the same JSON schedule at the stated precision', () => {
    fc.assert(
      fc.property(randomRoute({ flows: true }), extras, (r, x) => {
        const p = project(r, x);
        const old = oracle(p);
        expect(scheduleJson(scheduleOf(analyseProject(p)))).toBe(scheduleJson(scheduleOf(old)));
      }),
      { ...runs, numRuns: 60 },
    );
  }, 120_000);
});

/** One edit of a document, as the store makes it: the edited part replaced, every other part kept. */
const edit = fc.record({
  kind: fc.constantFrom('pressure', 'flow-factor', 'move', 'raise', 'diameter', 'valve', 'add', 'remove', 'name'),
  pick: fc.nat(),
  amount: fc.integer({ min: -30, max: 30 }).filter((k) => k !== 0),
});

type Edit = typeof edit extends fc.Arbitrary<infer T> ? T : never;

function applyEdit(p: Project, e: Edit): Project {
  const n = e.pick % p.nodes.length;
  const c = e.pick % p.loadCases.length;
  const set = <T>(list: readonly T[], i: number, v: T) => list.map((x, j) => (j === i ? v : x));
  switch (e.kind) {
    case 'pressure':
      return {
        ...p,
        loadCases: set(p.loadCases, c, {
          ...p.loadCases[c]!,
          pressure: Math.abs(p.loadCases[c]!.pressure + e.amount * 1e4),
        }),
      };
    case 'flow-factor':
      return { ...p, loadCases: set(p.loadCases, c, { ...p.loadCases[c]!, flowFactor: Math.abs(e.amount) / 10 }) };
    case 'move':
      return { ...p, nodes: set(p.nodes, n, { ...p.nodes[n]!, x: p.nodes[n]!.x + e.amount / 7 }) };
    case 'raise':
      return { ...p, nodes: set(p.nodes, n, { ...p.nodes[n]!, elevation: p.nodes[n]!.elevation + e.amount / 3 }) };
    case 'diameter': {
      if (!p.pipes.length) return p;
      const i = e.pick % p.pipes.length;
      const od = p.pipes[i]!.outsideDiameter * (1 + e.amount / 100);
      return { ...p, pipes: set(p.pipes, i, { ...p.pipes[i]!, outsideDiameter: od, insideDiameter: od * 0.9 }) };
    }
    case 'valve':
      return { ...p, nodes: set(p.nodes, n, { ...p.nodes[n]!, valve: !p.nodes[n]!.valve }) };
    case 'add': {
      const at = p.nodes[n]!;
      const node = {
        ...at,
        id: 'added',
        x: at.x + e.amount,
        y: at.y + 2 * e.amount,
        end: 'cap' as const,
        valve: false,
      };
      const pipe = { ...p.pipes[0]!, id: 'added-pipe', from: at.id, to: 'added', flow: 0 };
      return { ...p, nodes: [...p.nodes, node], pipes: [...p.pipes, pipe] };
    }
    case 'remove': {
      // The last node of a random route is a leaf: it and its one pipe go.
      const last = p.nodes[p.nodes.length - 1]!;
      if (p.nodes.length < 3) return p;
      return {
        ...p,
        nodes: p.nodes.slice(0, -1),
        pipes: p.pipes.filter((x) => x.from !== last.id && x.to !== last.id),
      };
    }
    default:
      return { ...p, name: `${p.name} (edited)` };
  }
}

describe('the incremental analysis (analyseNext) after an edit', () => {
  it('equals the analysis of the edited document from scratch, after a chain of random edits', () => {
    fc.assert(
      fc.property(
        randomRoute({ flows: true }),
        extras,
        fc.array(edit, { minLength: 1, maxLength: 4 }),
        (r, x, edits) => {
          let p = project(r, x);
          let a = analyseProject(p);
          for (const e of edits) {
            p = applyEdit(p, e);
            a = analyseNext(a, p);
            expectSame(visible(a), visible(analyseProject(p)), '', 0);
          }
        },
      ),
      runs,
    );
  }, 120_000);

  it('keeps every fitting object on a rename and the sized restraint of fittings whose thrust did not change', () => {
    const p = project(
      {
        nodes: [
          { id: 'a', x: 0, y: 0, z: 100 },
          { id: 'b', x: 30, y: 0, z: 100 },
          { id: 'c', x: 30, y: 30, z: 100 },
          { id: 'd', x: 60, y: 40, z: 100 },
        ],
        pipes: [
          { id: 'p1', from: 'a', to: 'b', od: 0.326 },
          { id: 'p2', from: 'b', to: 'c', od: 0.326 },
          { id: 'p3', from: 'c', to: 'd', od: 0.326 },
        ],
      },
      {
        valves: Array(14).fill(false),
        joints: Array(14).fill(false),
        caps: Array(14).fill(true),
        working: 600e3,
        test: 1000e3,
        datum: undefined,
        bearing: 150e3,
        groundwater: null,
        inside: false,
      },
    );
    const a = analyseProject(p);
    const renamed = analyseNext(a, { ...p, name: 'Elsewhere' });
    renamed.fittings.forEach((f, i) => expect(f).toBe(a.fittings[i]));
    // The working case governs nowhere (the test case is higher everywhere): lowering it rescales the
    // thrusts but leaves every envelope, so every restraint object is kept.
    const lower = { ...p, loadCases: p.loadCases.map((c) => (c.id === 'working' ? { ...c, pressure: 500e3 } : c)) };
    const b = analyseNext(a, lower);
    b.fittings.forEach((f, i) => {
      expect(f.restraint).toBe(a.fittings[i]!.restraint);
      expect(f.cases[0]!.pressure).toBe(500e3);
    });
  });
});

describe('the analysis a step at a time (analyseInSteps), as the app opens a long route', () => {
  it('equals the analysis in one call, and is the one analyse() then returns for the document', () => {
    fc.assert(
      fc.property(randomRoute({ flows: true }), extras, fc.integer({ min: 1, max: 5 }), (r, x, chunk) => {
        const p = project(r, x);
        const steps = analyseInSteps(p, chunk);
        let yields = 0;
        let s = steps.next();
        while (!s.done) {
          yields++;
          s = steps.next();
        }
        // four phases, then one pause per whole chunk of fittings
        expect(yields).toBe(4 + Math.floor(s.value.fittings.length / chunk));
        expectSame(visible(s.value), visible(analyseProject(p)), '', 0);
        expect(analyse(p)).toBe(s.value);
      }),
      { ...runs, numRuns: 60 },
    );
  }, 120_000);
});

describe("analyse's memo of the documents asked for last (recentAnalyses.ts)", () => {
  it('keeps the analysis of each recent document, and gives the same numbers for one it let go', () => {
    const first = project(
      fc.sample(randomRoute({ flows: true }), { seed: runs.seed, numRuns: 1 })[0]!,
      fc.sample(extras, { seed: runs.seed, numRuns: 1 })[0]!,
    );
    const documents = [first];
    const made = [analyse(first)];
    // one document more than the memo keeps: the first one's analysis is let go
    for (let k = 1; k <= RECENT_ANALYSES; k++) {
      const p = documents[k - 1]!;
      documents.push({ ...p, loadCases: p.loadCases.map((c) => ({ ...c, pressure: c.pressure + 1000 })) });
      made.push(analyse(documents[k]!, made[k - 1]));
    }
    for (let k = 1; k <= RECENT_ANALYSES; k++) expect(analyse(documents[k]!)).toBe(made[k]);
    const again = analyse(first, made[RECENT_ANALYSES]);
    expect(again).not.toBe(made[0]);
    expectSame(visible(again), visible(made[0]!), '', 0);
  });
});
