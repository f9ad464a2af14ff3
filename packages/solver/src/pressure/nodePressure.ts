import { STANDARD_GRAVITY } from '../units/quantities.js';
import type { LoadCase } from '../model/projectSchema.js';
import { VALUES } from '../provenance/registerValues.js';

/** The lowest gauge pressure water in a pipe can have, Pa (register: water.vapour-floor). Below it the column separates. */
export const VACUUM_GAUGE_PRESSURE = VALUES['water.vapour-floor'];

/**
 * Gauge pressure at a point of elevation z for a load case, Pa: the case pressure at its datum
 * plus the static head between datum and point, p = p_case + ρ·g·(z_datum − z) (hydrostatics;
 * project-format.md), never below the vapour pressure. Without a datum the case pressure applies
 * everywhere.
 *
 * @param density water density, kg/m³
 * @param elevation pipe centreline elevation at the point, m
 */
export function pressureAt(loadCase: LoadCase, elevation: number, density: number): number {
  if (loadCase.datumElevation === undefined) return Math.max(loadCase.pressure, VACUUM_GAUGE_PRESSURE);
  return Math.max(
    VACUUM_GAUGE_PRESSURE,
    loadCase.pressure + density * STANDARD_GRAVITY * (loadCase.datumElevation - elevation),
  );
}
