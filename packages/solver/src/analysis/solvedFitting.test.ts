import { describe, expect, it } from 'vitest';
import { generateRoute } from '../../bench/generateRoute.js';
import { parseProject } from '../model/parseProject.js';
import type { Project } from '../model/projectSchema.js';
import { analyseProject } from './analyse.js';

const route = (fittings: number): Project => {
  const parsed = parseProject(generateRoute(fittings));
  if (!parsed.ok) throw new Error('generated route is invalid');
  return parsed.project;
};

// Invariants of the states made when first read (solvedFitting.ts); the values themselves are held
// to the previous analysis by test/analysisOracle.test.ts.
describe("a fitting's load states, made when first read", () => {
  const project = route(120);

  it('keeps the fields, in the order a fitting has always listed them, for every reader', () => {
    const f = analyseProject(project).fittings[3]!;
    const fields = ['node', 'mark', 'run', 'chainage', 'legs', 'geometry', 'cases', 'states', 'envelope'].concat([
      'waterWeight',
      'restraint',
      'diagnostics',
      'basis',
    ]);
    expect(Object.keys(f)).toEqual(fields);
    // spread, JSON and structuredClone read own enumerable fields: each sees the states
    expect(Object.keys({ ...f })).toEqual(fields);
    expect({ ...f }.states).toBe(f.states);
    expect(JSON.parse(JSON.stringify(f)).states).toEqual(JSON.parse(JSON.stringify(f.states)));
    expect(structuredClone(f).cases).toEqual(f.cases);
  });

  it("gives the envelope's governing state as one of the states, and the worst per case among them", () => {
    for (const f of analyseProject(project).fittings) {
      expect(f.states).toContain(f.envelope.governing);
      if (f.envelope.reverse) expect(f.states).toContain(f.envelope.reverse.state);
      for (const c of f.cases) expect(f.states).toContain(c);
      expect(f.states).toBe(f.states);
    }
  });

  it('reads the same states after other analyses have run (the fill buffer is shared)', () => {
    const early = analyseProject(project);
    analyseProject(route(300));
    const fresh = analyseProject(project);
    early.fittings.forEach((f, i) => {
      expect(f.states).toEqual(fresh.fittings[i]!.states);
      expect(f.cases).toEqual(fresh.fittings[i]!.cases);
    });
  });
});
