import type { Scene, SceneFitting, ScenePipe } from './planScene.js';

type Plain = Scene['plainNodes'][number];

const samePoint = (a: { x: number; y: number }, b: { x: number; y: number }) => a.x === b.x && a.y === b.y;

const samePipe = (a: ScenePipe, b: ScenePipe) =>
  a.id === b.id &&
  samePoint(a.a, b.a) &&
  samePoint(a.b, b.b) &&
  a.outsideDiameter === b.outsideDiameter &&
  a.material === b.material &&
  a.selected === b.selected;

const sameFitting = (a: SceneFitting, b: SceneFitting) =>
  a.node === b.node &&
  a.mark === b.mark &&
  a.kind === b.kind &&
  samePoint(a.at, b.at) &&
  samePoint(a.axis, b.axis) &&
  a.warned === b.warned &&
  a.selected === b.selected;

const samePlain = (a: Plain, b: Plain) =>
  a.id === b.id && a.mark === b.mark && a.tieIn === b.tieIn && a.selected === b.selected && samePoint(a.at, b.at);

function same<T>(prev: T[], next: T[], eq: (a: T, b: T) => boolean): T[] {
  if (prev === next) return prev;
  if (prev.length !== next.length) return next;
  for (let i = 0; i < next.length; i++) if (!eq(prev[i]!, next[i]!)) return next;
  return prev;
}

/**
 * The next scene, with the parts equal to the previous scene's replaced by the previous objects: a
 * test-pressure change makes a new scene whose pipes, symbols and marks are unchanged, and keeping
 * them identical tells the layers drawing them that they need not draw again.
 */
export function reuseEqualParts(prev: Scene | null, next: Scene): Scene {
  if (!prev) return next;
  const pipes = same(prev.pipes, next.pipes, samePipe);
  const fittings = same(prev.fittings, next.fittings, sameFitting);
  const plainNodes = same(prev.plainNodes, next.plainNodes, samePlain);
  return { ...next, pipes, fittings, plainNodes };
}
