import { angleBetween, horizontal, horizontalNorm, norm, type Vec3 } from '../geometry/vector.js';
import { value, type CalcStep } from '../analysis/calcRecord.js';
import { WATER_UNIT_WEIGHT } from './passiveResistance.js';
import type { Leg } from '../network/legs.js';
import type { FittingGeometry } from '../network/fittingKind.js';
import type { Project, ProjectNode, Soil } from '../model/projectSchema.js';
import type { ThrustEnvelope } from '../thrust/fittingThrust.js';
import { formatSi } from '../units/format.js';
import { sizeBearingBlock, type BearingBlock } from './bearingBlock.js';
import { sizeGravityAnchor, type GravityAnchor } from './gravityAnchor.js';
import { restrainedLength, type RestrainedLeg } from './restrainedLength.js';
import { sizeTrenchBottom, type TrenchBottomBearing } from './trenchBottom.js';
import { dimensionStep } from './rounding.js';

export interface Restraint {
  block: BearingBlock | null;
  anchor: GravityAnchor | null;
  trenchBottom: TrenchBottomBearing | null;
  /** m, the longest restrained length of any leg, or null */
  restrainedLength: number | null;
  restrainedLegs: RestrainedLeg[];
  /** the record of the restraint, in order (empty unless asked for) */
  steps: CalcStep[];
  warnings: string[];
}

/** Clear width each side of the pipe assumed for the trench when the design gives none, m (common practice). */
export const TRENCH_CLEARANCE = 0.3;
/** A bearing face within this plan angle of a pipe's axis stands across that pipe's trench, degrees. */
const ACROSS_TRENCH = 30;

/** The soil a node bears on: its own, else the project default, else the first soil. */
export function nodeSoil(project: Project, node: ProjectNode): Soil {
  const id = node.soil ?? project.defaultSoil;
  return project.soils.find((s) => s.id === id) ?? project.soils[0]!;
}

/** A component counts as present above floating-point noise of the vector sum. */
const present = (force: number, total: number) => force > 1e-7 * total && force > 0;

/**
 * Sizes the restraint of one fitting from its thrust envelope (project-format.md: block from the
 * largest horizontal thrust, anchor from the largest upward thrust): bearing block, gravity anchor
 * and trench-bottom bearing for concrete restraint; restrained joint lengths where the node asks for
 * them or where the soil has no bearing.
 */
export function sizeRestraint(
  project: Project,
  node: ProjectNode,
  legs: readonly Leg[],
  geometry: FittingGeometry,
  envelope: ThrustEnvelope,
  record = false,
): Restraint {
  const { design } = project;
  const units = project.units;
  const step = dimensionStep(units);
  const soil = nodeSoil(project, node);
  let od = 0;
  for (const l of legs) od = Math.max(od, l.pipe.outsideDiameter);
  const total = norm(envelope.governing.total);
  const groundLevel = node.elevation + od / 2 + node.cover;
  const gw = design.groundwaterElevation;
  const waterDepth = gw === null ? null : Math.max(0, groundLevel - gw);
  const trenchWidth = design.trenchWidth ?? od + 2 * TRENCH_CLEARANCE;
  const out: Restraint = { block: null, anchor: null, trenchBottom: null, restrainedLength: null, restrainedLegs: [], steps: [], warnings: [] };
  const len = (m: number) => formatSi(m, 'length', units);
  const soilName = soil.label ?? soil.id;

  let needJoints = node.restraint === 'joints';
  if (node.restraint === 'block') {
    const h = envelope.horizontal;
    if (present(h.force, total)) {
      const allowable = soil.bearing + (soil.bearingPerDepth ?? 0) * (node.cover + od / 2);
      if (allowable <= 0) {
        needJoints = true;
        out.warnings.push(
          `No bearing: ${soilName} has no allowable bearing (muck, peat or unprepared fill). A thrust block cannot be used: restrained joints are sized instead; piles or soil replacement are the other choices.`,
        );
      } else {
        const r = sizeBearingBlock({
          thrust: h.force,
          direction: h.direction,
          allowableBearing: allowable,
          safetyFactor: design.bearingSafetyFactor,
          outsideDiameter: od,
          cover: node.cover,
          step,
          blockDepth: design.blockDepth,
          soil,
          waterDepth,
          units,
          record,
        });
        out.block = r.block;
        out.steps.push(...r.steps);
        out.warnings.push(...r.warnings);
        if (acrossTrench(h.direction, legs) && r.block.faceWidth > trenchWidth + 1e-9) {
          out.warnings.push(
            `Bearing face ${len(r.block.faceWidth)} wide is wider than the ${len(trenchWidth)} trench it stands across: cut the face by hand into undisturbed soil beyond the trench, or use restrained joints.`,
          );
        }
        if (soil.minCover !== undefined && node.cover < soil.minCover) {
          out.warnings.push(`The bearing value of ${soilName} holds for more than ${len(soil.minCover)} of cover; this fitting has ${len(node.cover)}.`);
        }
      }
    }
    const submerged = gw !== null && gw > node.elevation - od / 2;
    if (present(envelope.upward.force, total)) {
      const held = out.block !== null && blockHoldsUplift(out.block, design, submerged, envelope.upward.force);
      if (held && record) out.steps.push(upliftStep(out.block!, design, submerged, envelope.upward.force));
      if (!held) {
        const r = sizeGravityAnchor({
          upward: envelope.upward.force,
          horizontal: envelope.horizontal.force,
          safetyFactor: design.upliftSafetyFactor,
          concreteUnitWeight: design.concreteUnitWeight,
          submerged,
          frictionAngle: soil.frictionAngle,
          step,
          record,
        });
        out.anchor = r.anchor;
        out.steps.push(...r.steps);
        out.warnings.push(...r.warnings);
      }
    }
    if (present(envelope.downward.force, total)) {
      const vertical = soil.verticalBearing ?? soil.bearing;
      if (vertical > 0) {
        const r = sizeTrenchBottom(envelope.downward.force, design.bearingSafetyFactor, vertical, trenchWidth, od, step, record);
        const base = out.block ? out.block.faceWidth * out.block.depth : 0;
        if (base >= r.bearing.bearingArea) {
          if (record) out.steps.push({ ...r.steps[0]!, title: 'Bearing on the trench bottom: the block’s base is enough' });
        } else {
          out.trenchBottom = r.bearing;
          out.steps.push(...r.steps);
        }
      } else {
        out.warnings.push(`No bearing under the fitting: ${soilName} cannot take the downward thrust; restrain the joints or replace the soil.`);
        needJoints = true;
      }
    }
  }
  if (needJoints && total > 0) {
    const r = restrainedLength({
      kind: geometry.kind,
      legs,
      thrust: envelope.governing.total,
      deflection: geometry.deflection,
      soil,
      cover: node.cover,
      safetyFactor: design.restraintSafetyFactor,
      units,
      record,
    });
    out.restrainedLegs = r.legs;
    out.restrainedLength = r.legs.length ? Math.max(...r.legs.map((l) => l.length)) : null;
    out.steps.push(...r.steps);
    out.warnings.push(...r.warnings);
  }
  return out;
}

/** Weight of a bearing block, N: its concrete, submerged where groundwater reaches it. */
function blockWeight(block: BearingBlock, design: Project['design'], submerged: boolean): number {
  return (submerged ? design.concreteUnitWeight - WATER_UNIT_WEIGHT : design.concreteUnitWeight) * block.concreteVolume;
}

/**
 * A bearing block's own weight holds a small upward thrust when it is at least SF times that thrust
 * (the same weight rule as a gravity anchor, §5.2); no separate anchor is sized then.
 */
const blockHoldsUplift = (block: BearingBlock, design: Project['design'], submerged: boolean, upward: number) =>
  blockWeight(block, design, submerged) >= design.upliftSafetyFactor * upward;

function upliftStep(block: BearingBlock, design: Project['design'], submerged: boolean, upward: number): CalcStep {
  const unitWeight = submerged ? design.concreteUnitWeight - WATER_UNIT_WEIGHT : design.concreteUnitWeight;
  return {
    title: 'Upward thrust held by the bearing block’s weight',
    formula: 'γ·V_block ≥ SF · T_up',
    inputs: [
      value('T_up', 'largest upward thrust', upward, 'force', 'momentum balance'),
      value('SF', 'uplift safety factor', design.upliftSafetyFactor, 'ratio', 'project design'),
      value('V_block', 'bearing block concrete', block.concreteVolume, 'volume', 'computed'),
      value('γ', submerged ? 'submerged unit weight of concrete' : 'unit weight of concrete', unitWeight, 'unitWeight', 'project design'),
    ],
    result: value('W', 'weight of the block', blockWeight(block, design, submerged), 'force', 'no separate anchor needed'),
    reference: 'Weight ≥ SF × upward thrust (DIPRA gravity block rule, from memory)',
  };
}

/** True when the bearing direction runs within ACROSS_TRENCH of a pipe's plan axis. */
function acrossTrench(direction: Vec3, legs: readonly Leg[]): boolean {
  return legs.some((l) => {
    const plan = horizontal(l.direction);
    if (horizontalNorm(plan) < 1e-9) return false;
    const a = angleBetween(direction, plan);
    return Math.min(a, 180 - a) < ACROSS_TRENCH;
  });
}
