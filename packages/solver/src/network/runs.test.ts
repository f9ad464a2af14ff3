import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { analyse } from '../analysis/analyse.js';
import type { Project } from '../model/projectSchema.js';
import { route, type NodeSpec, type PipeSpec } from '../../test/projectBuilder.js';
import { randomRoute } from '../../test/randomRoutes.js';
import { runLetter } from './runs.js';

const OD = 0.326;

/**
 * A main from a tie-in at w0 east to a cap, with bends whose ids end in the same digit (n2, m2, k2),
 * a tee at t1 with a branch north and a tee at t2 with a branch south. Every number distinct.
 */
function network(extra: { branchBend?: boolean; mainBend?: boolean; movedBranchEnd?: boolean } = {}): Project {
  const nodes: NodeSpec[] = [
    { id: 'w0', x: 0, y: 0, end: 'tie-in' },
    { id: 'n2', x: 40, y: 3 },
    { id: 't1', x: 90, y: 0 },
    { id: 'm2', x: 150, y: 9 },
    { id: 't2', x: 210, y: 4 },
    { id: 'k2', x: 270, y: -12 },
    { id: 'cap', x: 330, y: -5 },
    { id: 'b1', x: 93, y: 60 },
    { id: 'b2', x: 120, y: extra.movedBranchEnd ? 140 : 110 },
    { id: 'c1', x: 207, y: -70 },
  ];
  const pipes: PipeSpec[] = [
    { from: 'w0', to: 'n2', od: OD },
    { from: 'n2', to: 't1', od: OD },
    { from: 't1', to: 'm2', od: OD },
    { from: 'm2', to: 't2', od: OD },
    { from: 't2', to: 'k2', od: OD },
    { from: 'k2', to: 'cap', od: OD },
    { from: 't1', to: 'b1', od: 0.222 },
    { from: 'b1', to: 'b2', od: 0.222 },
    { from: 't2', to: 'c1', od: 0.17 },
  ];
  if (extra.branchBend) {
    // A bend drawn into the second branch: c1 pushed off line by a new node on the way.
    nodes.push({ id: 'c0', x: 230, y: -35 });
    pipes.splice(8, 1, { from: 't2', to: 'c0', od: 0.17 }, { from: 'c0', to: 'c1', od: 0.17 });
  }
  if (extra.mainBend) {
    // A bend drawn into the main past the last tee, between k2 and the cap.
    nodes.push({ id: 'z9', x: 300, y: 6 });
    pipes.splice(5, 1, { from: 'k2', to: 'z9', od: OD }, { from: 'z9', to: 'cap', od: OD });
  }
  return route({ nodes, pipes });
}

const marksOf = (p: Project) => analyse(p).marks;
const onRun = (marks: Map<string, string>, letter: string) =>
  new Map([...marks].filter(([, m]) => m.replace(/\d+$/, '') === letter));

describe('fitting marks: run letter and number along the run', () => {
  it('gives bends at nodes n2, m2 and k2 three different marks (ids ending alike never collide)', () => {
    const marks = marksOf(network());
    const three = ['n2', 'm2', 'k2'].map((id) => marks.get(id));
    expect(new Set(three).size).toBe(3);
    expect(three).toEqual(['A2', 'A4', 'A6']);
  });

  it('numbers the main from its tie-in in chainage order, then each branch from its tee', () => {
    const marks = marksOf(network());
    expect(Object.fromEntries(marks)).toEqual({
      w0: 'A1',
      n2: 'A2',
      t1: 'A3',
      m2: 'A4',
      t2: 'A5',
      k2: 'A6',
      cap: 'A7',
      b1: 'B1',
      b2: 'B2',
      c1: 'C1',
    });
  });

  it('lists the fittings in crew order: by run, then by chainage along it', () => {
    const a = analyse(network());
    const order = a.fittings.map((f) => [f.run, f.chainage] as const);
    const sorted = [...order].sort((x, y) => x[0].localeCompare(y[0]) || x[1] - y[1]);
    expect(order).toEqual(sorted);
  });

  it('keeps every mark on the main and on the other branch when a bend is drawn into one branch', () => {
    const before = marksOf(network());
    const after = marksOf(network({ branchBend: true }));
    expect(onRun(after, 'A')).toEqual(onRun(before, 'A'));
    expect(onRun(after, 'B')).toEqual(onRun(before, 'B'));
    expect(after.get('c0')).toBe('C1'); // the edited run renumbers itself
    expect(after.get('c1')).toBe('C2');
  });

  it('keeps every branch mark, and the main before the edit, when a bend is drawn into the main', () => {
    const before = marksOf(network());
    const after = marksOf(network({ mainBend: true }));
    expect(onRun(after, 'B')).toEqual(onRun(before, 'B'));
    expect(onRun(after, 'C')).toEqual(onRun(before, 'C'));
    for (const id of ['w0', 'n2', 't1', 'm2', 't2', 'k2']) expect(after.get(id)).toBe(before.get(id));
    expect(after.get('z9')).toBe('A7');
    expect(after.get('cap')).toBe('A8');
  });

  it('keeps every mark when a branch end is moved or a pressure changes', () => {
    const before = marksOf(network());
    expect(marksOf(network({ movedBranchEnd: true }))).toEqual(before);
    const p = network();
    expect(marksOf({ ...p, loadCases: [{ ...p.loadCases[0]!, pressure: 2.5e6 }] })).toEqual(before);
  });

  it('letters runs A … Z, then AA, AB (bijective base 26)', () => {
    expect([0, 1, 25, 26, 27, 51, 52, 701, 702].map(runLetter)).toEqual([
      'A',
      'B',
      'Z',
      'AA',
      'AB',
      'AZ',
      'BA',
      'ZZ',
      'AAA',
    ]);
  });

  it('gives unique marks on random networks, numbered 1, 2, 3 … in chainage order on each run (fast-check, fixed seed)', () => {
    fc.assert(
      fc.property(randomRoute(), (r) => {
        const a = analyse(route({ nodes: r.nodes, pipes: r.pipes }));
        const marks = [...a.marks.values()];
        expect(new Set(marks).size).toBe(marks.length);
        for (const m of marks) expect(m).toMatch(/^[A-Z]+[1-9]\d*$/);
        const byRun = new Map<string, { n: number; chainage: number }[]>();
        for (const [id, m] of a.marks) {
          const [, letter, n] = /^([A-Z]+)(\d+)$/.exec(m)!;
          byRun.set(letter!, [...(byRun.get(letter!) ?? []), { n: Number(n), chainage: a.chainage.get(id)! }]);
        }
        for (const list of byRun.values()) {
          list.sort((x, y) => x.n - y.n);
          expect(list.map((x) => x.n)).toEqual(list.map((_, i) => i + 1));
          for (let i = 1; i < list.length; i++) expect(list[i]!.chainage).toBeGreaterThanOrEqual(list[i - 1]!.chainage);
        }
        for (const f of a.fittings) expect(f.mark).toBe(a.marks.get(f.node.id));
      }),
      { seed: 20261215, numRuns: 200 },
    );
  });
});
