import { describe, expect, it } from 'vitest';
import { imageToPlan, planToImage, type Placement } from './similarity.js';
import { fromDistance, fromTwoPoints, planDistance } from './calibration.js';

// Every expected value below is worked by hand in the comment beside it, from
// plan = (x, y) + s·R(θ)·(u, −v) (similarity.ts).

describe('image pixels to plan metres', () => {
  it('an unrotated image: east along rows, north up the columns', () => {
    // s = 0.05, θ = 0, corner (−5, 10): pixel (100, 200) → (−5 + 0.05·100, 10 − 0.05·200) = (0, 0)
    const p: Placement = { x: -5, y: 10, metresPerPixel: 0.05, rotation: 0 };
    const z = imageToPlan(p, { u: 100, v: 200 });
    expect(z.x).toBeCloseTo(0, 12);
    expect(z.y).toBeCloseTo(0, 12);
  });

  it('an image turned 90° counterclockwise: its rows run north, its columns (down) run east', () => {
    // s = 0.5, θ = 90°, corner (10, 20): R(90°)·(u, −v) = (v, u), so pixel (100, 40) → (10 + 20, 20 + 50)
    const p: Placement = { x: 10, y: 20, metresPerPixel: 0.5, rotation: 90 };
    const z = imageToPlan(p, { u: 100, v: 40 });
    expect(z.x).toBeCloseTo(30, 12);
    expect(z.y).toBeCloseTo(70, 12);
  });

  it('planToImage undoes imageToPlan (invariant) for any placement', () => {
    const p: Placement = { x: 312.5, y: -47.25, metresPerPixel: 0.0731, rotation: -33.7 };
    for (const q of [
      { u: 0, v: 0 },
      { u: 1234.5, v: 17 },
      { u: -40, v: 980 },
    ]) {
      const back = planToImage(p, imageToPlan(p, q));
      expect(back.u).toBeCloseTo(q.u, 9);
      expect(back.v).toBeCloseTo(q.v, 9);
    }
  });
});

describe('calibrating by two known coordinates', () => {
  it('two points on one image row 800 px apart, 40 m apart due east: 0.05 m/px, no rotation', () => {
    // c = (40 + 0i) / ((900 − 100) + 0i) = 0.05; t = 0 − 0.05·(100 − 200i) = −5 + 10i
    const r = fromTwoPoints({ u: 100, v: 200 }, { u: 900, v: 200 }, { x: 0, y: 0 }, { x: 40, y: 0 });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.placement.metresPerPixel).toBeCloseTo(0.05, 12);
    expect(r.placement.rotation).toBeCloseTo(0, 12);
    expect(r.placement.x).toBeCloseTo(-5, 12);
    expect(r.placement.y).toBeCloseTo(10, 12);
  });

  it('a column of the image that runs due east on the plan: rotated 90°', () => {
    // a = (0,0) → (10,20), b = (0,100) → (60,20): c = 50 / (−100i) = 0.5i, so s = 0.5, θ = 90°, t = 10 + 20i
    const r = fromTwoPoints({ u: 0, v: 0 }, { u: 0, v: 100 }, { x: 10, y: 20 }, { x: 60, y: 20 });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.placement.metresPerPixel).toBeCloseTo(0.5, 12);
    expect(r.placement.rotation).toBeCloseTo(90, 12);
    expect(r.placement.x).toBeCloseTo(10, 12);
    expect(r.placement.y).toBeCloseTo(20, 12);
  });

  it('a 3-4-5 pair: 500 px between the picks, 1000 m between the coordinates, turned by atan(4/3)', () => {
    // w = 300 − 400i (|w| = 500, arg −53.130°); z = 1000 (arg 0): s = 2, θ = +53.130° = atan2(4, 3)
    const r = fromTwoPoints({ u: 0, v: 0 }, { u: 300, v: 400 }, { x: 5000, y: 7000 }, { x: 6000, y: 7000 });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.placement.metresPerPixel).toBeCloseTo(2, 12);
    expect(r.placement.rotation).toBeCloseTo((Math.atan2(4, 3) * 180) / Math.PI, 10);
    const b = imageToPlan(r.placement, { u: 300, v: 400 });
    expect(b.x).toBeCloseTo(6000, 9);
    expect(b.y).toBeCloseTo(7000, 9);
  });

  it('refuses picks on one pixel or coordinates on one point, saying what to do', () => {
    expect(fromTwoPoints({ u: 5, v: 5 }, { u: 5, v: 6 }, { x: 0, y: 0 }, { x: 1, y: 0 })).toEqual({
      ok: false,
      message: 'pick two points farther apart on the image',
    });
    expect(fromTwoPoints({ u: 0, v: 0 }, { u: 50, v: 0 }, { x: 3, y: 3 }, { x: 3, y: 3 })).toEqual({
      ok: false,
      message: 'the two coordinates must be different points',
    });
  });
});

describe('calibrating by two points and a known distance', () => {
  it('3-4-5: picks 500 px apart said to be 25 m give 0.05 m/px; the first pick stays put, rotation kept', () => {
    // s = 25 / √(300² + 400²) = 25 / 500 = 0.05
    const current: Placement = { x: 0, y: 0, metresPerPixel: 1, rotation: 30 };
    const a = { u: 100, v: 100 };
    const b = { u: 400, v: 500 };
    const before = imageToPlan(current, a);
    const r = fromDistance(current, a, b, 25);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.placement.metresPerPixel).toBeCloseTo(0.05, 12);
    expect(r.placement.rotation).toBe(30);
    const after = imageToPlan(r.placement, a);
    expect(after.x).toBeCloseTo(before.x, 9);
    expect(after.y).toBeCloseTo(before.y, 9);
    expect(planDistance(r.placement, a, b)).toBeCloseTo(25, 12);
  });

  it('refuses a distance of zero', () => {
    const p: Placement = { x: 0, y: 0, metresPerPixel: 1, rotation: 0 };
    expect(fromDistance(p, { u: 0, v: 0 }, { u: 10, v: 0 }, 0)).toEqual({
      ok: false,
      message: 'the distance must be more than 0',
    });
  });
});
