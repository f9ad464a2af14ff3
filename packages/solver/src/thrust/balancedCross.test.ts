import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { route } from '../../test/projectBuilder.js';

/**
 * A cross whose two equal branches leave opposite each other on a straight run of one size: the
 * pressure forces cancel pairwise (−p·A·n − p·A·(−n) = 0, momentum balance by hand), so the cross
 * itself has no thrust; each branch's thrust is taken at its own cap. The run is laid at 45° with the
 * branch ends placed by cos/sin, as a drawn route is, so the sum is left with floating-point crumbs.
 */
describe('balanced cross', () => {
  const c = Math.SQRT1_2;
  const p = route({
    pressure: 1.55e6,
    nodes: [
      { id: 'a', x: 0, y: 0, end: 'tie-in' },
      { id: 'x', x: 600 * c * 0.3048, y: 600 * c * 0.3048 },
      { id: 'b', x: 800 * c * 0.3048, y: 800 * c * 0.3048 },
      { id: 'l', x: (600 * c - 120 * c) * 0.3048, y: (600 * c + 120 * c) * 0.3048 },
      { id: 'r', x: (600 * c + 120 * c) * 0.3048, y: (600 * c - 120 * c) * 0.3048 },
    ],
    pipes: [
      { from: 'a', to: 'x', od: 0.33528 },
      { from: 'x', to: 'b', od: 0.33528 },
      { from: 'x', to: 'l', od: 0.22987 },
      { from: 'x', to: 'r', od: 0.22987 },
    ],
  });
  const cross = analyse(p).byNode.get('x')!;

  it('has no thrust, and gets no block, anchor, pad or restrained joints, only the note that says so', () => {
    expect(cross.envelope.governing.total).toEqual([0, 0, 0]);
    expect(cross.restraint.block).toBeNull();
    expect(cross.restraint.anchor).toBeNull();
    expect(cross.restraint.trenchBottom).toBeNull();
    expect(cross.restraint.restrainedLegs).toEqual([]);
    expect(cross.diagnostics.map((d) => d.code)).toContain('thrust.none');
  });

  it('asked for restrained joints, restrains no length', () => {
    const joints = { ...p, nodes: p.nodes.map((n) => (n.id === 'x' ? { ...n, restraint: 'joints' as const } : n)) };
    expect(analyse(joints).byNode.get('x')!.restraint.restrainedLegs).toEqual([]);
  });
});
