import type { Material } from '../model/projectSchema.js';
import { STANDARD_GRAVITY } from '../units/quantities.js';
import { VALUES } from '../provenance/registerValues.js';

/**
 * Density of each pipe material, kg/m³, for the pipe self-weight that adds to pipe–soil friction
 * (register: material.density). "other" is taken as ductile iron, an assumption: a project can give
 * pipe.weightPerLength instead.
 */
export const MATERIAL_DENSITY: Readonly<Record<Material, number>> = {
  ...VALUES['material.density'],
  other: VALUES['material.density']['ductile-iron'],
};

/**
 * Pipe self-weight per length, N/m: ρ × g × π/4 × (OD² − ID²), diameters in m. Barrel only:
 * bells, lining and coatings are not counted.
 */
export function pipeWeightPerLength(material: Material, outsideDiameter: number, insideDiameter: number): number {
  const wallArea = (Math.PI / 4) * (outsideDiameter ** 2 - insideDiameter ** 2);
  return MATERIAL_DENSITY[material] * STANDARD_GRAVITY * wallArea;
}
