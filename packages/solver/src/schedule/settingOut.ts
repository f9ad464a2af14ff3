import { VALUES } from '../provenance/registerValues.js';
import { planBearing, type Vec3 } from '../geometry/vector.js';
import type { ScheduleFitting } from './scheduleRows.js';

/** Thickness of a trench-bottom pad, m (register: pad.thickness), never less than the construction step. */
export const padThickness = (step: number): number => Math.max(VALUES['pad.thickness'], step);

/**
 * An anchor's three dimensions. The anchor sizing may report length × width × height; where it
 * reports only a volume and the `side` of a cube, the anchor is drawn and set out as that cube and
 * `cube` says so (the sketch writes "cube"). Read loosely so that either shape of anchor works.
 */
export function anchorBox(anchor: object): { length: number; width: number; height: number; cube: boolean } {
  const a = anchor as { side?: number; length?: number; width?: number; height?: number };
  if (a.length !== undefined && a.width !== undefined && a.height !== undefined)
    return { length: a.length, width: a.width, height: a.height, cube: false };
  const side = a.side ?? 0;
  return { length: side, width: side, height: side, cube: true };
}

/** Where one piece of concrete goes: its centre in plan and its top and base below ground. SI. */
export interface SetOutPlace {
  east: number;
  north: number;
  /** m below ground of its top */
  topDepth: number;
  /** m below ground of its base */
  baseDepth: number;
  /** m, level of its base */
  baseLevel: number;
}

export interface BlockSetOut extends SetOutPlace {
  faceWidth: number;
  faceHeight: number;
  /** m, fitting centreline to the bearing face (the design's block thickness) */
  thickness: number;
  /** unit plan vector the block bears toward (away from the fitting) */
  direction: [number, number];
  /** degrees clockwise from north the bearing face looks toward */
  bearing: number;
}

export interface AnchorSetOut extends SetOutPlace {
  length: number;
  width: number;
  height: number;
  cube: boolean;
  submerged: boolean;
}

export interface PadSetOut extends SetOutPlace {
  width: number;
  length: number;
  thickness: number;
}

/** Setting-out data of one fitting: what a crew pegs and levels. SI, levels in m. */
export interface SettingOut {
  east: number;
  north: number;
  centreline: number;
  /** inside bottom of the largest pipe */
  invert: number;
  ground: number;
  /** m, largest outside diameter */
  od: number;
  block: BlockSetOut | null;
  reverseBlock: BlockSetOut | null;
  anchor: AnchorSetOut | null;
  pad: PadSetOut | null;
}

/**
 * Where each piece of a fitting's restraint goes, from the computed geometry and stated conventions:
 * - a bearing block's face is centred on the pipe centreline (as the block sizing assumes) and lies
 *   `thickness` from the fitting's centreline in the bearing direction, the block filling the space
 *   between (its volume, face × thickness, includes the fitting's); its centre is half-way;
 * - a gravity anchor hangs centred under the fitting, its top at the pipe's underside (as the anchor
 *   sizing's groundwater test assumes);
 * - a trench-bottom pad lies centred under the fitting, its top at the pipe's underside.
 * Depths are measured from the ground over the fitting.
 */
export function settingOut(f: ScheduleFitting, step: number): SettingOut {
  const [east, north, centreline] = f.position;
  const largest = f.pipes.reduce((a, p) => (p.outsideDiameter > a.outsideDiameter ? p : a), f.pipes[0]!);
  const od = largest.outsideDiameter;
  const ground = f.groundLevel;
  const centreDepth = ground - centreline;
  const underside = centreDepth + od / 2;
  const r = f.restraint;
  const block = (b: ScheduleFitting['restraint']['block']): BlockSetOut | null => {
    if (!b) return null;
    const len = Math.hypot(b.direction[0], b.direction[1]) || 1;
    const d: [number, number] = [b.direction[0] / len, b.direction[1] / len];
    const baseDepth = centreDepth + b.faceHeight / 2;
    return {
      east: east + (d[0] * b.depth) / 2,
      north: north + (d[1] * b.depth) / 2,
      topDepth: centreDepth - b.faceHeight / 2,
      baseDepth,
      baseLevel: ground - baseDepth,
      faceWidth: b.faceWidth,
      faceHeight: b.faceHeight,
      thickness: b.depth,
      direction: d,
      bearing: planBearing([d[0], d[1], 0] as Vec3),
    };
  };
  const anchor = ((): AnchorSetOut | null => {
    if (!r.anchor) return null;
    const box = anchorBox(r.anchor);
    return {
      east,
      north,
      topDepth: underside,
      baseDepth: underside + box.height,
      baseLevel: ground - underside - box.height,
      ...box,
      submerged: r.anchor.submerged,
    };
  })();
  const pad = ((): PadSetOut | null => {
    if (!r.trenchBottom) return null;
    const thickness = padThickness(step);
    return {
      east,
      north,
      topDepth: underside,
      baseDepth: underside + thickness,
      baseLevel: ground - underside - thickness,
      width: r.trenchBottom.width,
      length: r.trenchBottom.length,
      thickness,
    };
  })();
  return {
    east,
    north,
    centreline,
    invert: centreline - largest.insideDiameter / 2,
    ground,
    od,
    block: block(r.block),
    reverseBlock: block(r.reverseBlock),
    anchor,
    pad,
  };
}
