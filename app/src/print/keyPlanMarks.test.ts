import { describe, it, expect } from 'vitest';
import { placeKeyMarks, type KeyMark } from './keyPlanMarks.js';

const W = 420;
const H = 230;
const SIZE = 12.5;

const overlap = (a: { x: number; y: number; w: number; h: number }, b: typeof a) =>
  a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;

describe('marks on the key plan', () => {
  it('writes a lone mark beside its point, up and to the right, with no leader', () => {
    const [m] = placeKeyMarks([{ key: 'n1', text: 'A1', x: 200, y: 100 }], W, H, SIZE);
    expect(m!.leader).toBe(false);
    expect(m!.box.x).toBeGreaterThan(200);
    expect(m!.baseline).toBeLessThan(100);
  });

  it('keeps the marks of fittings a few metres apart clear of each other and inside the frame', () => {
    // Six fittings 2 m apart on a 1 km route drawn 376 units wide: points 0.75 units apart, a mark 12.5 tall.
    const marks: KeyMark[] = Array.from({ length: 6 }, (_, i) => ({
      key: `n${i}`,
      text: `A${i + 10}`,
      x: 210 + i * 0.75,
      y: 120,
    }));
    const placed = placeKeyMarks(marks, W, H, SIZE);
    expect(placed.map((p) => p.text)).toEqual(marks.map((m) => m.text));
    for (const [i, a] of placed.entries()) {
      expect(a.box.x).toBeGreaterThanOrEqual(0);
      expect(a.box.y).toBeGreaterThanOrEqual(0);
      expect(a.box.x + a.box.w).toBeLessThanOrEqual(W);
      expect(a.box.y + a.box.h).toBeLessThanOrEqual(H);
      for (const b of placed.slice(i + 1)) expect(overlap(a.box, b.box), `${a.text} and ${b.text}`).toBe(false);
    }
    expect(placed.some((p) => p.leader)).toBe(true);
  });

  it('keeps a mark at the frame edge inside it', () => {
    const [m] = placeKeyMarks([{ key: 'e', text: 'B12', x: W - 3, y: 3 }], W, H, SIZE);
    expect(m!.box.x + m!.box.w).toBeLessThanOrEqual(W);
    expect(m!.box.y).toBeGreaterThanOrEqual(0);
  });

  it('keeps every mark inside the frame when its point is crowded out of every place', () => {
    // Twenty fittings at one point by the right edge: the places round it run out after a dozen or so.
    const crowd: KeyMark[] = Array.from({ length: 20 }, (_, i) => ({
      key: `c${i}`,
      text: `C${i + 10}`,
      x: W - 3,
      y: 100,
    }));
    const placed = placeKeyMarks(crowd, W, H, SIZE);
    expect(placed).toHaveLength(20);
    for (const m of placed) {
      expect(m.box.x, m.text).toBeGreaterThanOrEqual(0);
      expect(m.box.x + m.box.w, m.text).toBeLessThanOrEqual(W);
      expect(m.box.y, m.text).toBeGreaterThanOrEqual(0);
      expect(m.box.y + m.box.h, m.text).toBeLessThanOrEqual(H);
    }
    // the last one was moved in from beyond the edge: a leader ties it to its point
    expect(placed.at(-1)!.leader).toBe(true);
  });
});
