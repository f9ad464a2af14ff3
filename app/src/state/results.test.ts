import { describe, expect, it } from 'vitest';
import { analyseProject, nearestSize } from '@mainbrace/solver';
import { resultsOf, sameResultInputs } from './results.js';
import { chain } from '../testFixtures.js';

const doc = () => chain([0, 0], [30, 0], [30, 40]);

describe('results from the result inputs only', () => {
  it('keeps the very same analysis when only the name or the units change', () => {
    const p = doc();
    const a = resultsOf(p);
    expect(resultsOf({ ...p, name: 'Wrenfield Lane main' })).toBe(a);
    expect(resultsOf({ ...p, units: 'us' })).toBe(a);
    expect(sameResultInputs(p, { ...p, name: 'other' })).toBe(true);
  });

  it('analyses again after an edit that can change a result', () => {
    const p = doc();
    const a = resultsOf(p);
    const higher = { ...p, loadCases: p.loadCases.map((c) => ({ ...c, pressure: c.pressure * 2 })) };
    const b = resultsOf(higher);
    expect(b).not.toBe(a);
    // the bend's thrust doubles with the pressure (static thrust 2·p·A·sin(θ/2) is linear in p)
    const bend = (x: typeof a) => x.fittings.find((f) => f.node.id === 'n2')!.envelope.governing.total;
    const ratio = Math.hypot(...bend(b)) / Math.hypot(...bend(a));
    expect(ratio).toBeGreaterThan(1.9);
    expect(sameResultInputs(p, { ...p, design: { ...p.design } })).toBe(false);
  });

  // Invariant: the results after any edit equal a whole analysis of the edited document (here a pipe
  // pressed past its rating by a load-case edit must be reported).
  it('reports what a whole analysis reports after a pipe edit and then a pressure edit', () => {
    const p = doc();
    resultsOf(p);
    const size = nearestSize('pvcu-iso1452-pn10', p.pipes[0]!.outsideDiameter);
    const pvc = {
      ...p,
      pipes: p.pipes.map((x, i) =>
        i === 0 && size
          ? {
              ...x,
              material: 'pvc' as const,
              series: 'pvcu-iso1452-pn10',
              nominal: size.nominal,
              outsideDiameter: size.outsideDiameter,
              insideDiameter: size.insideDiameter,
            }
          : x,
      ),
    };
    resultsOf(pvc);
    const pressed = { ...pvc, loadCases: pvc.loadCases.map((c) => ({ ...c, pressure: 1.4e6 })) };
    const codes = (a: { diagnostics: { code: string }[] }) => a.diagnostics.map((d) => d.code).sort();
    expect(codes(analyseProject(pressed)).some((c) => c.startsWith('pipe.over-'))).toBe(true);
    expect(codes(resultsOf(pressed))).toEqual(codes(analyseProject(pressed)));
  });

  // Invariant: the store's results (the solver's incremental path from the analysis before) equal a
  // whole analysis of the same document after every edit of a chain, fitting by fitting.
  it('equals a whole analysis after a chain of pressure, move and flow edits', () => {
    let p = doc();
    resultsOf(p);
    const edits: ((q: typeof p) => typeof p)[] = [
      (q) => ({ ...q, loadCases: q.loadCases.map((c) => ({ ...c, pressure: c.pressure * 1.3 })) }),
      (q) => ({ ...q, nodes: q.nodes.map((n) => (n.id === 'n3' ? { ...n, x: n.x + 12 } : n)) }),
      (q) => ({ ...q, loadCases: q.loadCases.map((c, i) => (i === 0 ? { ...c, pressure: c.pressure / 2 } : c)) }),
      (q) => ({ ...q, loadCases: q.loadCases.map((c) => ({ ...c, flowFactor: 0 })) }),
      (q) => ({ ...q, loadCases: q.loadCases.map((c) => ({ ...c, pressure: c.pressure * 2.5 })) }),
    ];
    const seen = (a: ReturnType<typeof resultsOf>) => ({
      fittings: a.fittings,
      diagnostics: a.diagnostics,
      marks: a.marks,
    });
    for (const change of edits) {
      p = change(p);
      expect(seen(resultsOf(p))).toEqual(seen(analyseProject(p)));
    }
  });
});
