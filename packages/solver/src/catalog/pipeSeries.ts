import type { Material } from '../model/projectSchema.js';

/** One size of a pipe series; diameters in metres. */
export interface PipeSize {
  /** nominal size key: inches ('8') or DN ('DN200') */
  nominal: string;
  /** for display: '8 in', 'DN 200' */
  label: string;
  /** m */
  outsideDiameter: number;
  /** m */
  insideDiameter: number;
  /** m */
  wall: number;
}

/** A family of sizes made to one standard and wall rule. */
export interface PipeSeries {
  id: string;
  label: string;
  material: Material;
  /** the standard and table the outside diameters come from */
  standard: string;
  /** how the inside diameter was obtained */
  wallBasis: string;
  sizes: readonly PipeSize[];
}

/** A size from an outside diameter and a wall thickness, both in metres. */
export function sizeFromWall(nominal: string, label: string, od: number, wall: number): PipeSize {
  return { nominal, label, outsideDiameter: od, insideDiameter: od - 2 * wall, wall };
}
