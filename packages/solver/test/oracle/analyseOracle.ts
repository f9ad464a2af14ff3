import { norm } from '../../src/geometry/vector.js';
import type { Project, ProjectNode } from '../../src/model/projectSchema.js';
import { legsByNode, type Leg } from '../../src/network/legs.js';
import { fittingGeometry, needsRestraint, type FittingGeometry } from '../../src/network/fittingKind.js';
import { fittingMarks, runLayout, type Run } from './runsOracle.js';
import {
  fittingThrust,
  thrustEnvelope,
  worstPerCase,
  type CaseThrust,
  type ThrustEnvelope,
} from '../../src/thrust/fittingThrust.js';
import { VACUUM_GAUGE_PRESSURE } from '../../src/pressure/nodePressure.js';
import { waterWeightInFitting } from '../../src/thrust/waterWeight.js';
import { sizeRestraint, type Restraint } from '../../src/restraint/sizeRestraint.js';
import { diagnostic, uniqueDiagnostics, type Diagnostic } from '../../src/diagnostics/diagnostic.js';
import type { ProvenanceId } from '../../src/provenance/register.js';
import { implausibleInputs } from '../../src/model/plausibility.js';
import { pipeRatingChecks } from '../../src/pressure/pipeRating.js';

/** Everything computed for one fitting; the schedule, the plan and the record all read this. */
export interface FittingAnalysis {
  node: ProjectNode;
  /** run letter and number in chainage order along the run: A1, A2 … B1 */
  mark: string;
  /** letter of the run the fitting stands on */
  run: string;
  legs: Leg[];
  geometry: FittingGeometry;
  /** m along its run from the run's start */
  chainage: number;
  /** one state per case, the worst of a valve's open and closed states */
  cases: CaseThrust[];
  /** every load state (a valve has three per case) */
  states: CaseThrust[];
  envelope: ThrustEnvelope;
  /** N, weight of the water in the fitting body (acts in −z; not part of the thrust) */
  waterWeight: number;
  restraint: Restraint;
  /** findings about this fitting, most severe first */
  diagnostics: Diagnostic[];
  /** register entries the results rely on (thrust and restraint) */
  basis: ProvenanceId[];
}

export interface Analysis {
  project: Project;
  /** one entry per node that needs restraint, by run (main first) and chainage */
  fittings: FittingAnalysis[];
  byNode: Map<string, FittingAnalysis>;
  legs: Map<string, Leg[]>;
  runs: Run[];
  /** run letter of every node on a pipe */
  runOf: Map<string, string>;
  /** m along its run of every node on a pipe */
  chainage: Map<string, number>;
  /** marks of every fitting, tie-ins included */
  marks: Map<string, string>;
  /** findings about the inputs of the whole project (values outside their usual range), most severe first */
  diagnostics: Diagnostic[];
}

function negativePressure(node: string, cases: readonly CaseThrust[]): Diagnostic[] {
  const out: Diagnostic[] = [];
  for (const c of cases) {
    if (c.pressure >= 0) continue;
    const code = c.pressure <= VACUUM_GAUGE_PRESSURE + 1e-6 ? 'pressure.vapour-floor' : 'pressure.below-zero';
    out.push(diagnostic(code, { node, case: c.caseId }, { pressure: c.pressure }));
  }
  return out;
}

/**
 * Water in equals water out at a joint (continuity): a node whose pipes' flows do not balance, or a
 * cap with flow into it, has a flow typed wrong somewhere. Tie-ins and free ends pass water on.
 */
function flowImbalance(node: string, legs: readonly Leg[], geometry: FittingGeometry): Diagnostic | null {
  if (geometry.kind === 'tie-in' || legs.length === 0) return null;
  let net = 0;
  let largest = 0;
  for (const l of legs) {
    net += l.outflow;
    largest = Math.max(largest, Math.abs(l.outflow));
  }
  if (Math.abs(net) <= 1e-6 + 0.01 * largest) return null;
  return geometry.kind === 'dead-end'
    ? diagnostic('flow.into-cap', { node }, { flow: Math.abs(net) })
    : diagnostic('flow.unbalanced', { node }, { net });
}

function analyseFitting(
  project: Project,
  node: ProjectNode,
  legs: Leg[],
  geometry: FittingGeometry,
  place: { mark: string; run: string; chainage: number },
  inputs: readonly Diagnostic[],
): FittingAnalysis {
  const states = fittingThrust(node, geometry.kind, legs, project.loadCases, project.water.density);
  const cases = worstPerCase(states);
  const envelope = thrustEnvelope(states);
  const restraint = sizeRestraint(project, node, legs, geometry, envelope);
  const found = [...inputs, ...negativePressure(node.id, cases), ...restraint.diagnostics];
  const unbalanced = flowImbalance(node.id, legs, geometry);
  if (unbalanced) found.push(unbalanced);
  if (node.valve && geometry.kind === 'valve') found.push(diagnostic('valve.both-ways', { node: node.id }));
  else if (node.valve) found.push(diagnostic('valve.flag-ignored', { node: node.id }));
  // the finding added after this oracle was written, so that it still answers for everything else
  if (legs.length > 4) found.push(diagnostic('fitting.many-pipes', { node: node.id }));
  // a run through a three-pipe junction bent from straight: the largest angle between two of its legs
  if (legs.length === 3) {
    const pairs: [number, number][] = [
      [0, 1],
      [0, 2],
      [1, 2],
    ];
    const angles = pairs.map(([i, j]) => {
      const [p, q] = [legs[i]!.direction, legs[j]!.direction];
      const cos = (p[0] * q[0] + p[1] * q[1] + p[2] * q[2]) / (Math.hypot(...p) * Math.hypot(...q));
      return (Math.acos(Math.max(-1, Math.min(1, cos))) * 180) / Math.PI;
    });
    const turn = 180 - Math.max(...angles);
    if (turn > 5) found.push(diagnostic('fitting.bent-run', { node: node.id }, { turn }));
  }
  // a bend no standard fitting makes (¹⁄₃₂ to ¼ bends, from memory): more than 0.5° from every standard angle
  if ((geometry.kind === 'bend' || geometry.kind === 'reducing-bend') && geometry.deflection !== null) {
    const angle = geometry.deflection;
    const off = [0, 11.25, 22.5, 45, 90].map((b) => Math.abs(b - angle));
    const nearest = [0, 11.25, 22.5, 45, 90][off.indexOf(Math.min(...off))]!;
    if (Math.min(...off) > 0.5)
      found.push(diagnostic('fitting.odd-bend', { node: node.id }, nearest === 0 ? { angle } : { angle, nearest }));
  }
  if (norm(envelope.governing.total) === 0) found.push(diagnostic('thrust.none', { node: node.id }));
  return {
    node,
    ...place,
    legs,
    geometry,
    cases,
    states,
    envelope,
    waterWeight: waterWeightInFitting(legs, project.water.density),
    restraint,
    diagnostics: uniqueDiagnostics(found),
    basis: restraint.basis,
  };
}

/** The whole route's fittings, thrusts and restraints: a pure function of the project document. */
export function analyseProject(project: Project): Analysis {
  const legs = legsByNode(project);
  const layout = runLayout(project, legs);
  const geometry = new Map<string, FittingGeometry>();
  for (const node of project.nodes) geometry.set(node.id, fittingGeometry(node, legs.get(node.id) ?? []));
  const marks = fittingMarks(layout, (id) => {
    const kind = geometry.get(id)!.kind;
    return kind !== 'straight' && kind !== 'none';
  });
  const inputs = implausibleInputs(project);
  const atNode = (id: string) => inputs.filter((d) => d.subject.node === id);
  const fittings: FittingAnalysis[] = [];
  const nodeById = new Map(project.nodes.map((n) => [n.id, n]));
  const done = new Set<string>();
  for (const run of layout.runs) {
    for (const { id } of run.nodes) {
      const g = geometry.get(id)!;
      if (layout.runOf.get(id) !== run.letter || !needsRestraint(g.kind) || done.has(id)) continue;
      done.add(id);
      const place = { mark: marks.get(id)!, run: run.letter, chainage: layout.chainage.get(id)! };
      fittings.push(analyseFitting(project, nodeById.get(id)!, legs.get(id) ?? [], g, place, atNode(id)));
    }
  }
  return {
    project,
    fittings,
    byNode: new Map(fittings.map((f) => [f.node.id, f])),
    legs,
    runs: layout.runs,
    runOf: layout.runOf,
    chainage: layout.chainage,
    marks,
    diagnostics: uniqueDiagnostics([...inputs, ...pipeRatingChecks(project)]),
  };
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
