import type { Vec3 } from '../geometry/vector.js';
import type { Project, ProjectNode } from '../model/projectSchema.js';
import type { Leg } from '../network/legs.js';
import { fittingGeometry, needsRestraint, type FittingGeometry, type FittingKind } from '../network/fittingKind.js';
import type { Run } from '../network/runs.js';
import { routeGraph, type RouteGraph } from '../network/routeGraph.js';
import { runMarks, runTable, type RunTable } from '../network/runTable.js';
import type { CaseThrust, ThrustEnvelope } from '../thrust/fittingThrust.js';
import { waterWeightInFitting } from '../thrust/waterWeight.js';
import { sizeRestraint, type Restraint } from '../restraint/sizeRestraint.js';
import { sameDiagnostic, uniqueDiagnostics, type Diagnostic } from '../diagnostics/diagnostic.js';
import type { ProvenanceId } from '../provenance/register.js';
import { implausibleInputs, type PlausibilityKept } from '../model/plausibility.js';
import { faceTerms, type FaceTerms } from '../restraint/bearingBlock.js';
import { pipeRatingChecks } from '../pressure/pipeRating.js';
import {
  casePressures,
  copySums,
  fillStates,
  readEnvelope,
  thrustSums,
  writeSums,
  type ThrustSums,
} from './thrustSums.js';
import { SolvedFitting } from './solvedFitting.js';
import { fittingDiagnostics } from './fittingDiagnostics.js';
import { routeChange } from './routeChange.js';
import { RouteAnalysis, type RouteTables } from './routeViews.js';
import { keepAnalysis, recentAnalysis } from './recentAnalyses.js';

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
  /**
   * findings about the project as a whole: inputs outside their usual range, and pipes loaded past
   * their pressure rating; most severe first
   */
  diagnostics: Diagnostic[];
}

const kept = new WeakMap<Analysis, RouteTables>();

/** Thrust, envelope, restraint and findings of fitting `f` from its sums in `sums`. */
function solveFitting(
  project: Project,
  node: ProjectNode,
  legs: Leg[],
  geometry: FittingGeometry,
  mark: string,
  run: string,
  chainage: number,
  inputs: readonly Diagnostic[],
  sums: ThrustSums,
  f: number,
  before: FittingAnalysis | undefined,
  faces?: FaceTerms,
): FittingAnalysis {
  const source = { sums, index: f, loadCases: project.loadCases, density: project.water.density };
  const b = fillStates(sums, f, source.loadCases, source.density);
  const known = readEnvelope(b, source.loadCases, legs);
  const envelope = known.envelope;
  // The restraint reads the project's design and soils, the node, its legs and the envelope only.
  const restraint =
    before && sameEnvelope(before.envelope, envelope)
      ? before.restraint
      : sizeRestraint(project, node, legs, geometry, envelope, false, faces);
  // the findings read each case's pressure from the buffer, before the next fitting fills it
  const diagnostics = fittingDiagnostics(
    node,
    legs,
    geometry,
    casePressures(b, source.loadCases),
    envelope,
    restraint,
    inputs,
  );
  return new SolvedFitting(
    node,
    mark,
    run,
    chainage,
    legs,
    geometry,
    source,
    known,
    before ? before.waterWeight : waterWeightInFitting(legs, project.water.density),
    restraint,
    diagnostics,
  );
}

const sameVec = (a: Vec3, b: Vec3) => a[0] === b[0] && a[1] === b[1] && a[2] === b[2];
const sameState = (a: CaseThrust, b: CaseThrust) =>
  a.caseId === b.caseId &&
  a.pressure === b.pressure &&
  a.closedAgainst === b.closedAgainst &&
  sameVec(a.total, b.total);

/** Two envelopes with the same numbers: the restraint sized for one holds for the other. */
function sameEnvelope(a: ThrustEnvelope, b: ThrustEnvelope): boolean {
  return (
    sameState(a.governing, b.governing) &&
    a.horizontal.force === b.horizontal.force &&
    a.horizontal.caseId === b.horizontal.caseId &&
    sameVec(a.horizontal.direction, b.horizontal.direction) &&
    a.upward.force === b.upward.force &&
    a.upward.caseId === b.upward.caseId &&
    a.downward.force === b.downward.force &&
    a.downward.caseId === b.downward.caseId &&
    a.pressure === b.pressure &&
    (a.reverse === null
      ? b.reverse === null
      : b.reverse !== null &&
        a.reverse.force === b.reverse.force &&
        a.reverse.caseId === b.reverse.caseId &&
        sameVec(a.reverse.direction, b.reverse.direction) &&
        sameState(a.reverse.state, b.reverse.state))
  );
}

function byNode(list: readonly Diagnostic[]): Map<string, Diagnostic[]> {
  const out = new Map<string, Diagnostic[]>();
  for (const d of list) {
    const id = d.subject.node;
    if (id === undefined) continue;
    const at = out.get(id);
    if (at) at.push(d);
    else out.set(id, [d]);
  }
  return out;
}

const NONE: readonly Diagnostic[] = [];

function sameList(a: readonly Diagnostic[], b: readonly Diagnostic[]): boolean {
  return a.length === b.length && a.every((d, i) => sameDiagnostic(d, b[i]!));
}

type Reuse = { analysis: Analysis; kept: RouteTables; reuse: (id: string) => 'all' | 'sums' | 'none' } | null;

/** An analysis being put together: what every fitting reads, and the fittings solved so far. */
interface Assembly {
  project: Project;
  route: RouteTables;
  prev: Reuse;
  inputs: Diagnostic[];
  atNode: Map<string, Diagnostic[]>;
  /** node indices of the fittings, by run and chainage */
  order: number[];
  fittings: FittingAnalysis[];
}

const isFitting = (kind: FittingKind) => kind !== 'straight' && kind !== 'none';

function startAssembly(
  project: Project,
  graph: RouteGraph,
  geometry: FittingGeometry[],
  runs: RunTable,
  prev: Reuse,
): Assembly {
  const { marks, order: markOrder } = runMarks(runs, (i) => isFitting(geometry[i]!.kind));
  const plausible: PlausibilityKept = {};
  const inputs = implausibleInputs(project, graph.index, plausible);
  const order: number[] = [];
  const fittingAt = new Int32Array(graph.nodes.length).fill(-1);
  for (let r = 0; r < runs.letters.length; r++) {
    for (let s = runs.runFirst[r]!; s < runs.runFirst[r + 1]!; s++) {
      const i = runs.seqNode[s]!;
      if (runs.owner[i] !== r || !needsRestraint(geometry[i]!.kind) || fittingAt[i]! >= 0) continue;
      fittingAt[i] = order.length;
      order.push(i);
    }
  }
  return {
    project,
    route: {
      graph,
      runs,
      marks,
      markOrder,
      geometry,
      fittingAt,
      sums: thrustSums(order.length),
      plausible,
      views: {},
    },
    prev,
    inputs,
    atNode: byNode(inputs),
    order,
    fittings: new Array<FittingAnalysis>(order.length),
  };
}

/** Solves fitting `f` of the assembly, reusing what the analysis before computed where it may. */
function solveAt(s: Assembly, f: number): void {
  const { project, prev, fittings, route } = s;
  const { graph, runs, sums } = route;
  const i = s.order[f]!;
  const node = graph.nodes[i]!;
  const id = node.id;
  const g = route.geometry[i]!;
  const l = graph.legs[i]!;
  const mark = route.marks[i]!;
  const run = runs.letters[runs.owner[i]!]!;
  const chainage = runs.chainage[i]!;
  const here = s.atNode.get(id) ?? NONE;
  const reuse = prev ? prev.reuse(id) : 'none';
  let old: FittingAnalysis | undefined;
  let oldIndex = -1;
  if (reuse !== 'none') {
    const k = prev!.kept;
    const at = k.graph.index.get(id);
    oldIndex = at === undefined ? -1 : k.fittingAt[at]!;
    if (oldIndex >= 0) old = prev!.analysis.fittings[oldIndex];
  }
  if (old) copySums(prev!.kept.sums, oldIndex, sums, f);
  else writeSums(sums, f, l, node.elevation, node.valve && g.kind === 'valve');
  // A restrained length capped by the line beyond the neighbours is sized again after any edit.
  if (reuse === 'all' && old && !old.restraint.dependsOnRoute) {
    const moved = old.mark !== mark || old.run !== run || old.chainage !== chainage;
    const reworded = !sameList(
      old.diagnostics.filter((d) => d.subject.node === id && d.subject.field),
      here,
    );
    if (!moved && !reworded) fittings[f] = old;
    else {
      const diagnostics = reworded
        ? fittingDiagnostics(node, l, g, old.cases, old.envelope, old.restraint, here)
        : old.diagnostics;
      fittings[f] =
        old instanceof SolvedFitting
          ? old.placed(mark, run, chainage, diagnostics)
          : { ...old, mark, run, chainage, diagnostics };
    }
  } else {
    fittings[f] = solveFitting(
      project,
      node,
      l,
      g,
      mark,
      run,
      chainage,
      here,
      sums,
      f,
      reuse === 'sums' ? old : undefined,
    );
  }
}

function finishAssembly(s: Assembly): Analysis {
  const { project, fittings } = s;
  const diagnostics = uniqueDiagnostics([...s.inputs, ...pipeRatingChecks(project)]);
  const analysis = new RouteAnalysis(project, fittings, diagnostics, s.route);
  kept.set(analysis, s.route);
  return analysis;
}

/**
 * The analysis of `project` from its graph and geometry, reusing what `prev` computed where `reuse`
 * says a fitting did not change (`'all'`: its thrust and restraint; `'sums'`: its sums only).
 */
function assemble(project: Project, graph: RouteGraph, geometry: FittingGeometry[], prev: Reuse): Analysis {
  const s = startAssembly(project, graph, geometry, runTable(project, graph), prev);
  for (let f = 0; f < s.order.length; f++) solveAt(s, f);
  return finishAssembly(s);
}

/**
 * A load-case edit: the same fittings in the same order with the same sums; each is rescaled, and its
 * restraint kept where its envelope did not change.
 */
function rescale(prev: Analysis, k: RouteTables, project: Project): Analysis {
  const inputs = implausibleInputs(project, k.graph.index, k.plausible);
  const atNode = byNode(inputs);
  const n = prev.fittings.length;
  const fittings = new Array<FittingAnalysis>(n);
  // the block search's terms that do not depend on the thrust, per fitting, kept with the route
  const faces = (k.faces ??= new Array<FaceTerms>(n));
  for (let f = 0; f < n; f++) {
    const old = prev.fittings[f]!;
    const here = atNode.get(old.node.id) ?? NONE;
    fittings[f] = solveFitting(
      project,
      old.node,
      old.legs,
      old.geometry,
      old.mark,
      old.run,
      old.chainage,
      here,
      k.sums,
      f,
      old,
      (faces[f] ??= faceTerms()),
    );
  }
  // a case edit changes the pressure on every pipe: its rating checks are made again
  const diagnostics = uniqueDiagnostics([...inputs, ...pipeRatingChecks(project)]);
  const analysis = new RouteAnalysis(project, fittings, diagnostics, k);
  kept.set(analysis, k);
  return analysis;
}

function geometryOf(graph: RouteGraph): FittingGeometry[] {
  const { nodes, legs } = graph;
  const geometry = new Array<FittingGeometry>(nodes.length);
  for (let i = 0; i < nodes.length; i++) geometry[i] = fittingGeometry(nodes[i]!, legs[i]!);
  return geometry;
}

/** The whole route's fittings, thrusts and restraints: a pure function of the project document. */
export function analyseProject(project: Project): Analysis {
  const graph = routeGraph(project);
  return assemble(project, graph, geometryOf(graph), null);
}

/**
 * `analyseProject` a step at a time, for a caller that must not hold the thread for long (the app
 * opening a long route): it yields after each phase and after every `chunk` fittings, and returns the
 * same analysis, which `analyse` then returns for this document without computing it again.
 */
export function* analyseInSteps(project: Project, chunk = 200): Generator<void, Analysis, void> {
  const done = recentAnalysis(project);
  if (done) return done;
  const graph = routeGraph(project);
  yield;
  const geometry = geometryOf(graph);
  yield;
  const runs = runTable(project, graph);
  yield;
  const s = startAssembly(project, graph, geometry, runs, null);
  yield;
  for (let f = 0; f < s.order.length; f++) {
    solveAt(s, f);
    if ((f + 1) % chunk === 0) yield;
  }
  const analysis = finishAssembly(s);
  keepAnalysis(project, analysis);
  return analysis;
}

/**
 * The analysis of `project`, an edit of the document `prev` analysed, computing only what the edit can
 * change (the result equals analyseProject(project)):
 * - load cases only (a pressure, a flow factor): the route, its marks and every fitting's geometric sums
 *   are kept; each fitting's thrust is rescaled, and its restraint sized again only where its envelope
 *   of thrusts changed;
 * - nodes or pipes: the fittings at and next to what moved get their legs, geometry and sums again;
 *   the others keep their results (and take their new mark and chainage); the runs are walked again;
 * - anything else (water, design, soils): the whole analysis.
 */
export function analyseNext(prev: Analysis | null | undefined, project: Project): Analysis {
  if (!prev) return analyseProject(project);
  if (prev.project === project) return prev;
  const k = kept.get(prev);
  if (!k) return analyseProject(project);
  const change = routeChange(prev.project, project, prev.legs);
  if (change.kind === 'all') return analyseProject(project);
  if (change.kind === 'same') {
    const same = new RouteAnalysis(project, prev.fittings, prev.diagnostics, k);
    kept.set(same, k);
    return same;
  }
  if (change.kind === 'cases') return rescale(prev, k, project);
  const { dirty } = change;
  const before = k.graph;
  const graph = routeGraph(project, (id) => {
    if (dirty.has(id)) return undefined;
    const at = before.index.get(id);
    return at === undefined ? undefined : before.legs[at];
  });
  const geometry = new Array<FittingGeometry>(graph.nodes.length);
  for (let i = 0; i < graph.nodes.length; i++) {
    const n = graph.nodes[i]!;
    const at = dirty.has(n.id) ? undefined : before.index.get(n.id);
    geometry[i] = at === undefined ? fittingGeometry(n, graph.legs[i]!) : k.geometry[at]!;
  }
  const clean = change.cases ? 'sums' : 'all';
  return assemble(project, graph, geometry, {
    analysis: prev,
    kept: k,
    reuse: (id) => (dirty.has(id) ? 'none' : clean),
  });
}

/**
 * `analyseProject`, memoised by document identity for the documents asked for last (recentAnalyses.ts):
 * an unchanged document is not recomputed. Given
 * the analysis of the document before an edit, only what the edit changed is computed (analyseNext).
 */
export function analyse(project: Project, prev?: Analysis | null): Analysis {
  let result = recentAnalysis(project);
  if (!result) {
    result = analyseNext(prev, project);
    keepAnalysis(project, result);
  }
  return result;
}
