import { norm } from '../geometry/vector.js';
import type { Project, ProjectNode } from '../model/projectSchema.js';
import { legsByNode, type Leg } from '../network/legs.js';
import { fittingGeometry, needsRestraint, type FittingGeometry } from '../network/fittingKind.js';
import { fittingTag } from '../network/fittingTag.js';
import { chainage } from '../network/chainage.js';
import { fittingThrust, thrustEnvelope, type CaseThrust, type ThrustEnvelope } from '../thrust/fittingThrust.js';
import { waterWeightInFitting } from '../thrust/waterWeight.js';
import { sizeRestraint, type Restraint } from '../restraint/sizeRestraint.js';
import { thrustSteps } from './thrustSteps.js';
import { formatSi } from '../units/format.js';
import type { CalcStep } from './calcRecord.js';

/** Everything computed for one fitting; the schedule, the plan and the record all read this. */
export interface FittingAnalysis {
  node: ProjectNode;
  tag: string;
  legs: Leg[];
  geometry: FittingGeometry;
  /** m along the route from its start */
  chainage: number;
  cases: CaseThrust[];
  envelope: ThrustEnvelope;
  /** N, weight of the water in the fitting body (acts in −z; not part of the thrust) */
  waterWeight: number;
  restraint: Restraint;
  warnings: string[];
}

export interface Analysis {
  project: Project;
  /** one entry per node that needs restraint, in node order */
  fittings: FittingAnalysis[];
  byNode: Map<string, FittingAnalysis>;
  legs: Map<string, Leg[]>;
  chainage: Map<string, number>;
}

function negativePressureWarnings(project: Project, cases: readonly CaseThrust[]): string[] {
  const out: string[] = [];
  for (const c of cases) {
    if (c.pressure >= 0) continue;
    const label = project.loadCases.find((l) => l.id === c.caseId)?.label ?? c.caseId;
    out.push(`Pressure at this node is below zero (${formatSi(c.pressure, 'pressure', project.units)}) in case "${label}": the node stands above that case's hydraulic grade; check for vacuum and air entry.`);
  }
  return out;
}

function analyseFitting(project: Project, node: ProjectNode, legs: Leg[], geometry: FittingGeometry, at: number): FittingAnalysis {
  const cases = fittingThrust(node, geometry.kind, legs, project.loadCases, project.water.density);
  const envelope = thrustEnvelope(cases);
  const restraint = sizeRestraint(project, node, legs, geometry, envelope);
  const warnings = negativePressureWarnings(project, cases);
  for (const w of restraint.warnings) warnings.push(w);
  if (node.valve && geometry.kind === 'valve') {
    warnings.push('Closed valve: the thrust can act either way along the line, depending on which side holds pressure; restrain it for both.');
  } else if (node.valve) {
    warnings.push('The valve flag applies only where two pipes meet; this node was sized as its fitting without a closed valve.');
  }
  if (norm(envelope.governing.total) === 0) warnings.push('No thrust at this fitting in any case.');
  return {
    node,
    tag: fittingTag(geometry.kind, node.id),
    legs,
    geometry,
    chainage: at,
    cases,
    envelope,
    waterWeight: waterWeightInFitting(legs, project.water.density),
    restraint,
    warnings,
  };
}

/** The whole route's fittings, thrusts and restraints: a pure function of the project document. */
export function analyseProject(project: Project): Analysis {
  const legs = legsByNode(project);
  const chain = chainage(project, legs);
  const fittings: FittingAnalysis[] = [];
  for (const node of project.nodes) {
    const nodeLegs = legs.get(node.id) ?? [];
    const geometry = fittingGeometry(node, nodeLegs);
    if (!needsRestraint(geometry.kind)) continue;
    fittings.push(analyseFitting(project, node, nodeLegs, geometry, chain.get(node.id) ?? 0));
  }
  return { project, fittings, byNode: new Map(fittings.map((f) => [f.node.id, f])), legs, chainage: chain };
}

const cache = new WeakMap<Project, Analysis>();

/** `analyseProject`, memoised by document identity: an unchanged document is never recomputed. */
export function analyse(project: Project): Analysis {
  let result = cache.get(project);
  if (!result) {
    result = analyseProject(project);
    cache.set(project, result);
  }
  return result;
}

const records = new WeakMap<FittingAnalysis, CalcStep[]>();

/**
 * A fitting's calculation record — thrust, then restraint — built when first read by sizing the
 * fitting again with its record (the schedule never pays for it).
 */
export function calculationRecord(project: Project, f: FittingAnalysis): CalcStep[] {
  let r = records.get(f);
  if (!r) {
    const restraint = sizeRestraint(project, f.node, f.legs, f.geometry, f.envelope, true);
    r = [...thrustSteps(project, f.node, f.legs, f.envelope.governing, f.geometry), ...restraint.steps];
    records.set(f, r);
  }
  return r;
}
