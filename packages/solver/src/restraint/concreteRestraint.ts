import { angleBetween, horizontal, horizontalNorm, type Vec3 } from '../geometry/vector.js';
import { value, type CalcStep } from '../analysis/calcRecord.js';
import type { Leg } from '../network/legs.js';
import type { Project } from '../model/projectSchema.js';
import type { ThrustEnvelope } from '../thrust/fittingThrust.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { STRAIGHT_TOLERANCE } from '../network/fittingKind.js';
import { VALUES } from '../provenance/registerValues.js';
import { sizeBearingBlock, type BearingBlock, type FaceTerms } from './bearingBlock.js';
import { roundUpTo } from './rounding.js';
import { sizeGravityAnchor, type AnchorResult, type GravityAnchor } from './gravityAnchor.js';
import { sizeTrenchBottom, type TrenchBottomBearing } from './trenchBottom.js';
import { bearingAtDepth, concreteWeight, type FittingSite } from './site.js';

export interface ConcreteRestraint {
  block: BearingBlock | null;
  /** a second block on the other side, where the thrust reverses between states */
  reverseBlock: BearingBlock | null;
  anchor: GravityAnchor | null;
  trenchBottom: TrenchBottomBearing | null;
  /** the soil cannot bear: restrained joints must be sized instead */
  needsJoints: boolean;
  /**
   * how the horizontal and upward thrusts are held where both act: a block and a separate anchor, a
   * block thickened until its weight holds the uplift, or an anchor whose base friction holds both
   */
  scheme: 'block and anchor' | 'heavy block' | 'anchor alone' | null;
  steps: CalcStep[];
  diagnostics: Diagnostic[];
}

/** A component counts as present above floating-point noise of the vector sum. */
export const present = (force: number, total: number) => force > 1e-7 * total && force > 0;

/**
 * N of downward thrust the main block's base bears on the trench bottom: where the downward thrust is
 * present and the base is enough, no pad is sized (below), and the crew must be told the base carries
 * it; else 0. `total` is the governing thrust's magnitude, as the sizing reads it.
 */
export const blockBaseDown = (
  r: { block: object | null; trenchBottom: object | null },
  downward: number,
  total: number,
  diagnostics: readonly { code: string }[],
): number =>
  r.block && !r.trenchBottom && present(downward, total) && !diagnostics.some((d) => d.code === 'pad.no-bearing')
    ? downward
    : 0;

/**
 * True when the bearing face stands across a trench, so the trench width limits it: the block sits in
 * the trench of a pipe that leaves the fitting within the across-trench angle of the bearing direction
 * (a reducer's or valve's block around the pipe), or every pipe lies within that angle of the bearing
 * line, so the trench ends at the fitting and the block bears on its end wall (a dead end, a hairpin
 * bend). A block behind a tee or wye bears on the side wall of the run's trench instead: its face runs
 * along that trench and is not limited by its width.
 */
/**
 * Whether a bearing face stands across a trench, and m², the outside area of the pipes that pass
 * through it: those leaving the fitting within the across-trench angle of the bearing direction (a
 * reducer's smaller pipe, a valve's far pipe). The soil does not bear where a pipe runs through, so the
 * face must be larger by that much.
 */
function faceCrossing(direction: Vec3, legs: readonly Leg[]): { across: boolean; pipeArea: number } {
  const limit = VALUES['block.across-trench'];
  // One pass, no arrays: asked for every block of every fitting.
  let planLegs = 0;
  let allAlongLine = true;
  let pipeArea = 0;
  for (const l of legs) {
    const plan = horizontal(l.direction);
    if (horizontalNorm(plan) < 1e-9) continue;
    const a = angleBetween(direction, plan);
    if (a < limit) pipeArea += (Math.PI * l.pipe.outsideDiameter ** 2) / 4;
    planLegs++;
    if (!(Math.min(a, 180 - a) < limit)) allAlongLine = false;
  }
  return { across: pipeArea > 0 || (planLegs > 0 && allAlongLine), pipeArea };
}

/**
 * Concrete restraint of one fitting (project-format.md: block from the largest horizontal thrust,
 * anchor from the largest upward thrust): a bearing block against undisturbed soil for the horizontal
 * thrust, and a second one where the thrust reverses; a gravity anchor for upward thrust; bearing on the
 * trench bottom for downward thrust.
 *
 * Where horizontal and upward thrust act together, three ways are weighed and the one with the least
 * concrete is built: the block and a separate anchor; the block thickened (up to the register's limit)
 * until its own weight holds the uplift; or one anchor alone, enlarged until the base friction on what
 * the uplift leaves of its weight holds the horizontal thrust too. Each way's concrete grows with the
 * thrust, and whether the thickened block is allowed does not depend on the pressure, so the least of
 * them grows with the pressure too (quantities never fall as the pressure rises: quantitiesGrow.test.ts).
 */
export function concreteRestraint(
  project: Project,
  node: string,
  legs: readonly Leg[],
  envelope: ThrustEnvelope,
  total: number,
  site: FittingSite,
  record: boolean,
  faces?: FaceTerms,
): ConcreteRestraint {
  const { design } = project;
  const { soil } = site;
  const out: ConcreteRestraint = {
    block: null,
    reverseBlock: null,
    anchor: null,
    trenchBottom: null,
    needsJoints: false,
    scheme: null,
    steps: [],
    diagnostics: [],
  };
  const h = envelope.horizontal;
  const up = envelope.upward.force;
  // A thrust within the straight-joint tolerance of vertical (a crest or sag straight in plan, but for
  // the millimetres its coordinates were rounded to) has no horizontal part to hold, as a joint
  // deflected less than that tolerance has no thrust to hold (fittingKind.ts).
  const sideways = h.force > total * Math.sin((STRAIGHT_TOLERANCE * Math.PI) / 180);
  const hasHorizontal = present(h.force, total) && sideways;
  const hasUp = present(up, total);
  const horizontalNeeded = Math.max(h.force, envelope.reverse?.force ?? 0);
  const atNode = (list: readonly Diagnostic[]) => list.map((d) => ({ ...d, subject: { ...d.subject, node } }));
  const anchorFor = (horizontal: number): AnchorResult =>
    sizeGravityAnchor({
      upward: up,
      horizontal,
      safetyFactor: design.upliftSafetyFactor,
      slidingSafetyFactor: design.bearingSafetyFactor,
      concreteUnitWeight: design.concreteUnitWeight,
      site,
      record,
    });

  const blocks = hasHorizontal ? sizeBlocks(project, node, legs, envelope, site, record, faces) : null;
  if (!hasUp) {
    if (blocks) useBlocks(out, blocks);
  } else if (!blocks) {
    const a = anchorFor(0);
    out.steps.push(...a.steps);
    out.diagnostics.push(...atNode(a.diagnostics));
    out.anchor = a.anchor;
    if (!a.anchor) out.needsJoints = true;
  } else {
    // Three ways to hold both thrusts; the least concrete that holds is built.
    type Way = { scheme: NonNullable<ConcreteRestraint['scheme']>; concrete: number; apply: () => void };
    const ways: Way[] = [];
    const alone = anchorFor(horizontalNeeded);
    if (alone.anchor) {
      const anchor = alone.anchor;
      ways.push({
        scheme: 'anchor alone',
        concrete: anchor.concreteVolume,
        apply: () => {
          out.anchor = anchor;
          out.steps.push(...alone.steps);
          out.diagnostics.push(...atNode(alone.diagnostics));
        },
      });
    }
    if (blocks.adequate) {
      const blockConcrete = blocks.block!.concreteVolume + (blocks.reverse?.concreteVolume ?? 0);
      const separate = anchorFor(0);
      if (separate.anchor) {
        const anchor = separate.anchor;
        ways.push({
          scheme: 'block and anchor',
          concrete: blockConcrete + anchor.concreteVolume,
          apply: () => {
            useBlocks(out, blocks);
            out.anchor = anchor;
            out.steps.push(...separate.steps);
            out.diagnostics.push(...atNode(separate.diagnostics));
          },
        });
      }
      const heavy = heavyBlock(blocks.block!, blocks.bearingArea, up, design, site, record);
      if (heavy) {
        ways.push({
          scheme: 'heavy block',
          concrete: heavy.block.concreteVolume + (blocks.reverse?.concreteVolume ?? 0),
          apply: () => {
            useBlocks(out, { ...blocks, block: heavy.block });
            out.steps.push(...heavy.steps);
          },
        });
      }
    }
    const best = ways.reduce<Way | null>((a, w) => (a === null || w.concrete < a.concrete ? w : a), null);
    if (best) {
      best.apply();
      out.scheme = best.scheme;
    } else {
      // Neither an anchor (no submerged weight) nor a block holds: say why, and size joints instead.
      out.diagnostics.push(...atNode(alone.diagnostics), ...blocks.diagnostics);
      out.needsJoints = true;
    }
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

interface SizedBlocks {
  /** a block and, where the thrust reverses, its opposite both hold */
  adequate: boolean;
  block: BearingBlock | null;
  reverse: BearingBlock | null;
  /** m², the unrounded bearing area of the main block */
  bearingArea: number;
  steps: CalcStep[];
  diagnostics: Diagnostic[];
  /** joints must be sized instead (no bearing, or no block within the limits holds) */
  needsJoints: boolean;
}

function useBlocks(out: ConcreteRestraint, b: SizedBlocks): void {
  out.block = b.block;
  out.reverseBlock = b.reverse;
  out.steps.push(...b.steps);
  out.diagnostics.push(...b.diagnostics);
  out.needsJoints ||= b.needsJoints;
}

/** The bearing block for the horizontal thrust and, where it reverses, the opposite block. */
function sizeBlocks(
  project: Project,
  node: string,
  legs: readonly Leg[],
  envelope: ThrustEnvelope,
  site: FittingSite,
  record: boolean,
  faces: FaceTerms | undefined,
): SizedBlocks {
  const { design } = project;
  const { soil } = site;
  const out: SizedBlocks = {
    adequate: false,
    block: null,
    reverse: null,
    bearingArea: 0,
    steps: [],
    diagnostics: [],
    needsJoints: false,
  };
  const allowable = bearingAtDepth(soil, site.cover, site.od);
  if (allowable <= 0) {
    out.needsJoints = true;
    out.diagnostics.push(diagnostic('soil.no-bearing', { node, soil: soil.id }));
    return out;
  }
  const block = (force: number, direction: Vec3) => {
    const { across, pipeArea } = faceCrossing(direction, legs);
    // One shape of input for every block (no conditional spread): sized at every fitting on every edit.
    const r = sizeBearingBlock({
      trenchWidth: across ? site.trenchWidth : undefined,
      thrust: force,
      direction,
      pipeThroughFace: pipeArea,
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
      // both blocks of a fitting stand at its depths in its soil: one table serves them
      faces,
    });
    for (const step of r.steps) out.steps.push(step);
    for (const d of r.diagnostics) out.diagnostics.push({ ...d, subject: { ...d.subject, node } });
    if (r.block && across && r.block.faceWidth > site.trenchWidth + 1e-9) {
      out.diagnostics.push(
        diagnostic(
          'block.wider-than-trench',
          { node },
          { faceWidth: r.block.faceWidth, trenchWidth: site.trenchWidth },
        ),
      );
    }
    return r;
  };
  const main = block(envelope.horizontal.force, envelope.horizontal.direction);
  out.block = main.block;
  out.bearingArea = main.bearingArea;
  let adequate = main.block !== null;
  if (envelope.reverse) {
    const first = out.steps.length;
    const reverse = block(envelope.reverse.force, envelope.reverse.direction);
    // Its steps say whose they are: the record would otherwise read as the first block's again.
    for (let k = first; k < out.steps.length; k++)
      out.steps[k] = { ...out.steps[k]!, title: `Opposite block, for the reversed thrust: ${out.steps[k]!.title}` };
    out.reverse = reverse.block;
    adequate &&= reverse.block !== null;
    out.diagnostics.push(diagnostic('block.thrust-reverses', { node }, { force: envelope.reverse.force }));
  }
  if (soil.minCover !== undefined && site.cover < soil.minCover) {
    out.diagnostics.push(
      diagnostic('soil.below-min-cover', { node, soil: soil.id }, { minCover: soil.minCover, cover: site.cover }),
    );
  }
  out.adequate = adequate;
  if (!adequate) {
    // No block within the limits holds: none is issued; restrained joints are sized as the alternative.
    out.block = null;
    out.reverse = null;
    out.needsJoints = true;
  }
  return out;
}

/**
 * The bearing block thickened until its own weight holds the uplift: allowed while the thickness this
 * needs on the bare bearing area stays within the register's limit. That test compares the uplift with
 * the horizontal thrust (both scale with the pressure), so it gives the same answer at every pressure.
 */
function heavyBlock(
  block: BearingBlock,
  bearingArea: number,
  upward: number,
  design: Project['design'],
  site: FittingSite,
  record: boolean,
): { block: BearingBlock; steps: CalcStep[] } | null {
  const submerged = site.groundwater !== null && site.groundwater > site.invert - block.faceHeight;
  const unitWeight = concreteWeight(design.concreteUnitWeight, site, submerged);
  if (!(unitWeight > 0)) return null;
  const volume = (design.upliftSafetyFactor * upward) / unitWeight;
  const thickest = VALUES['block.thickest'] * design.blockDepth;
  if (volume > bearingArea * thickest) return null;
  const face = block.faceWidth * block.faceHeight;
  const depth = Math.max(block.depth, roundUpTo(volume / face, site.step));
  const concreteVolume = face * depth;
  const heavy: BearingBlock = { ...block, depth, concreteVolume, upwardThrust: upward };
  const steps: CalcStep[] = !record
    ? []
    : [
        {
          title: 'Upward thrust held by the bearing block’s weight',
          formula: 'γ·b·h·t ≥ SF · T_up;  t = max(t₀, SF·T_up/(γ·b·h)) rounded up to the step',
          inputs: [
            value('T_up', 'largest upward thrust', upward, 'force', 'momentum balance'),
            value('SF', 'uplift safety factor', design.upliftSafetyFactor, 'ratio', 'project design'),
            value(
              'γ',
              submerged ? 'submerged unit weight of concrete' : 'unit weight of concrete',
              unitWeight,
              'unitWeight',
              'project design',
            ),
            value('t₀', 'design block thickness', design.blockDepth, 'length', 'project design'),
          ],
          result: value('t', 'block thickness', depth, 'length', 'no separate anchor needed'),
          reference: 'Weight ≥ SF × upward thrust (statics); thickness at most the register’s limit',
        },
        {
          title: 'Concrete volume at that thickness',
          formula: 'V = b · h · t',
          inputs: [],
          result: value('V', 'concrete volume', concreteVolume, 'volume', 'computed'),
          reference: 'Prism of the face area and the block thickness; the fitting’s own volume is not deducted',
        },
      ];
  return { block: heavy, steps };
}
