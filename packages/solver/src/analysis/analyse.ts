import { norm } from '../geometry/vector.js';
import type { Project, ProjectNode } from '../model/projectSchema.js';
import { legsByNode, type Leg } from '../network/legs.js';
import { fittingGeometry, needsRestraint, type FittingGeometry } from '../network/fittingKind.js';
import { fittingTag } from '../network/fittingTag.js';
import { chainage } from '../network/chainage.js';
import {
  fittingThrust,
  thrustEnvelope,
  worstPerCase,
  type CaseThrust,
  type ThrustEnvelope,
} from '../thrust/fittingThrust.js';
import { VACUUM_GAUGE_PRESSURE } from '../pressure/nodePressure.js';
import { caseLabel } from '../model/caseLabel.js';
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
  /** one state per case, the worst of a valve's open and closed states */
  cases: CaseThrust[];
  /** every load state (a valve has three per case) */
  states: CaseThrust[];
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
    const label = caseLabel(project, c.caseId);
    out.push(
      c.pressure <= VACUUM_GAUGE_PRESSURE + 1e-6
        ? `The hydraulic grade of case "${label}" lies far below this node: the water column would separate (pressure held at the vapour pressure, ${formatSi(c.pressure, 'pressure', project.units)}); check the profile and the case.`
        : `Pressure at this node is below zero (${formatSi(c.pressure, 'pressure', project.units)}) in case "${label}": the node stands above that case's hydraulic grade; check for vacuum and air entry.`,
    );
  }
  return out;
}

/**
 * Water in equals water out at a joint (continuity): a node whose pipes' flows do not balance, or a
 * cap with flow into it, has a flow typed wrong somewhere. Tie-ins and free ends pass water on.
 */
function flowImbalance(legs: readonly Leg[], geometry: FittingGeometry): ((p: Project) => string) | null {
  if (geometry.kind === 'tie-in' || legs.length === 0) return null;
  let net = 0;
  let largest = 0;
  for (const l of legs) {
    net += l.outflow;
    largest = Math.max(largest, Math.abs(l.outflow));
  }
  if (Math.abs(net) <= 1e-6 + 0.01 * largest) return null;
  return (p) =>
    geometry.kind === 'dead-end'
      ? `Flow of ${formatSi(Math.abs(net), 'flow', p.units)} runs into this cap: a closed end has no flow; check the pipe's flow or make the node a tie-in.`
      : `The flows at this node do not balance (${formatSi(Math.abs(net), 'flow', p.units)} more ${net > 0 ? 'leaves than arrives' : 'arrives than leaves'}); check the pipes' flows.`;
}

function analyseFitting(
  project: Project,
  node: ProjectNode,
  legs: Leg[],
  geometry: FittingGeometry,
  at: number,
): FittingAnalysis {
  const states = fittingThrust(node, geometry.kind, legs, project.loadCases, project.water.density);
  const cases = worstPerCase(states);
  const envelope = thrustEnvelope(states);
  const restraint = sizeRestraint(project, node, legs, geometry, envelope);
  const warnings = negativePressureWarnings(project, cases);
  for (const w of restraint.warnings) warnings.push(w);
  const unbalanced = flowImbalance(legs, geometry);
  if (unbalanced) warnings.push(unbalanced(project));
  if (node.valve && geometry.kind === 'valve') {
    warnings.push(
      'Valve: sized open, and closed with the pressure on either side; its restraint holds the thrust both ways along the line.',
    );
  } else if (node.valve) {
    warnings.push(
      'The valve flag applies only where two pipes meet; this node was sized as its fitting without a closed valve.',
    );
  }
  if (norm(envelope.governing.total) === 0) warnings.push('No thrust at this fitting in any case.');
  return {
    node,
    tag: fittingTag(geometry.kind, node.id),
    legs,
    geometry,
    chainage: at,
    cases,
    states,
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
    r = [...thrustSteps(project, f.node, f.legs, f.envelope.governing), ...restraint.steps];
    records.set(f, r);
  }
  return r;
}
