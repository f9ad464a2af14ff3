import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fitView, gridSpacing, panBy, toPlan, toScreen, zoomAt } from './viewport.js';
import { expectClose } from '../testFixtures.js';

const SEED = { seed: 20240611, numRuns: 300 };
const coord = fc.double({ min: -1e5, max: 1e5, noNaN: true });
const viewport = fc.record({ scale: fc.double({ min: 0.01, max: 1000, noNaN: true }), left: coord, top: coord });
const plan = fc.record({ x: coord, y: coord });
const screen = fc.record({
  sx: fc.double({ min: -5000, max: 5000, noNaN: true }),
  sy: fc.double({ min: -5000, max: 5000, noNaN: true }),
});

/** Floating-point tolerance scaled to the size of the numbers in play (m or px). */
const tol = (...v: number[]) => 1e-9 * (1 + Math.max(...v.map(Math.abs)));

describe('toScreen and toPlan (the only screen ↔ plan bridge)', () => {
  it('puts plan north up the screen: at 2 px/m with the corner at (10, 20), plan (13, 17) is 6 px right and 6 px down (hand calculation)', () => {
    expect(toScreen({ scale: 2, left: 10, top: 20 }, { x: 13, y: 17 })).toEqual({ sx: 6, sy: 6 });
  });

  it('returns every plan point to itself through the screen (invariant)', () => {
    fc.assert(
      fc.property(viewport, plan, (v, p) => {
        const back = toPlan(v, toScreen(v, p));
        expectClose(back.x, p.x, tol(p.x, v.left));
        expectClose(back.y, p.y, tol(p.y, v.top));
      }),
      SEED,
    );
  });

  it('returns every screen point to itself through the plan (invariant)', () => {
    fc.assert(
      fc.property(viewport, screen, (v, s) => {
        const back = toScreen(v, toPlan(v, s));
        expectClose(back.sx, s.sx, tol(s.sx, v.left * v.scale));
        expectClose(back.sy, s.sy, tol(s.sy, v.top * v.scale));
      }),
      SEED,
    );
  });
});

describe('zoomAt', () => {
  it('keeps the plan point under the cursor where it was, at any factor (invariant)', () => {
    fc.assert(
      fc.property(viewport, screen, fc.double({ min: 0.1, max: 10, noNaN: true }), (v, s, factor) => {
        const before = toPlan(v, s);
        const after = toPlan(zoomAt(v, s, factor), s);
        expectClose(after.x, before.x, tol(before.x, v.left) * 10);
        expectClose(after.y, before.y, tol(before.y, v.top) * 10);
      }),
      SEED,
    );
  });

  it('multiplies the scale by the factor: 4 px/m zoomed by 1.5 is 6 px/m (hand calculation)', () => {
    expectClose(zoomAt({ scale: 4, left: 0, top: 0 }, { sx: 100, sy: 50 }, 1.5).scale, 6);
  });
});

describe('panBy', () => {
  it('moves every plan point by the drag in pixels, so the ground follows the pointer (invariant)', () => {
    fc.assert(
      fc.property(
        viewport,
        plan,
        fc.double({ min: -800, max: 800, noNaN: true }),
        fc.double({ min: -800, max: 800, noNaN: true }),
        (v, p, dx, dy) => {
          const before = toScreen(v, p);
          const after = toScreen(panBy(v, dx, dy), p);
          expectClose(after.sx, before.sx + dx, tol(p.x * v.scale, v.left * v.scale) * 10);
          expectClose(after.sy, before.sy + dy, tol(p.y * v.scale, v.top * v.scale) * 10);
          expect(panBy(v, dx, dy).scale).toBe(v.scale);
        },
      ),
      SEED,
    );
  });
});

describe('fitView', () => {
  it('shows every point at least the margin inside the canvas (invariant)', () => {
    const size = fc.integer({ min: 200, max: 2000 });
    fc.assert(
      fc.property(
        fc.array(plan, { minLength: 1, maxLength: 12 }),
        size,
        size,
        fc.integer({ min: 0, max: 90 }),
        (points, w, h, margin) => {
          const v = fitView(points, w, h, margin);
          for (const p of points) {
            const s = toScreen(v, p);
            expect(s.sx).toBeGreaterThanOrEqual(margin - 1e-6);
            expect(s.sx).toBeLessThanOrEqual(w - margin + 1e-6);
            expect(s.sy).toBeGreaterThanOrEqual(margin - 1e-6);
            expect(s.sy).toBeLessThanOrEqual(h - margin + 1e-6);
          }
        },
      ),
      SEED,
    );
  });

  it('fills the tighter direction: a 100 m east–west run on 848 × 400 px with 48 px margins is 7.52 px/m (hand calculation: 752 / 100)', () => {
    const v = fitView(
      [
        { x: 0, y: 5 },
        { x: 100, y: 5 },
      ],
      848,
      400,
      48,
    );
    expectClose(v.scale, 7.52);
    expectClose(toScreen(v, { x: 0, y: 5 }).sx, 48, 1e-9);
  });
});

describe('gridSpacing', () => {
  const mantissa = (m: number) => m / Math.pow(10, Math.floor(Math.log10(m) + 1e-9));

  it('is always 1, 2 or 5 × 10ⁿ metres, at least the target apart and less than 2.5 × the target (invariant)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.005, max: 2000, noNaN: true }),
        fc.integer({ min: 10, max: 200 }),
        (scale, target) => {
          const m = gridSpacing(scale, target);
          expect([1, 2, 5].some((k) => Math.abs(mantissa(m) - k) < 1e-9)).toBe(true);
          expect(m * scale).toBeGreaterThanOrEqual(target * (1 - 1e-12));
          expect(m * scale).toBeLessThan(2.5 * target);
        },
      ),
      SEED,
    );
  });

  it.each([
    [10, 10],
    [25, 5],
    [0.5, 200],
    [3, 20],
  ])(
    'at %s px/m with lines 60 px apart the grid is %s m (hand calculation: smallest 1-2-5 step ≥ 60 / scale)',
    (scale, metres) => {
      expectClose(gridSpacing(scale), metres, 1e-9 * metres);
    },
  );
});
