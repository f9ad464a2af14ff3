import type { Material } from '../model/projectSchema.js';
import type { ProvenanceId } from '../provenance/register.js';

/**
 * What a pipe may carry, gauge Pa, as its standard rates it: the sustained working pressure (AWWA
 * pressure class, EN PFA, PN), working plus surge (the class with the standard's surge allowance, EN
 * PMA) and the field test (EN PEA; AWWA: the installation standard's limit).
 */
export interface PressureRating {
  /** the class as the standard names it: "PC 350", "C40", "PN 10" */
  label: string;
  working: number;
  withSurge: number;
  test: number;
  /** the register entry the limits come from */
  basis: ProvenanceId;
}

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
  /** the pressure rating of this size in its series */
  rating?: PressureRating;
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
  /** sizes named in inches (AWWA) or in millimetres (EN, ISO): the picker offers a project's own first */
  sizing: 'inch' | 'metric';
  sizes: readonly PipeSize[];
}

/** A size from its outside diameter and wall, both m: ID = OD − 2t. */
export function sizeFromWall(
  nominal: string,
  label: string,
  outsideDiameter: number,
  wall: number,
  rating?: PressureRating,
): PipeSize {
  return {
    nominal,
    label,
    outsideDiameter,
    insideDiameter: outsideDiameter - 2 * wall,
    wall,
    ...(rating ? { rating } : {}),
  };
}

/**
 * A size whose minimum wall is t = OD/DR (the dimension-ratio rule of AWWA C900 and C906);
 * OD in m, DR dimensionless.
 */
export function sizeFromDr(
  nominal: string,
  label: string,
  outsideDiameter: number,
  dr: number,
  rating?: PressureRating,
): PipeSize {
  return sizeFromWall(nominal, label, outsideDiameter, outsideDiameter / dr, rating);
}
