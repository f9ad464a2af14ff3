import { STANDARD_GRAVITY } from '../units/quantities.js';
import type { LoadCase } from '../model/projectSchema.js';

/**
 * Gauge pressure at a point of elevation z for a load case, Pa: the case pressure at its datum
 * plus the static head between datum and point, p = p_case + ρ·g·(z_datum − z) (hydrostatics;
 * project-format.md). Without a datum the case pressure applies everywhere.
 *
 * @param density water density, kg/m³
 * @param elevation pipe centreline elevation at the point, m
 */
export function pressureAt(loadCase: LoadCase, elevation: number, density: number): number {
  if (loadCase.datumElevation === undefined) return loadCase.pressure;
  return loadCase.pressure + density * STANDARD_GRAVITY * (loadCase.datumElevation - elevation);
}
