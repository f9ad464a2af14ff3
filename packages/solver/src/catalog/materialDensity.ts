import type { Material } from '../model/projectSchema.js';
import { STANDARD_GRAVITY } from '../units/quantities.js';

/**
 * Density of each pipe material, kg/m³, for the pipe self-weight that adds to pipe–soil friction.
 * - ductile iron 7,050: the density EN 545 / ISO 2531 use for pipe masses (from memory); the AWWA
 *   C150/C151 weight tables imply 0.255 lb/in³ ≈ 7,058 kg/m³ (from memory).
 * - PVC 1,400: specific gravity of cell-class 12454 compound, ASTM D1784 (from memory).
 * - HDPE 955: PE4710 pipe compound with carbon black, ASTM D3350 density cell (from memory).
 * - steel 7,850: the usual carbon-steel value (from memory).
 * - other 7,050: taken as ductile iron (assumption, not a published figure); a project can give
 *   pipe.weightPerLength instead.
 */
export const MATERIAL_DENSITY: Readonly<Record<Material, number>> = {
  'ductile-iron': 7050,
  pvc: 1400,
  hdpe: 955,
  steel: 7850,
  other: 7050,
};

/**
 * Pipe self-weight per length, N/m: ρ × g × π/4 × (OD² − ID²), diameters in m. Barrel only:
 * bells, lining and coatings are not counted.
 */
export function pipeWeightPerLength(material: Material, outsideDiameter: number, insideDiameter: number): number {
  const wallArea = (Math.PI / 4) * (outsideDiameter ** 2 - insideDiameter ** 2);
  return MATERIAL_DENSITY[material] * STANDARD_GRAVITY * wallArea;
}
