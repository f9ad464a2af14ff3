import { describe, expect, it } from 'vitest';
import { imageToPlan, type Placement } from '@mainbrace/solver';
import { toScreen, type Viewport } from '../state/viewport.js';
import { underlayMatrix } from './drawUnderlay.js';

/** Applies a canvas matrix [a, b, c, d, e, f] to a point, as the canvas does. */
const apply = (m: number[], u: number, v: number) => ({
  sx: m[0]! * u + m[2]! * v + m[4]!,
  sy: m[1]! * u + m[3]! * v + m[5]!,
});

describe('the underlay on the canvas', () => {
  it('puts every pixel where the placement and the viewport put it (invariant, several rotations)', () => {
    const view: Viewport = { scale: 3.5, left: -40, top: 260 };
    for (const rotation of [0, 90, -33.7, 181]) {
      const p: Placement = { x: 12.5, y: 230, metresPerPixel: 0.08, rotation };
      const m = underlayMatrix(view, p);
      for (const [u, v] of [
        [0, 0],
        [640, 0],
        [0, 480],
        [317, 211],
      ] as const) {
        const expected = toScreen(view, imageToPlan(p, { u, v }));
        const got = apply(m, u, v);
        expect(got.sx).toBeCloseTo(expected.sx, 9);
        expect(got.sy).toBeCloseTo(expected.sy, 9);
      }
    }
  });

  it('an unrotated image: 10 px/m × 0.1 m/px = 1 screen px per pixel; corner at (2 + 10)·10 = 120 px, (50 − 45)·10 = 50 px', () => {
    const m = underlayMatrix({ scale: 10, left: -10, top: 50 }, { x: 2, y: 45, metresPerPixel: 0.1, rotation: 0 });
    [1, 0, 0, 1, 120, 50].forEach((want, i) => expect(m[i]).toBeCloseTo(want, 12));
  });
});
