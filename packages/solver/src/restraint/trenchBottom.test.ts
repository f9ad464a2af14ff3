import { describe, expect, it } from 'vitest';
import { sizeTrenchBottom } from './trenchBottom.js';

// Bearing equation A = SF·T/σ (DIPRA, Thrust Restraint Design for Ductile Iron Pipe), applied to the
// trench bottom under a sag bend; the figures below are worked by hand.
describe('trench-bottom pad under a sag bend', () => {
  it('is no wider than the trench and as long as the area needs at its width', () => {
    // T_down 50 kN, SF 1.5, σ_v 150 kPa: A = 1.5·50,000/150,000 = 0.5 m². Trench 0.874 m, step 0.05 m:
    // width 0.85 m (0.90 would not fit the trench); length 0.5/0.85 = 0.588 → 0.60 m.
    const { bearing } = sizeTrenchBottom(50_000, 1.5, 150_000, 0.874, 0.274, 0.05);
    expect(bearing.bearingArea).toBeCloseTo(0.5, 12);
    expect(bearing.width).toBeCloseTo(0.85, 12);
    expect(bearing.length).toBeCloseTo(0.6, 12);
  });

  it('keeps to the trench and gives the area over a range of trenches and steps (invariant)', () => {
    for (const trench of [0.6, 0.7, 0.874, 1.0, 1.23, 2.05])
      for (const step of [0.05, 0.1, 0.0508])
        for (const down of [5_000, 40_000, 250_000]) {
          const { bearing } = sizeTrenchBottom(down, 1.5, 100_000, trench, 0.2, step);
          expect(bearing.width).toBeLessThanOrEqual(trench + 1e-9);
          expect(bearing.width).toBeGreaterThan(trench - step - 1e-9);
          expect(bearing.width * bearing.length).toBeGreaterThanOrEqual(bearing.bearingArea - 1e-9);
        }
  });

  it('is at least one OD long, in whole steps', () => {
    // A = 1.5·2,000/150,000 = 0.02 m² needs 0.02/0.85 = 0.024 m; the OD 0.274 m → 0.30 m governs.
    const { bearing } = sizeTrenchBottom(2_000, 1.5, 150_000, 0.874, 0.274, 0.05);
    expect(bearing.length).toBeCloseTo(0.3, 12);
  });
});
