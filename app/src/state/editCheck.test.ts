import { describe, expect, it } from 'vitest';
import { problemText, type Project } from '@mainbrace/solver';
import { editProblemList } from './editCheck.js';
import { validated } from './checks.js';
import { chain } from '../testFixtures.js';

/** The problems of an edit, each as one line with its path in the file (as the whole-file check words them). */
const editProblems = (before: Project, after: Project): string[] => editProblemList(before, after).map(problemText);

/** An L-shaped main of three nodes (invented: Quillon Street). */
const doc = (): Project => chain([0, 0], [30, 0], [30, 40]);

const withNode = (p: Project, i: number, patch: Record<string, unknown>): Project => ({
  ...p,
  nodes: p.nodes.map((n, j) => (j === i ? ({ ...n, ...patch } as typeof n) : n)),
});
const withPipe = (p: Project, i: number, patch: Record<string, unknown>): Project => ({
  ...p,
  pipes: p.pipes.map((n, j) => (j === i ? ({ ...n, ...patch } as typeof n) : n)),
});

describe('checking only what an edit changed', () => {
  it('passes a valid edit, naming nothing', () => {
    const p = doc();
    expect(editProblems(p, { ...p, name: 'Quillon Street main' })).toEqual([]);
    expect(editProblems(p, withNode(p, 1, { cover: 2 }))).toEqual([]);
  });

  it('names the field of a changed part that breaks its schema', () => {
    const p = doc();
    const lines = editProblems(p, withNode(p, 1, { cover: -1 }));
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^nodes\[1\]\.cover: /);
    expect(editProblems(p, { ...p, name: 'x'.repeat(201) })[0]).toMatch(/^name: /);
    expect(editProblems(p, withPipe(p, 0, { colour: 'red' }))[0]).toMatch(/^pipes\[0\]\.colour: unknown field/);
  });

  it('runs the checks across parts when a position, an id or a reference changes', () => {
    const p = doc();
    // n3 moved onto n1 without a pipe between them: coincident nodes
    expect(editProblems(p, withNode(p, 2, { x: 0, y: 0 })).join('\n')).toMatch(/same point/);
    expect(editProblems(p, withNode(p, 2, { id: 'n1' })).join('\n')).toMatch(/duplicate id "n1"/);
    expect(editProblems(p, withPipe(p, 1, { to: 'n9' })).join('\n')).toMatch(/no node "n9"/);
    expect(editProblems(p, withPipe(p, 1, { insideDiameter: 0.4 })).join('\n')).toMatch(/less than outsideDiameter/);
    expect(editProblems(p, { ...p, loadCases: [] })).toEqual(['loadCases: must have at least one load case']);
  });

  // Invariant: for an edit of a valid document, the part check refuses exactly what the whole-file
  // check refuses (the whole-file check is the reference; both words come from the same schema).
  it('refuses exactly what checking the whole document refuses', async () => {
    const p = doc();
    const edits: Project[] = [
      withNode(p, 0, { elevation: Number.NaN }),
      withNode(p, 0, { x: 1e-40 }),
      withNode(p, 1, { end: 'open' }),
      withNode(p, 1, { soil: 'clay-9' }),
      withNode(p, 2, { x: 30.0000001, y: 40 }),
      withNode(p, 2, { label: 'Hydrant at Quillon Street' }),
      withPipe(p, 0, { flow: -1 }),
      withPipe(p, 0, { from: 'n2' }),
      withPipe(p, 1, { material: 'pvc' }),
      { ...p, design: { ...p.design, layingLength: 0 } },
      { ...p, design: { ...p.design, blockDepth: 1.1 } },
      { ...p, water: { density: 5 } },
      { ...p, defaultSoil: 'rock' },
      { ...p, loadCases: [...p.loadCases, p.loadCases[0]!] },
      { ...p, units: 'us' },
    ];
    for (const after of edits) {
      const whole = await validated(after);
      expect(editProblems(p, after).length > 0).toBe(!whole.ok);
      if (!whole.ok) expect(editProblems(p, after)[0]).toBe(whole.lines[0]);
    }
  });
});
