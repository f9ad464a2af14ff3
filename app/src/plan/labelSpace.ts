/** A screen rectangle, px. */
interface Rect {
  x: number;
  y: number;
  w: number;
  h: number;
}

const BUCKET = 64;

/**
 * Room for labels on the plan: a label is placed only where it overlaps no label placed before it and
 * stays inside the canvas, so crowded places show fewer labels instead of unreadable ones.
 */
export class LabelSpace {
  /** rectangles by bucket, keyed i·65536 + j (numbers, not strings: 10,000 marks probe this) */
  private readonly buckets = new Map<number, Rect[]>();

  constructor(
    readonly width: number,
    readonly height: number,
  ) {}

  /** A copy to place more labels in, leaving this one as it is (the marks' room, shared by the layers above). */
  clone(): LabelSpace {
    const c = new LabelSpace(this.width, this.height);
    for (const [k, list] of this.buckets) c.buckets.set(k, [...list]);
    return c;
  }

  fits(r: Rect): boolean {
    if (r.x < 0 || r.y < 0 || r.x + r.w > this.width || r.y + r.h > this.height) return false;
    // The buckets the rectangle meets, walked in place: this runs four times for each of 10,000 marks,
    // and a list of keys per call was most of its time.
    const i1 = Math.floor((r.x + r.w) / BUCKET);
    const j0 = Math.floor(r.y / BUCKET);
    const j1 = Math.floor((r.y + r.h) / BUCKET);
    for (let i = Math.floor(r.x / BUCKET); i <= i1; i++) {
      for (let j = j0; j <= j1; j++) {
        const list = this.buckets.get(i * 65536 + j);
        if (!list) continue;
        for (const o of list) {
          if (r.x < o.x + o.w && o.x < r.x + r.w && r.y < o.y + o.h && o.y < r.y + r.h) return false;
        }
      }
    }
    return true;
  }

  /** Takes the first of the candidate rectangles that fits; returns it, or null when none does. */
  place(candidates: readonly Rect[]): Rect | null {
    for (const r of candidates) {
      if (!this.fits(r)) continue;
      for (let i = Math.floor(r.x / BUCKET); i <= Math.floor((r.x + r.w) / BUCKET); i++) {
        for (let j = Math.floor(r.y / BUCKET); j <= Math.floor((r.y + r.h) / BUCKET); j++) {
          const k = i * 65536 + j;
          const list = this.buckets.get(k);
          if (list) list.push(r);
          else this.buckets.set(k, [r]);
        }
      }
      return r;
    }
    return null;
  }
}
