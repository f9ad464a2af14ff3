import { describe, expect, it } from 'vitest';
import { LabelSpace } from './labelSpace.js';

type Rect = { x: number; y: number; w: number; h: number };
const overlap = (a: Rect, b: Rect) => a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;

describe('room for labels', () => {
  // Invariant: a rectangle fits exactly when it lies inside the canvas and overlaps no rectangle placed
  // before it, checked against a plain search of every placed rectangle (pseudo-random rectangles,
  // many spanning two or more 64 px buckets).
  it('agrees with a search of every placed label, on a thousand pseudo-random rectangles', () => {
    let seed = 3;
    const next = (n: number) => (seed = (seed * 16807) % 2147483647) % n;
    const space = new LabelSpace(500, 300);
    const placed: Rect[] = [];
    for (let k = 0; k < 1000; k++) {
      const r = { x: next(520) - 10, y: next(320) - 10, w: 5 + next(90), h: 5 + next(20) };
      const inside = r.x >= 0 && r.y >= 0 && r.x + r.w <= 500 && r.y + r.h <= 300;
      const free = inside && placed.every((o) => !overlap(r, o));
      expect(space.fits(r)).toBe(free);
      if (k % 2 === 0) {
        const got = space.place([r]);
        expect(got).toBe(free ? r : null);
        if (got) placed.push(got);
      }
    }
    expect(placed.length).toBeGreaterThan(20);
  });
});
