import { LabelSpace } from '../plan/labelSpace.js';

/** A mark to write beside its point on the key plan, in viewBox units. */
export interface KeyMark {
  key: string;
  text: string;
  x: number;
  y: number;
}

/** Where a mark's text goes: its box, its baseline, and whether a leader joins it to a point it stands off from. */
export interface PlacedMark extends KeyMark {
  box: { x: number; y: number; w: number; h: number };
  baseline: number;
  leader: boolean;
}

/** Width of a bold sans mark per character, as a share of the font size (generous: a cut-off mark is worse). */
const CHAR = 0.66;
/** Half the side of a fitting's symbol at the key plan's scale. */
const SYMBOL = 4;
/** How far beyond the first ring the second ring of places stands, with a leader to the point. */
const FAR = 2.4;

/**
 * Places every mark of a key plan where it overlaps no other mark, no symbol and stays inside the frame:
 * first beside its point (right, left, above, below), then farther off with a leader line. Fittings a few
 * metres apart print as points closer than a mark is tall, and a crew must read each mark. When nothing
 * fits, the mark goes in its first place anyway, moved inside the frame: every mark is printed whole.
 */
export function placeKeyMarks(marks: readonly KeyMark[], width: number, height: number, size: number): PlacedMark[] {
  const space = new LabelSpace(width, height);
  for (const m of marks) space.place([{ x: m.x - SYMBOL, y: m.y - SYMBOL, w: 2 * SYMBOL, h: 2 * SYMBOL }]);
  return marks.map((m) => {
    const w = m.text.length * size * CHAR;
    const h = size;
    const near = around(m, w, h, 1);
    const far = around(m, w, h, FAR);
    const placed = space.place(near) ?? space.place(far);
    const r = placed ?? inside(near[0]!, width, height);
    // A leader wherever the mark stands off its point: a far place, or its first place moved into the frame.
    const leader = placed ? !near.includes(placed) : r.x !== near[0]!.x || r.y !== near[0]!.y;
    return { ...m, box: r, baseline: r.y + 0.8 * h, leader };
  });
}

/** Candidate boxes around a point at `reach` times the symbol's clearance, most natural first. */
function around(m: KeyMark, w: number, h: number, reach: number) {
  const gap = (SYMBOL + 1) * reach;
  return [
    { x: m.x + gap, y: m.y - gap - h * 0.6, w, h },
    { x: m.x + gap, y: m.y + gap - h * 0.4, w, h },
    { x: m.x - gap - w, y: m.y - gap - h * 0.6, w, h },
    { x: m.x - gap - w, y: m.y + gap - h * 0.4, w, h },
    { x: m.x - w / 2, y: m.y - gap - h - SYMBOL * (reach - 1), w, h },
    { x: m.x - w / 2, y: m.y + gap + SYMBOL * (reach - 1), w, h },
    { x: m.x + gap, y: m.y - h / 2, w, h },
    { x: m.x - gap - w, y: m.y - h / 2, w, h },
  ];
}

/** A box moved the least way to lie inside the frame (a mark cut by the frame's edge is misread). */
function inside(r: { x: number; y: number; w: number; h: number }, width: number, height: number) {
  return { ...r, x: Math.min(Math.max(r.x, 0), width - r.w), y: Math.min(Math.max(r.y, 0), height - r.h) };
}
