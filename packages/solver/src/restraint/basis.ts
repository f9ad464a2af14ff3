import type { Leg } from '../network/legs.js';
import type { Soil } from '../model/projectSchema.js';
import type { ProvenanceId } from '../provenance/register.js';
import type { Restraint } from './sizeRestraint.js';

/**
 * What a basis is made from, one bit per test, in the order the entries are listed: the list is a
 * function of these bits alone, so fittings with the same bits share one list (a route of thousands of
 * fittings has a handful of bases; a list kept per fitting was about 5 % of what an analysis keeps
 * alive, which the garbage collector pays for at every collection while the analysis is built).
 */
const SIZED = 1 << 0;
const BLOCK = 1 << 1;
const ANCHOR = 1 << 2;
const HEAVY = 1 << 3;
const PAD = 1 << 4;
const BEND = 1 << 5;
const UPLIFT = 1 << 6;
const AXIAL = 1 << 7;
const FRICTION = 1 << 8;
const ADHESION = 1 << 9;
const MATERIAL = 1 << 10;
const ENCASEMENT = 1 << 11;
const TRENCH = 1 << 12;
const DENSITY = 1 << 13;

const shared = new Map<number, ProvenanceId[]>();

/**
 * The register entries a sized restraint relies on, from what it holds (a block, an anchor, joints).
 * The list is shared between restraints with the same entries: callers must not change it.
 */
export function restraintBasis(r: Omit<Restraint, 'basis'>, legs: readonly Leg[], soil: Soil): ProvenanceId[] {
  let bits = 0;
  if (r.block || r.reverseBlock || r.anchor || r.trenchBottom) bits |= SIZED;
  if (r.block || r.reverseBlock) bits |= BLOCK;
  if (r.anchor) bits |= ANCHOR;
  if (r.block?.upwardThrust) bits |= HEAVY;
  if (r.trenchBottom) bits |= PAD;
  if (r.restrainedLegs.length) {
    const restrained = legs.filter((l) => r.restrainedLegs.some((x) => x.pipe === l.pipe.id));
    const forms = new Set(r.restrainedLegs.map((l) => l.form));
    if (forms.has('bend')) bits |= BEND;
    if (forms.has('uplift')) bits |= UPLIFT;
    if (forms.has('axial')) bits |= AXIAL;
    const ironDefaults = restrained.some((l) => l.pipe.material === 'ductile-iron');
    if (ironDefaults && soil.pipeFrictionRatio === undefined) bits |= FRICTION;
    if (ironDefaults && soil.pipeAdhesionRatio === undefined && soil.cohesion > 0) bits |= ADHESION;
    if (restrained.some((l) => l.pipe.material !== 'ductile-iron')) bits |= MATERIAL;
    if (restrained.some((l) => l.pipe.encasement === 'polyethylene')) bits |= ENCASEMENT;
    if (restrained.some((l) => l.pipe.trenchType === undefined)) bits |= TRENCH;
    if (restrained.some((l) => l.pipe.weightPerLength === undefined)) bits |= DENSITY;
  }
  let ids = shared.get(bits);
  if (!ids) shared.set(bits, (ids = basisOf(bits)));
  return ids;
}

function basisOf(bits: number): ProvenanceId[] {
  const ids: ProvenanceId[] = [];
  if (bits & SIZED) ids.push('design.dimension-step');
  if (bits & BLOCK)
    ids.push('block.bearing-area', 'block.face-rule', 'block.face-limits', 'passive.rankine', 'passive.ovesen');
  if (bits & ANCHOR) ids.push('anchor.weight-rule', 'anchor.base-friction');
  if (bits & HEAVY) ids.push('anchor.weight-rule', 'block.thickest');
  if (bits & PAD) ids.push('pad.bearing-area', 'pad.thickness');
  if (bits & BEND) ids.push('joints.bend-equation', 'joints.trench-coefficient', 'joints.bearing-pressure');
  if (bits & UPLIFT) ids.push('joints.uplift-equation');
  if (bits & AXIAL) ids.push('joints.axial-equation');
  if (bits & FRICTION) ids.push('joints.friction-ratio');
  if (bits & ADHESION) ids.push('joints.adhesion-ratio');
  if (bits & MATERIAL) ids.push('joints.material-basis');
  if (bits & ENCASEMENT) ids.push('joints.encasement-factor');
  if (bits & TRENCH) ids.push('joints.default-trench-type');
  if (bits & DENSITY) ids.push('material.density');
  return ids;
}
