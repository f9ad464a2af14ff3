import { describe, it, expect } from 'vitest';
import { analyse } from './analyse.js';
import { route } from '../../test/projectBuilder.js';

/**
 * Five DN300-sized pipes into one node at 72° apart, each ending at a cap 30 m out: no standard fitting
 * joins five pipes (the cross, with four ends, is the largest: common practice), so the node is flagged. Equal areas at equal angles cancel (the five unit vectors of a regular pentagon sum
 * to zero, by hand), so the junction itself has no thrust.
 */
const star = (n: number) =>
  route({
    pressure: 1e6,
    nodes: [
      { id: 'hub', x: 0, y: 0 },
      ...Array.from({ length: n }, (_, i) => ({
        id: `e${i}`,
        x: 30 * Math.cos((2 * Math.PI * i) / n),
        y: 30 * Math.sin((2 * Math.PI * i) / n),
      })),
    ],
    pipes: Array.from({ length: n }, (_, i) => ({ from: 'hub', to: `e${i}`, od: 0.326 })),
  });

describe('a node where more than four pipes meet', () => {
  it('is flagged as no standard fitting, and sized as one junction whose thrust is the vector sum', () => {
    const hub = analyse(star(5)).byNode.get('hub')!;
    const codes = hub.diagnostics.map((d) => d.code);
    expect(codes).toContain('fitting.many-pipes');
    expect(hub.diagnostics.find((d) => d.code === 'fitting.many-pipes')!.severity).toBe('warning');
    expect(Math.hypot(...hub.envelope.governing.total)).toBeLessThan(1e-6 * 1e6 * 0.07);
  });

  it('is not flagged at four (a cross) or fewer', () => {
    for (const n of [3, 4]) {
      const hub = analyse(star(n)).byNode.get('hub')!;
      expect(hub.diagnostics.map((d) => d.code)).not.toContain('fitting.many-pipes');
    }
  });
});
