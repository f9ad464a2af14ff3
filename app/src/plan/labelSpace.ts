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
  private readonly buckets = new Map<string, Rect[]>();

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

  private keys(r: Rect): string[] {
    const out: string[] = [];
    for (let i = Math.floor(r.x / BUCKET); i <= Math.floor((r.x + r.w) / BUCKET); i++) {
      for (let j = Math.floor(r.y / BUCKET); j <= Math.floor((r.y + r.h) / BUCKET); j++) out.push(`${i},${j}`);
    }
    return out;
  }

  fits(r: Rect): boolean {
    if (r.x < 0 || r.y < 0 || r.x + r.w > this.width || r.y + r.h > this.height) return false;
    for (const k of this.keys(r)) {
      for (const o of this.buckets.get(k) ?? []) {
        if (r.x < o.x + o.w && o.x < r.x + r.w && r.y < o.y + o.h && o.y < r.y + r.h) return false;
      }
    }
    return true;
  }

  /** Takes the first of the candidate rectangles that fits; returns it, or null when none does. */
  place(candidates: readonly Rect[]): Rect | null {
    for (const r of candidates) {
      if (!this.fits(r)) continue;
      for (const k of this.keys(r)) {
        const list = this.buckets.get(k);
        if (list) list.push(r);
        else this.buckets.set(k, [r]);
      }
      return r;
    }
    return null;
  }
}
