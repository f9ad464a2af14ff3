import type { Material } from '../model/projectSchema.js';

/** One size of a pipe series; every length in metres. */
export interface PipeSize {
  /** key of the size within its series: inches ('8') or DN ('DN200') */
  nominal: string;
  /** for display: '8 in', 'DN 200' */
  label: string;
  /** m */
  outsideDiameter: number;
  /** m, bare wall (no lining deducted) */
  insideDiameter: number;
  /** m */
  wall: number;
}

/** A family of sizes made to one standard and one wall rule. */
export interface PipeSeries {
  /** stable id stored in project files (pipe.series) */
  id: string;
  label: string;
  material: Material;
  /** the standard and table the sizes come from */
  standard: string;
  /** how the inside diameter was obtained */
  wallBasis: string;
  sizes: readonly PipeSize[];
}

/** A size from its outside diameter and wall, both m: ID = OD − 2t. */
export function sizeFromWall(nominal: string, label: string, outsideDiameter: number, wall: number): PipeSize {
  return { nominal, label, outsideDiameter, insideDiameter: outsideDiameter - 2 * wall, wall };
}

/**
 * A size whose minimum wall is t = OD/DR (the dimension-ratio rule of AWWA C900 and C906);
 * OD in m, DR dimensionless.
 */
export function sizeFromDr(nominal: string, label: string, outsideDiameter: number, dr: number): PipeSize {
  return sizeFromWall(nominal, label, outsideDiameter, outsideDiameter / dr);
}
