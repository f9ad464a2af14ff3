import { norm } from '../geometry/vector.js';
import { value, type SizingStep } from '../analysis/calcRecord.js';
import type { Leg } from '../network/legs.js';
import type { FittingGeometry } from '../network/fittingKind.js';
import type { Project, ProjectNode } from '../model/projectSchema.js';
import type { ThrustEnvelope } from '../thrust/fittingThrust.js';
import { diagnostic, sameDiagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';
import { lineAlong } from './routeReach.js';
import type { BearingBlock, FaceTerms } from './bearingBlock.js';
import type { GravityAnchor } from './gravityAnchor.js';
import type { TrenchBottomBearing } from './trenchBottom.js';
import { restrainedLength, type RestrainedLeg } from './restrainedLength.js';
import { zoneLength } from './zoneLength.js';
import { concreteRestraint } from './concreteRestraint.js';
import { fittingSite } from './site.js';
import { restraintBasis } from './basis.js';
import type { ProvenanceId } from '../provenance/register.js';

export { nodeSoil, TRENCH_CLEARANCE } from './site.js';

export interface Restraint {
  block: BearingBlock | null;
  /** a second block on the other side, where the thrust reverses between load states */
  reverseBlock: BearingBlock | null;
  anchor: GravityAnchor | null;
  trenchBottom: TrenchBottomBearing | null;
  /** m, the longest restrained length of any leg, or null */
  restrainedLength: number | null;
  restrainedLegs: RestrainedLeg[];
  /** the record of the restraint, in order (empty unless asked for) */
  steps: SizingStep[];
  diagnostics: Diagnostic[];
  /** the register entries the sizing relied on */
  basis: ProvenanceId[];
  /**
   * a restrained length ran past the fitting's own pipes, so the result depends on the line beyond
   * its neighbours (routeReach): an incremental analysis must size this fitting again after any edit
   */
  dependsOnRoute: boolean;
}

/**
 * Sizes the restraint of one fitting from its thrust envelope: concrete (block, anchor, trench-bottom
 * bearing) unless the node asks for restrained joints or the soil cannot bear; restrained joint lengths
 * then, for the governing thrust and, where it reverses, for the reverse thrust too (longest per pipe).
 * `faces`, kept by a caller that sizes the same fitting again for other thrusts, holds the block search's
 * terms that do not depend on the thrust (bearingBlock.ts).
 */
export function sizeRestraint(
  project: Project,
  node: ProjectNode,
  legs: readonly Leg[],
  geometry: FittingGeometry,
  envelope: ThrustEnvelope,
  record = false,
  faces?: FaceTerms,
): Restraint {
  const site = fittingSite(project, node, legs);
  const total = norm(envelope.governing.total);
  const out: Restraint = {
    block: null,
    reverseBlock: null,
    anchor: null,
    trenchBottom: null,
    restrainedLength: null,
    // the shared empty lists until something is added (most fittings add nothing)
    restrainedLegs: NO_LEGS,
    steps: NO_STEPS,
    diagnostics: NO_FINDINGS,
    basis: NO_BASIS,
    dependsOnRoute: false,
  };
  let needJoints = node.restraint === 'joints';
  if (node.restraint === 'block') {
    const c = concreteRestraint(project, node.id, legs, envelope, total, site, record, faces);
    out.block = c.block;
    out.reverseBlock = c.reverseBlock;
    out.anchor = c.anchor;
    out.trenchBottom = c.trenchBottom;
    out.steps = c.steps;
    out.diagnostics = c.diagnostics;
    needJoints = c.needsJoints;
  }
  if (needJoints && total > 0) {
    if (out.steps === NO_STEPS) out.steps = [];
    if (out.diagnostics === NO_FINDINGS) out.diagnostics = [];
    const thrusts = [envelope.governing.total, ...(envelope.reverse ? [envelope.reverse.state.total] : [])];
    const longest = new Map<string, RestrainedLeg>();
    for (const thrust of thrusts) {
      const r = restrainedLength({
        kind: geometry.kind,
        legs,
        thrust,
        deflection: geometry.deflection,
        soil: site.soil,
        cover: site.cover,
        safetyFactor: project.design.restraintSafetyFactor,
        node: node.id,
        site,
        record,
      });
      for (const leg of r.legs) if ((longest.get(leg.pipe)?.length ?? 0) < leg.length) longest.set(leg.pipe, leg);
      out.steps.push(...r.steps);
      for (const d of r.diagnostics) if (!out.diagnostics.some((o) => sameDiagnostic(o, d))) out.diagnostics.push(d);
    }
    // No zone can run along more pipe than the route has: cap it there and say so. Past a tie-in it
    // runs on into the existing main: say how far.
    for (const [pipe, sized] of longest) {
      const own = legs.find((l) => l.pipe.id === pipe)?.length ?? 0;
      if (sized.length <= own) continue;
      out.dependsOnRoute = true;
      const length = zoneLength(project, node.id, sized, site);
      const leg = length === sized.length ? sized : { ...sized, length };
      if (leg !== sized) {
        longest.set(pipe, leg);
        if (record)
          out.steps.push({
            title: `Restrained length along ${pipe}, past a change of pipe`,
            formula: 'Σ ℓᵢ·rᵢ = L₁·r₁: each pipe holds its own resistance per metre r (F_s, or F_s + ½R on a bend)',
            inputs: [
              value('L₁', 'restrained length at the first pipe’s resistance', sized.length, 'length', 'computed'),
            ],
            result: value('L', 'restrained length', length, 'length', 'computed'),
            basis: `joints.${sized.form}-equation`,
          });
      }
      const line = lineAlong(project, node.id, pipe);
      if (leg.length <= line.length) continue;
      const subject = { node: node.id, pipe };
      const reach = line.length;
      if (line.tieIn) {
        const beyond = leg.length - reach;
        out.diagnostics.push(diagnostic('joints.into-existing-main', subject, { length: leg.length, reach, beyond }));
      } else {
        out.diagnostics.push(diagnostic('joints.longer-than-route', subject, { length: leg.length, reach }));
        longest.set(pipe, { ...leg, length: reach });
      }
    }
    out.restrainedLegs = [...longest.values()];
    out.restrainedLength = out.restrainedLegs.length ? Math.max(...out.restrainedLegs.map((l) => l.length)) : null;
  }
  out.basis = restraintBasis(out, legs, site.soil);
  // Most fittings end with no steps, findings or restrained legs: one shared empty list each instead
  // of three kept per fitting (what an analysis keeps alive, every collection while it is built copies).
  if (!out.steps.length) out.steps = NO_STEPS;
  if (!out.diagnostics.length) out.diagnostics = NO_FINDINGS;
  if (!out.restrainedLegs.length) out.restrainedLegs = NO_LEGS;
  return out;
}

const NO_STEPS = Object.freeze([]) as unknown as SizingStep[];
const NO_FINDINGS = Object.freeze([]) as unknown as Diagnostic[];
const NO_LEGS = Object.freeze([]) as unknown as RestrainedLeg[];
const NO_BASIS = Object.freeze([]) as unknown as ProvenanceId[];
