/**
 * Level of detail for the plan (docs/performance.md): what is too small or too crowded to read on screen is not
 * drawn, and a label is tested for room before its text is formatted or measured. Screen px throughout.
 */

/** A restraint polygon smaller than this on screen is not drawn at all. */
export const MIN_POLYGON_PX = 1.5;
/** Hatching needs this much room across a polygon to read as hatching rather than grey. */
export const MIN_HATCH_PX = 4;
/** One fitting symbol per cell of this size: where symbols would overprint, the first one stands for its cell. */
export const SYMBOL_CELL_PX = 6;
/** Something this far outside the canvas still counts as on screen (a symbol or an arrow reaching in). */
export const MARGIN_PX = 90;

/** True when a screen point lies within the canvas grown by `margin` on every side. */
export const onScreen = (x: number, y: number, width: number, height: number, margin = MARGIN_PX) =>
  x >= -margin && y >= -margin && x <= width + margin && y <= height + margin;

/** True when a screen segment's bounding box meets the canvas grown by `margin`. */
export function segmentOnScreen(
  ax: number,
  ay: number,
  bx: number,
  by: number,
  width: number,
  height: number,
  margin = 8,
): boolean {
  return (
    Math.max(ax, bx) >= -margin &&
    Math.max(ay, by) >= -margin &&
    Math.min(ax, bx) <= width + margin &&
    Math.min(ay, by) <= height + margin
  );
}

/** Cells of the canvas already holding a mark: `take` says whether a point's cell was still free. */
export class Occupancy {
  private readonly taken = new Set<number>();
  constructor(private readonly cell: number) {}
  take(x: number, y: number): boolean {
    const key = Math.floor(x / this.cell) * 100_003 + Math.floor(y / this.cell);
    if (this.taken.has(key)) return false;
    this.taken.add(key);
    return true;
  }
}

/** Text widths by font and text: marks and forces repeat, and measuring is the costly part of a label. */
const widths = new Map<string, number>();
export function textWidth(ctx: CanvasRenderingContext2D, font: string, text: string): number {
  const key = `${font}\u0000${text}`;
  let w = widths.get(key);
  if (w === undefined) {
    if (widths.size > 20_000) widths.clear();
    ctx.font = font;
    w = ctx.measureText(text).width;
    widths.set(key, w);
  }
  return w;
}
