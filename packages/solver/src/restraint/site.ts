import { STANDARD_GRAVITY } from '../units/quantities.js';
import type { Leg } from '../network/legs.js';
import type { Project, ProjectNode, Soil } from '../model/projectSchema.js';
import { VALUES } from '../provenance/registerValues.js';
import { nodeCover, nodeGround } from '../model/groundLevel.js';

/** Clear width each side of the pipe assumed for the trench when the design gives none, m (common practice). */
export const TRENCH_CLEARANCE = VALUES['trench.clearance'];

/** The soil a node bears on: its own, else the project default, else the first soil. */
export function nodeSoil(project: Project, node: ProjectNode): Soil {
  const id = node.soil ?? project.defaultSoil;
  return project.soils.find((s) => s.id === id) ?? project.soils[0]!;
}

/**
 * Pa, a soil's allowable bearing at a block's face centre, level with the pipe's axis: its bearing and
 * its rise with depth (`bearingPerDepth`) over the cover and half the outside diameter.
 */
export const bearingAtDepth = (soil: Soil, cover: number, od: number): number =>
  soil.bearing + (soil.bearingPerDepth ?? 0) * (cover + od / 2);

/** Where a fitting sits, as its restraint needs it: soil, depths, groundwater, trench, units. */
export interface FittingSite {
  soil: Soil;
  soilName: string;
  /** m, largest outside diameter at the fitting */
  od: number;
  /** m, ground to top of pipe */
  cover: number;
  /** m, pipe invert elevation */
  invert: number;
  /** m, groundwater elevation, or null when below every block */
  groundwater: number | null;
  /** m below ground of the water table (0 when at or above ground), or null */
  waterDepth: number | null;
  /** m */
  trenchWidth: number;
  /** N/m³, ρ·g of the project's water */
  waterUnitWeight: number;
  /** m, the project's construction step */
  step: number;
}

export function fittingSite(project: Project, node: ProjectNode, legs: readonly Leg[]): FittingSite {
  let od = 0;
  for (const l of legs) od = Math.max(od, l.pipe.outsideDiameter);
  const soil = nodeSoil(project, node);
  const gw = project.design.groundwaterElevation;
  const ground = nodeGround(node, od);
  return {
    soil,
    soilName: soil.label ?? soil.id,
    od,
    cover: nodeCover(node, od),
    invert: node.elevation - od / 2,
    groundwater: gw,
    waterDepth: gw === null ? null : Math.max(0, ground - gw),
    trenchWidth: project.design.trenchWidth ?? od + 2 * TRENCH_CLEARANCE,
    waterUnitWeight: project.water.density * STANDARD_GRAVITY,
    step: project.design.dimensionStep,
  };
}

/** Unit weight of concrete, N/m³, submerged (γc − γw: Archimedes) where groundwater reaches it. */
export const concreteWeight = (concreteUnitWeight: number, site: FittingSite, submerged: boolean) =>
  submerged ? concreteUnitWeight - site.waterUnitWeight : concreteUnitWeight;
