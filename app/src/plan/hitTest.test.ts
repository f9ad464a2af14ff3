import { describe, expect, it } from 'vitest';
import { hitTest, inBox } from './hitTest.js';
import { chain, expectClose } from '../testFixtures.js';

/** A slanting main Fenwick 1 (2, 3) → 2 (14, 8): 13 m long, direction (12, 5)/13; a tee branch n2 → n3. */
const slant = () => chain([2, 3], [14, 8], [14, 30]);

describe('hitTest', () => {
  it('finds a node within the tolerance and gives its exact position', () => {
    expect(hitTest(slant(), { x: 14.3, y: 7.8 }, 0.5)).toEqual({ kind: 'node', id: 'n2', at: { x: 14, y: 8 } });
  });

  it('lets a node win over a pipe that passes nearer the pointer', () => {
    // 0.4 m from n2 but 0.05 m from the branch pipe n2 → n3.
    expect(hitTest(slant(), { x: 14.05, y: 8.4 }, 0.5)).toMatchObject({ kind: 'node', id: 'n2' });
  });

  it('returns the point of the pipe nearest the pointer (hand calculation: the foot of the perpendicular)', () => {
    // From (8, 7): t = ((8−2)·12 + (7−3)·5)/169 = 92/169; foot = (2 + 12t, 3 + 5t); distance |(6,4)×(12,5)|/13 = 18/13 = 1.385 m.
    const hit = hitTest(slant(), { x: 8, y: 7 }, 1.5);
    expect(hit.kind).toBe('pipe');
    if (hit.kind !== 'pipe') return;
    expect(hit.id).toBe('p1');
    expectClose(hit.at.x, 2 + (12 * 92) / 169, 1e-12);
    expectClose(hit.at.y, 3 + (5 * 92) / 169, 1e-12);
  });

  it('respects the tolerance: the same pointer 1.385 m off the pipe misses at 1.3 m', () => {
    expect(hitTest(slant(), { x: 8, y: 7 }, 1.3)).toEqual({ kind: 'none' });
  });

  it('picks the nearer of two pipes within the tolerance (hand calculation: 0.8 m to p2, 14.8/13 = 1.138 m to p1, 1.204 m to n2)', () => {
    const hit = hitTest(slant(), { x: 13.2, y: 8.9 }, 1.15);
    expect(hit).toMatchObject({ kind: 'pipe', id: 'p2' });
    if (hit.kind === 'pipe') expectClose(hit.at.y, 8.9, 1e-12);
  });
});

describe('inBox', () => {
  it('takes nodes inside the box whichever corner it is dragged from, and only pipes with both ends inside', () => {
    const doc = slant();
    const expected = { nodes: ['n1', 'n2'], pipes: ['p1'] };
    expect(inBox(doc, { x: 0, y: 0 }, { x: 15, y: 10 })).toEqual(expected);
    expect(inBox(doc, { x: 15, y: 10 }, { x: 0, y: 0 })).toEqual(expected);
    expect(inBox(doc, { x: 13, y: 5 }, { x: 15, y: 31 })).toEqual({ nodes: ['n2', 'n3'], pipes: ['p2'] });
    expect(inBox(doc, { x: 5, y: 5 }, { x: 8, y: 6 })).toEqual({ nodes: [], pipes: [] });
  });
});
