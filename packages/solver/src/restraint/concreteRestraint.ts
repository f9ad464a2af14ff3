import { angleBetween, horizontal, horizontalNorm, type Vec3 } from '../geometry/vector.js';
import { value, type CalcStep } from '../analysis/calcRecord.js';
import type { Leg } from '../network/legs.js';
import type { Project } from '../model/projectSchema.js';
import type { ThrustEnvelope } from '../thrust/fittingThrust.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { REGISTER } from '../provenance/register.js';
import { sizeBearingBlock, type BearingBlock } from './bearingBlock.js';
import { sizeGravityAnchor, type GravityAnchor } from './gravityAnchor.js';
import { sizeTrenchBottom, type TrenchBottomBearing } from './trenchBottom.js';
import { concreteWeight, type FittingSite } from './site.js';

export interface ConcreteRestraint {
  block: BearingBlock | null;
  /** a second block on the other side, where the thrust reverses between states */
  reverseBlock: BearingBlock | null;
  anchor: GravityAnchor | null;
  trenchBottom: TrenchBottomBearing | null;
  /** the soil cannot bear: restrained joints must be sized instead */
  needsJoints: boolean;
  steps: CalcStep[];
  diagnostics: Diagnostic[];
}

/** A component counts as present above floating-point noise of the vector sum. */
export const present = (force: number, total: number) => force > 1e-7 * total && force > 0;

/** True when the bearing direction runs within the across-trench angle of a pipe's plan axis. */
function acrossTrench(direction: Vec3, legs: readonly Leg[]): boolean {
  return legs.some((l) => {
    const plan = horizontal(l.direction);
    if (horizontalNorm(plan) < 1e-9) return false;
    const a = angleBetween(direction, plan);
    return Math.min(a, 180 - a) < REGISTER['block.across-trench'].value;
  });
}

/**
 * Concrete restraint of one fitting (project-format.md: block from the largest horizontal thrust,
 * anchor from the largest upward thrust): a gravity anchor for upward thrust; a bearing block against
 * undisturbed soil for the horizontal thrust, and a second one where the thrust reverses; bearing on
 * the trench bottom for downward thrust. A block's own weight may hold a small uplift, and an anchor's
 * base friction a small horizontal thrust, so that one piece of concrete does both jobs.
 */
export function concreteRestraint(
  project: Project,
  node: string,
  legs: readonly Leg[],
  envelope: ThrustEnvelope,
  total: number,
  site: FittingSite,
  record: boolean,
): ConcreteRestraint {
  const { design } = project;
  const { soil } = site;
  const out: ConcreteRestraint = {
    block: null,
    reverseBlock: null,
    anchor: null,
    trenchBottom: null,
    needsJoints: false,
    steps: [],
    diagnostics: [],
  };
  const h = envelope.horizontal;
  const up = envelope.upward.force;

  // The anchor's record and findings are kept apart until we know the anchor stays.
  const anchor = present(up, total)
    ? sizeGravityAnchor({
        upward: up,
        horizontal: h.force,
        safetyFactor: design.upliftSafetyFactor,
        concreteUnitWeight: design.concreteUnitWeight,
        site,
        record,
      })
    : null;
  const horizontalNeeded = Math.max(h.force, envelope.reverse?.force ?? 0);
  const frictionHolds = anchor !== null && anchor.anchor.baseFriction >= design.bearingSafetyFactor * horizontalNeeded;
  const frictionStep: CalcStep[] =
    present(h.force, total) && frictionHolds && record
      ? [
          {
            title: 'Horizontal thrust held by the anchor’s base friction',
            formula: 'F_f ≥ SF · T_h',
            inputs: [
              value('T_h', 'largest horizontal thrust', horizontalNeeded, 'force', 'momentum balance'),
              value('SF', 'bearing safety factor', design.bearingSafetyFactor, 'ratio', 'project design'),
            ],
            result: value(
              'F_f',
              'base friction of the anchor',
              anchor!.anchor.baseFriction,
              'force',
              'no bearing block needed',
            ),
            reference: 'Sliding resistance W′·tan(⅔φ) of a cast-in-place base (common practice)',
          },
        ]
      : [];
  let blockWeightHoldsUplift = false;
  if (present(h.force, total) && !frictionHolds) {
    const allowable = soil.bearing + (soil.bearingPerDepth ?? 0) * (site.cover + site.od / 2);
    if (allowable <= 0) {
      out.needsJoints = true;
      out.diagnostics.push(diagnostic('soil.no-bearing', { node, soil: soil.id }));
    } else {
      const block = (force: number, direction: Vec3) => {
        const r = sizeBearingBlock({
          thrust: force,
          direction,
          allowableBearing: allowable,
          safetyFactor: design.bearingSafetyFactor,
          outsideDiameter: site.od,
          cover: site.cover,
          step: site.step,
          blockDepth: design.blockDepth,
          soil,
          waterDepth: site.waterDepth,
          waterUnitWeight: site.waterUnitWeight,
          record,
        });
        out.steps.push(...r.steps);
        for (const d of r.diagnostics) out.diagnostics.push({ ...d, subject: { ...d.subject, node } });
        if (acrossTrench(direction, legs) && r.block.faceWidth > site.trenchWidth + 1e-9) {
          out.diagnostics.push(
            diagnostic(
              'block.wider-than-trench',
              { node },
              { faceWidth: r.block.faceWidth, trenchWidth: site.trenchWidth },
            ),
          );
        }
        return r.block;
      };
      out.block = block(h.force, h.direction);
      if (envelope.reverse) {
        out.reverseBlock = block(envelope.reverse.force, envelope.reverse.direction);
        out.diagnostics.push(diagnostic('block.thrust-reverses', { node }, { force: envelope.reverse.force }));
      }
      if (soil.minCover !== undefined && site.cover < soil.minCover) {
        out.diagnostics.push(
          diagnostic('soil.below-min-cover', { node, soil: soil.id }, { minCover: soil.minCover, cover: site.cover }),
        );
      }
      // A block heavy enough to hold the uplift makes the anchor unnecessary.
      const submerged = site.groundwater !== null && site.groundwater > site.invert - out.block.faceHeight;
      const weight = concreteWeight(design.concreteUnitWeight, site, submerged) * out.block.concreteVolume;
      if (anchor && weight >= design.upliftSafetyFactor * up) {
        blockWeightHoldsUplift = true;
        if (record) {
          out.steps.push({
            title: 'Upward thrust held by the bearing block’s weight',
            formula: 'γ·V_block ≥ SF · T_up',
            inputs: [
              value('T_up', 'largest upward thrust', up, 'force', 'momentum balance'),
              value('SF', 'uplift safety factor', design.upliftSafetyFactor, 'ratio', 'project design'),
              value('V_block', 'bearing block concrete', out.block.concreteVolume, 'volume', 'computed'),
            ],
            result: value('W', 'weight of the block', weight, 'force', 'no separate anchor needed'),
            reference: 'Weight ≥ SF × upward thrust (statics)',
          });
        }
      }
    }
  }
  if (anchor && !blockWeightHoldsUplift) {
    out.anchor = anchor.anchor;
    out.steps.unshift(...anchor.steps, ...frictionStep);
    for (const d of anchor.diagnostics) out.diagnostics.push({ ...d, subject: { ...d.subject, node } });
  }
  if (present(envelope.downward.force, total)) {
    const vertical = soil.verticalBearing ?? soil.bearing;
    if (vertical > 0) {
      const r = sizeTrenchBottom(
        envelope.downward.force,
        design.bearingSafetyFactor,
        vertical,
        site.trenchWidth,
        site.od,
        site.step,
        record,
      );
      const base = out.block ? out.block.faceWidth * out.block.depth : 0;
      if (base >= r.bearing.bearingArea) {
        if (record)
          out.steps.push({ ...r.steps[0]!, title: 'Bearing on the trench bottom: the block’s base is enough' });
      } else {
        out.trenchBottom = r.bearing;
        out.steps.push(...r.steps);
      }
    } else {
      out.diagnostics.push(diagnostic('pad.no-bearing', { node, soil: soil.id }));
      out.needsJoints = true;
    }
  }
  return out;
}
