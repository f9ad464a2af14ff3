import { describe, expect, it } from 'vitest';
import { labelBox, placeLabels, type Box, type LabelWish } from './labelPlacement.js';

const frame: Box = { x0: 0, y0: 0, x1: 400, y1: 200 };
const clear = (a: Box, b: Box) => a.x1 <= b.x0 || b.x1 <= a.x0 || a.y1 <= b.y0 || b.y1 <= a.y0;

const wish = (key: string, x: number, y: number, optional = false): LabelWish => ({
  key,
  text: key,
  size: 10,
  optional,
  spots: [
    { x, y: y - 9, anchor: 'middle' },
    { x, y: y + 17, anchor: 'middle' },
    { x: x + 7, y: y + 4, anchor: 'start' },
  ],
});

describe('placeLabels (invariants: no label over another where a spot is free)', () => {
  it('moves the second of two labels that want the same spot to its next one', () => {
    const placed = placeLabels([wish('A6', 100, 100), wish('A7', 104, 100)], [], frame);
    expect(placed).toHaveLength(2);
    expect(placed[0]!.y).toBe(91);
    expect(placed[1]!.y).toBe(117);
    expect(clear(placed[0]!.box, placed[1]!.box)).toBe(true);
  });

  it('keeps labels clear of the blocked boxes (the fittings) and inside the frame', () => {
    const circle = { x0: 95, y0: 80, x1: 105, y1: 92 };
    const [a] = placeLabels([wish('B1', 100, 100)], [circle], frame);
    expect(clear(a!.box, circle)).toBe(true);
    const [edge] = placeLabels([wish('A15', 398, 5)], [], frame);
    expect(edge!.box.y0).toBeGreaterThanOrEqual(0);
  });

  it('leaves out an optional label with no free spot, never a required one', () => {
    const everywhere = [{ x0: 0, y0: 0, x1: 400, y1: 200 }];
    expect(placeLabels([wish('sag', 100, 100, true)], everywhere, frame)).toHaveLength(0);
    expect(placeLabels([wish('A2', 100, 100)], everywhere, frame)).toHaveLength(1);
  });

  it('sizes a label box from its text and anchor', () => {
    const b = labelBox('run B', 10, { x: 50, y: 20, anchor: 'end' });
    expect(b.x1).toBe(50);
    expect(b.x1 - b.x0).toBeCloseTo(5 * 10 * 0.62, 9);
    expect(b.y1 - b.y0).toBeCloseTo(10, 9);
  });
});
