import { describe, expect, it } from 'vitest';
import { imageToPlan, type Underlay } from '@mainbrace/solver';
import { calibrate, firstPlacement } from './underlayEdits.js';

const underlay = (): Underlay => ({
  name: 'invented-site.png',
  mediaType: 'image/png',
  width: 1000,
  height: 800,
  storageKey: 'k',
  x: 0,
  y: 0,
  metresPerPixel: 1,
  rotation: 0,
  opacity: 0.5,
  locked: false,
});

describe('calibrating the underlay', () => {
  it('by distance: picks 500 px apart (3-4-5) said to be 40 m give 0.08 m/px and record how', () => {
    const r = calibrate(
      underlay(),
      [
        { u: 100, v: 100 },
        { u: 400, v: 500 },
      ],
      { method: 'distance', distance: 40 },
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.underlay.metresPerPixel).toBeCloseTo(0.08, 12); // 40 / 500
    expect(r.underlay.calibration).toEqual({
      method: 'distance',
      points: [
        { u: 100, v: 100 },
        { u: 400, v: 500 },
      ],
      distance: 40,
    });
    // the first pick stays where it was: (100, −100) at 1 m/px before
    const first = imageToPlan(r.underlay, { u: 100, v: 100 });
    expect(first.x).toBeCloseTo(100, 9);
    expect(first.y).toBeCloseTo(-100, 9);
  });

  it('by coordinates: each pick lands on its coordinates', () => {
    const coordinates: [{ x: number; y: number }, { x: number; y: number }] = [
      { x: 500, y: 200 },
      { x: 540, y: 200 },
    ];
    const r = calibrate(
      underlay(),
      [
        { u: 100, v: 300 },
        { u: 900, v: 300 },
      ],
      { method: 'coordinates', coordinates },
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.underlay.metresPerPixel).toBeCloseTo(0.05, 12); // 40 m / 800 px
    const b = imageToPlan(r.underlay, { u: 900, v: 300 });
    expect(b.x).toBeCloseTo(540, 9);
    expect(b.y).toBeCloseTo(200, 9);
  });

  it('refuses when locked or with fewer than two picks', () => {
    expect(calibrate({ ...underlay(), locked: true }, [], { method: 'distance', distance: 1 })).toEqual({
      ok: false,
      message: 'the underlay is locked: unlock it to calibrate',
    });
    expect(calibrate(underlay(), [{ u: 0, v: 0 }], { method: 'distance', distance: 1 })).toEqual({
      ok: false,
      message: 'pick two points on the image first',
    });
  });
});

describe('a newly loaded image', () => {
  it('fills 80 % of the view, centred: 1000 × 500 px in an 800 × 600 canvas at 2 px/m → 0.32 m/px', () => {
    // 0.8 × min(800/1000, 600/500) / 2 = 0.8 × 0.8 / 2 = 0.32 m/px; image 320 m × 160 m about the centre
    // of the view, which is plan (0 + 400/2, 300 − 300/2) = (200, 150).
    const p = firstPlacement(1000, 500, { scale: 2, left: 0, top: 300 }, { width: 800, height: 600 });
    expect(p.metresPerPixel).toBeCloseTo(0.32, 12);
    expect(p.x).toBeCloseTo(200 - 160, 9);
    expect(p.y).toBeCloseTo(150 + 80, 9);
  });
});
