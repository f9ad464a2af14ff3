import { describe, expect, it } from 'vitest';
import { drawLiveChange, ghostOutlines } from './drawLiveChange.js';
import { LabelSpace } from './labelSpace.js';
import type { ScenePolygon } from './planScene.js';
import type { LiveChange } from './liveChange.js';

/** A 2-D context that records the text drawn and counts the paths stroked (all drawLiveChange calls). */
function recorder() {
  const texts: string[] = [];
  const at: { x: number; y: number }[] = [];
  let strokes = 0;
  const ctx = new Proxy(
    {},
    {
      get: (_, key) => {
        if (key === 'fillText')
          return (t: string, x: number, y: number) => {
            texts.push(t);
            at.push({ x, y });
          };
        if (key === 'stroke') return () => strokes++;
        if (key === 'measureText') return (t: string) => ({ width: 7 * t.length });
        return () => {};
      },
      set: () => true,
    },
  ) as unknown as CanvasRenderingContext2D;
  return { ctx, texts, at, strokes: () => strokes };
}

const square = (x: number, y: number, side: number): ScenePolygon => ({
  node: `b${x}`,
  kind: 'block',
  points: [
    { x, y },
    { x: x + side, y },
    { x: x + side, y: y + side },
    { x, y: y + side },
  ],
});

const change = (node: string, x: number, y: number, growth: number): LiveChange => ({
  node,
  mark: node,
  at: { x, y },
  growth,
  governing: null,
});

describe('the live change drawn while the test pressure is dragged (level of detail)', () => {
  // 1 px per metre, plan origin at the top left: plan (x, y) is screen (x, −y).
  const view = { scale: 1, left: 0, top: 0 };

  it('draws a ghost of 2 px across but not one of 1 px (MIN_POLYGON_PX = 1.5), nor one off the canvas', () => {
    const outlines = ghostOutlines([square(50, -50, 2), square(80, -50, 1), square(5000, -50, 2)], view, 400, 300);
    expect(outlines).toHaveLength(1);
    // the 2 m square at plan (50, −50), 1 px per metre: screen (50, 50) to (52, 48)
    expect(outlines[0]![0]).toEqual({ sx: 50, sy: 50 });
    expect(outlines[0]![2]).toEqual({ sx: 52, sy: 48 });
  });

  it('strokes the ghosts as one dashed path, and none when no ghost is large enough', () => {
    const r = recorder();
    drawLiveChange(r.ctx, view, [square(50, -50, 2), square(60, -50, 2)], [], (id) => id, new LabelSpace(400, 300));
    expect(r.strokes()).toBe(1);
    const none = recorder();
    drawLiveChange(none.ctx, view, [square(80, -50, 1)], [], (id) => id, new LabelSpace(400, 300));
    expect(none.strokes()).toBe(0);
  });

  it('labels every change, moving a label that would overprint another to a free corner; one per cell', () => {
    const r = recorder();
    const changes = [
      change('A1', 50, -50, 0.25),
      change('A2', 50, -200, 0.1),
      change('A3', 60, -52, 0.5),
      change('A4', 51, -51, 0.3),
    ];
    drawLiveChange(r.ctx, view, [], changes, (id) => id, new LabelSpace(400, 300));
    // A1 at (50, 50) keeps the place below right: x 64, y 50 + 22. A3, 10 px right of A1, would overprint
    // it there (A1's spans x 62–115, y 64.5–79.5) and cannot go left (x < 0): it goes above right,
    // y 52 − 22 = 30. A4 shares A1's 6 px cell and is left to A1.
    expect(r.texts).toEqual(['A1 +25%', 'A2 +10%', 'A3 +50%']);
    expect(r.at[0]).toEqual({ x: 64, y: 72 });
    expect(r.at[2]).toEqual({ x: 74, y: 30 });
  });
});
