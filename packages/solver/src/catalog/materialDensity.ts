import type { Material } from '../model/projectSchema.js';
import { STANDARD_GRAVITY } from '../units/quantities.js';

/**
 * Density of each pipe material, kg/m³, for pipe self-weight: ductile iron 0.255 lb/in³ as used in
 * the AWWA C150 weight tables (from memory); PVC specific gravity 1.40 (cell class 12454, from
 * memory); PE4710 about 0.955 g/cm³ (ASTM D3350 density cell, from memory); carbon steel 7,850
 * (common value). "Other" is taken as ductile iron.
 */
export const MATERIAL_DENSITY: Readonly<Record<Material, number>> = {
  'ductile-iron': 7060,
  pvc: 1400,
  hdpe: 955,
  steel: 7850,
  other: 7060,
};

/** Pipe self-weight per metre, N/m: density × g × π/4 × (OD² − ID²); lining and bells ignored. */
export function pipeWeightPerLength(material: Material, outsideDiameter: number, insideDiameter: number): number {
  return (MATERIAL_DENSITY[material] * STANDARD_GRAVITY * Math.PI * (outsideDiameter ** 2 - insideDiameter ** 2)) / 4;
}
