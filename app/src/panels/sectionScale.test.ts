import { describe, it, expect } from 'vitest';
import { niceExaggeration, sectionWindow } from './sectionScale.js';

describe('the long section’s vertical exaggeration', () => {
  it('rounds down to 1, 2, 2.5 or 5 times a power of ten', () => {
    expect(niceExaggeration(37)).toBe(25);
    expect(niceExaggeration(19.9)).toBe(10);
    expect(niceExaggeration(20)).toBe(20);
    expect(niceExaggeration(1.4)).toBe(1);
    expect(niceExaggeration(0.3)).toBe(0.25);
  });

  it('fits every level and is exactly the ratio of the two scales', () => {
    // 1000 m over 800 px: 0.8 px/m; levels 95–105 m over 150 px: raw 150/13/0.8 = 14.4 → 10.
    const w = sectionWindow([95, 105, 99], 150, 0.8);
    expect(w.exaggeration).toBe(10);
    expect(w.z0).toBeLessThanOrEqual(95);
    expect(w.z1).toBeGreaterThanOrEqual(105);
    const vScale = 150 / (w.z1 - w.z0);
    expect(vScale / 0.8).toBeCloseTo(10, 9);
  });

  it('fits the levels of a run of 100,000 nodes (200,000 levels) without overflowing the stack', () => {
    // Invariant: the window holds every level. Math.min(...levels) threw RangeError past ~125,000.
    const zs = Array.from({ length: 200_000 }, (_, i) => 90 + (i % 1000) / 50);
    zs[123_456] = 80;
    const w = sectionWindow(zs, 150, 0.01);
    expect(w.z0).toBeLessThanOrEqual(80);
    expect(w.z1).toBeGreaterThanOrEqual(109.98);
  });
});
