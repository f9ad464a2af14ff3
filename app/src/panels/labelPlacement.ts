/** An axis-aligned box in drawing units (px of the section's view box). */
export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** One place a label may go: its text's anchor point and alignment, as SVG's `text-anchor` takes it. */
export interface LabelSpot {
  x: number;
  /** the text's baseline */
  y: number;
  anchor: 'start' | 'middle' | 'end';
}

export interface LabelWish {
  key: string;
  text: string;
  /** px, the label's font size */
  size: number;
  /** the places to try, best first */
  spots: LabelSpot[];
  /** a label that may be left out when every spot is taken (its meaning is drawn another way) */
  optional?: boolean;
}

export interface PlacedLabel extends LabelSpot {
  key: string;
  text: string;
  box: Box;
}

/** Average advance of a character as a share of the font size: wide enough for capitals and digits. */
const CHAR_WIDTH = 0.62;

/** The box a label's text covers at `spot`, from its length and font size (the page's fonts are not measured). */
export function labelBox(text: string, size: number, spot: LabelSpot): Box {
  const w = text.length * size * CHAR_WIDTH;
  const x0 = spot.anchor === 'start' ? spot.x : spot.anchor === 'end' ? spot.x - w : spot.x - w / 2;
  return { x0, y0: spot.y - size * 0.8, x1: x0 + w, y1: spot.y + size * 0.2 };
}

const overlap = (a: Box, b: Box) =>
  Math.max(0, Math.min(a.x1, b.x1) - Math.max(a.x0, b.x0)) * Math.max(0, Math.min(a.y1, b.y1) - Math.max(a.y0, b.y0));

const outside = (b: Box, frame: Box) =>
  Math.max(0, frame.x0 - b.x0) +
  Math.max(0, b.x1 - frame.x1) +
  Math.max(0, frame.y0 - b.y0) +
  Math.max(0, b.y1 - frame.y1);

/**
 * Places labels one after the other in the order given (the most important first), each at its first
 * spot that lies inside `frame` and clear of `blocked` and of the labels placed before it. When no spot
 * is clear, an optional label is left out and any other takes the spot it overlaps least (a fitting's
 * mark is never hidden).
 */
export function placeLabels(wishes: LabelWish[], blocked: Box[], frame: Box): PlacedLabel[] {
  const taken = [...blocked];
  const placed: PlacedLabel[] = [];
  for (const wish of wishes) {
    let best: { spot: LabelSpot; box: Box; cost: number } | null = null;
    for (const spot of wish.spots) {
      const box = labelBox(wish.text, wish.size, spot);
      let cost = outside(box, frame) * wish.size;
      for (const t of taken) cost += overlap(box, t);
      if (!best || cost < best.cost) best = { spot, box, cost };
      if (cost === 0) break;
    }
    if (!best || (best.cost > 0 && wish.optional)) continue;
    taken.push(best.box);
    placed.push({ key: wish.key, text: wish.text, ...best.spot, box: best.box });
  }
  return placed;
}
