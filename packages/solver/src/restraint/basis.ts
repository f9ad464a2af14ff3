import type { Leg } from '../network/legs.js';
import type { Soil } from '../model/projectSchema.js';
import type { ProvenanceId } from '../provenance/register.js';
import type { Restraint } from './sizeRestraint.js';

/**
 * One list per distinct basis, shared by every fitting with that basis: a route of thousands of
 * fittings has a handful of bases, and a list kept per fitting was about 5 % of what an analysis keeps
 * alive (which the garbage collector pays for at every collection while the analysis is built).
 */
const shared = new Map<string, ProvenanceId[]>();

/**
 * The register entries a sized restraint relies on, from what it holds (a block, an anchor, joints).
 * The list is shared between restraints with the same entries: callers must not change it.
 */
export function restraintBasis(r: Omit<Restraint, 'basis'>, legs: readonly Leg[], soil: Soil): ProvenanceId[] {
  const ids = basisOf(r, legs, soil);
  const key = ids.join(' ');
  const found = shared.get(key);
  if (found) return found;
  shared.set(key, ids);
  return ids;
}

function basisOf(r: Omit<Restraint, 'basis'>, legs: readonly Leg[], soil: Soil): ProvenanceId[] {
  const ids: ProvenanceId[] = [];
  if (r.block || r.reverseBlock || r.anchor || r.trenchBottom) ids.push('design.dimension-step');
  if (r.block || r.reverseBlock)
    ids.push('block.bearing-area', 'block.face-rule', 'block.face-limits', 'passive.rankine', 'passive.ovesen');
  if (r.anchor) ids.push('anchor.weight-rule', 'anchor.base-friction');
  if (r.block?.upwardThrust) ids.push('anchor.weight-rule', 'block.thickest');
  if (r.trenchBottom) ids.push('pad.bearing-area');
  if (r.restrainedLegs.length) {
    const restrained = legs.filter((l) => r.restrainedLegs.some((x) => x.pipe === l.pipe.id));
    const forms = new Set(r.restrainedLegs.map((l) => l.form));
    if (forms.has('bend')) ids.push('joints.bend-equation', 'joints.trench-coefficient', 'joints.bearing-pressure');
    if (forms.has('uplift')) ids.push('joints.uplift-equation');
    if (forms.has('axial')) ids.push('joints.axial-equation');
    const ironDefaults = restrained.some((l) => l.pipe.material === 'ductile-iron');
    if (ironDefaults && soil.pipeFrictionRatio === undefined) ids.push('joints.friction-ratio');
    if (ironDefaults && soil.pipeAdhesionRatio === undefined && soil.cohesion > 0) ids.push('joints.adhesion-ratio');
    if (restrained.some((l) => l.pipe.material !== 'ductile-iron')) ids.push('joints.material-basis');
    if (restrained.some((l) => l.pipe.encasement === 'polyethylene')) ids.push('joints.encasement-factor');
    if (restrained.some((l) => l.pipe.trenchType === undefined)) ids.push('joints.default-trench-type');
    if (restrained.some((l) => l.pipe.weightPerLength === undefined)) ids.push('material.density');
  }
  return ids;
}
