import { describe, expect, it } from 'vitest';
import { planLength, setPlanLength } from './legLength.js';
import { project } from '../testFixtures.js';

/** A leg n1 (0, 0) → n2 (30, 40): plan length 50 m (3-4-5 triangle × 10), n2 → n3 on to (30, 80). */
const legs = () =>
  project(
    [
      { id: 'n1', x: 0, y: 0, z: 100 },
      { id: 'n2', x: 30, y: 40, z: 102 },
      { id: 'n3', x: 30, y: 80, z: 104 },
    ],
    [
      { from: 'n1', to: 'n2' },
      { from: 'n2', to: 'n3' },
    ],
  );
const node = (p: ReturnType<typeof legs>, id: string) => p.nodes.find((n) => n.id === id)!;

describe('a leg length typed in the details panel', () => {
  it('reads the plan length: √(30² + 40²) = 50 m, whatever the elevations', () => {
    expect(planLength(legs(), 'p1')).toBeCloseTo(50, 12);
  });

  it('moves the far node along the leg: 25 m puts n2 at (15, 20), its elevation kept, n1 unmoved', () => {
    const p = legs();
    const id = p.pipes[0]!.id;
    const after = setPlanLength(p, id, 25, 'to');
    expect(node(after, 'n2')).toMatchObject({ x: 15, y: 20, elevation: 102 });
    expect(node(after, 'n1')).toMatchObject({ x: 0, y: 0 });
    expect(planLength(after, id)).toBeCloseTo(25, 9);
  });

  it('may move the near node instead: 100 m with n2 fixed puts n1 at (30 − 60, 40 − 80) = (−30, −40)', () => {
    const p = legs();
    const after = setPlanLength(p, p.pipes[0]!.id, 100, 'from');
    expect(node(after, 'n1')).toMatchObject({ x: -30, y: -40 });
    expect(node(after, 'n2')).toMatchObject({ x: 30, y: 40 });
  });

  it('leaves the project unchanged for a length of zero or less', () => {
    const p = legs();
    expect(setPlanLength(p, p.pipes[0]!.id, 0, 'to')).toBe(p);
    expect(setPlanLength(p, p.pipes[0]!.id, -3, 'to')).toBe(p);
  });
});
