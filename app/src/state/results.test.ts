import { describe, expect, it } from 'vitest';
import { resultsOf, sameResultInputs } from './results.js';
import { project } from '../testFixtures.js';

const doc = () =>
  project(
    [
      { id: 'n1', x: 0, y: 0 },
      { id: 'n2', x: 30, y: 0 },
      { id: 'n3', x: 30, y: 40 },
    ],
    [
      { from: 'n1', to: 'n2' },
      { from: 'n2', to: 'n3' },
    ],
  );

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
});
