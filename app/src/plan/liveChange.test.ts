import { describe, expect, it } from 'vitest';
import { analyse, type Project } from '@mainbrace/solver';
import { liveChanges } from './liveChange.js';
import { project } from '../testFixtures.js';

/** A 90° bend at Tolley Row with a working case and a test case, pressures in Pa. */
function bend(test: number): Project {
  return project(
    [
      { id: 'a', x: 0, y: 0 },
      { id: 'b', x: 40, y: 0 },
      { id: 'c', x: 40, y: 40 },
    ],
    [
      { from: 'a', to: 'b' },
      { from: 'b', to: 'c' },
    ],
    [
      { id: 'working', pressure: 800e3 },
      { id: 'test', pressure: test },
    ],
  );
}

describe('liveChanges (the test-pressure slider)', () => {
  it('reports nothing when the pressure has not moved', () => {
    const a = analyse(bend(600e3));
    expect(liveChanges(a, a)).toEqual([]);
  });
  it('marks the bend whose governing case turns from working to test, and its block growing', () => {
    const before = analyse(bend(600e3));
    const after = analyse(bend(1200e3));
    const b = liveChanges(before, after).find((c) => c.node === 'b')!;
    expect(b.governing).toEqual({ from: 'working', to: 'test' });
    // thrust ∝ pressure (2·p·A·sin(θ/2)), so the block must grow when the governing pressure goes 800 → 1200 kPa
    expect(b.growth).toBeGreaterThan(0);
  });
  it('shows growth without a governing change while the test case stays in charge', () => {
    const b = liveChanges(analyse(bend(1000e3)), analyse(bend(1400e3))).find((c) => c.node === 'b')!;
    expect(b.governing).toBeNull();
    expect(b.growth).toBeGreaterThan(0);
  });
});
