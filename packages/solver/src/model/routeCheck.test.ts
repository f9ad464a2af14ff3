import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import type { Project } from './projectSchema.js';
import { overlappingPipes, referenceChecks } from './crossChecks.js';
import { OVERLAP_ANGLE } from './routeRules.js';
import { routeRulesHold } from './routeCheck.js';
import { generateRoute } from '../../bench/generateRoute.js';
import { quickParse } from './quickParse.js';
import { randomRoute, routeExtras, routeWithExtras } from '../../test/randomRoutes.js';

/** The answer of the two checks routeRulesHold stands for: no problem from either. */
function bothChecks(p: Project): boolean {
  let problems = 0;
  const add = () => void problems++;
  referenceChecks(p, { addIssue: add });
  overlappingPipes(p, add);
  return problems === 0;
}

type Mutation = (p: Project, i: number, j: number) => void;

/** A point `deg` degrees off the pipe's line, half its length out from its first node. */
function offLine(p: Project, pipe: Project['pipes'][number], deg: number) {
  const a = p.nodes.find((n) => n.id === pipe.from)!;
  const b = p.nodes.find((n) => n.id === pipe.to)!;
  const r = (deg * Math.PI) / 180;
  const dx = (b.x - a.x) / 2;
  const dy = (b.y - a.y) / 2;
  return {
    x: a.x + dx * Math.cos(r) - dy * Math.sin(r),
    y: a.y + dx * Math.sin(r) + dy * Math.cos(r),
    elevation: (a.elevation + b.elevation) / 2,
  };
}

/** Breaks of every cross-field rule (and near misses of the overlap angle), on node i and pipe j. */
const MUTATIONS: Record<string, Mutation> = {
  none: () => undefined,
  'duplicate node id': (p, i) => void (p.nodes[(i + 1) % p.nodes.length]!.id = p.nodes[i]!.id),
  'duplicate pipe id': (p, _i, j) => void (p.pipes[(j + 1) % p.pipes.length]!.id = p.pipes[j]!.id),
  'duplicate soil id': (p) => void (p.soils[1]!.id = p.soils[0]!.id),
  'duplicate case id': (p) => void (p.loadCases[2]!.id = p.loadCases[0]!.id),
  'two cases of one label': (p) => void (p.loadCases[2]!.label = p.loadCases[0]!.label ?? p.loadCases[0]!.id),
  'a label that is another case’s id': (p) => {
    delete p.loadCases[0]!.label;
    p.loadCases[1]!.label = p.loadCases[0]!.id;
  },
  'labels of their own': (p) => p.loadCases.forEach((c, k) => void (c.label = `Case ${k + 1}`)),
  'unknown soil': (p, i) => void (p.nodes[i]!.soil = 'peat'),
  'known soil': (p, i) => void (p.nodes[i]!.soil = 'sand'),
  'unknown default soil': (p) => void (p.defaultSoil = 'peat'),
  'known default soil': (p) => void (p.defaultSoil = 'clay'),
  'missing from': (p, _i, j) => void (p.pipes[j]!.from = 'nowhere'),
  'missing to': (p, _i, j) => void (p.pipes[j]!.to = 'nowhere'),
  'pipe to itself': (p, _i, j) => void (p.pipes[j]!.to = p.pipes[j]!.from),
  'inside equal to outside': (p, _i, j) => void (p.pipes[j]!.insideDiameter = p.pipes[j]!.outsideDiameter),
  'node onto its neighbour': (p, _i, j) => {
    const pipe = p.pipes[j]!;
    const a = p.nodes.find((n) => n.id === pipe.from)!;
    Object.assign(
      p.nodes.find((n) => n.id === pipe.to)!,
      { x: a.x, y: a.y, elevation: a.elevation + 0.0005 },
    );
  },
  'second pipe, same nodes': (p, _i, j) => void p.pipes.push({ ...p.pipes[j]!, id: 'again' }),
  'second pipe, reversed': (p, _i, j) =>
    void p.pipes.push({ ...p.pipes[j]!, id: 'again', from: p.pipes[j]!.to, to: p.pipes[j]!.from }),
  ...Object.fromEntries(
    [0, 0.3, OVERLAP_ANGLE * 0.999, OVERLAP_ANGLE * 1.001, 2, 30].map((deg) => [
      `branch ${deg}° off a pipe`,
      (p: Project, _i: number, j: number) => {
        const pipe = p.pipes[j]!;
        p.nodes.push({ ...p.nodes[0]!, id: 'branch', ...offLine(p, pipe, deg) });
        p.pipes.push({ ...pipe, id: 'branch-pipe', to: 'branch' });
      },
    ]),
  ),
};

describe('routeRulesHold answers as referenceChecks and overlappingPipes do', () => {
  it('on routes with each rule broken, or nearly (fast-check, fixed seed)', () => {
    const answers = new Map<string, Set<boolean>>();
    fc.assert(
      fc.property(
        randomRoute({ flows: true }),
        routeExtras,
        fc.constantFrom(...Object.keys(MUTATIONS)),
        fc.nat(),
        fc.nat(),
        (r, x, kind, i, j) => {
          const p = structuredClone(routeWithExtras(r, x));
          MUTATIONS[kind]!(p, i % p.nodes.length, j % p.pipes.length);
          const expected = bothChecks(p);
          expect(routeRulesHold(p), kind).toBe(expected);
          answers.set(kind, (answers.get(kind) ?? new Set()).add(expected));
        },
      ),
      { seed: 20261203, numRuns: 600 },
    );
    // Every break is met, and refused; the near misses of the overlap angle come out both ways.
    expect(answers.size).toBe(Object.keys(MUTATIONS).length);
    expect(answers.get('none')).toEqual(new Set([true]));
    expect(answers.get('duplicate node id')).toEqual(new Set([false]));
    expect(answers.get('two cases of one label')).toEqual(new Set([false]));
    expect(answers.get('a label that is another case’s id')).toEqual(new Set([false]));
    expect(answers.get('labels of their own')).toEqual(new Set([true]));
    expect(answers.get(`branch ${OVERLAP_ANGLE * 0.999}° off a pipe`)).toContain(false);
    expect(answers.get(`branch ${OVERLAP_ANGLE * 1.001}° off a pipe`)).toContain(true);
  }, 120_000);

  it('on the bench’s generated route, which holds', () => {
    const p = quickParse(JSON.parse(JSON.stringify(generateRoute(2000))))!;
    expect(p).not.toBeNull();
    expect(routeRulesHold(p)).toBe(true);
    expect(bothChecks(p)).toBe(true);
  });
});
