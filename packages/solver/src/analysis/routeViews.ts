import type { Project } from '../model/projectSchema.js';
import type { Leg } from '../network/legs.js';
import type { FittingGeometry } from '../network/fittingKind.js';
import type { RouteGraph } from '../network/routeGraph.js';
import { runsOf, type RunTable } from '../network/runTable.js';
import type { Run } from '../network/runs.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { ThrustSums } from './thrustSums.js';
import type { FaceTerms } from '../restraint/bearingBlock.js';
import type { PlausibilityKept } from '../model/plausibility.js';
import type { Analysis, FittingAnalysis } from './analyse.js';

/**
 * What an analysis holds of its route on indices, and keeps for the next one (analyseNext): the
 * graph, the runs, the marks, every node's geometry, and every fitting's sums.
 */
export interface RouteTables {
  graph: RouteGraph;
  runs: RunTable;
  /** mark per node index (fittings and tie-ins), else undefined */
  marks: (string | undefined)[];
  /** the marked nodes in the order they were marked */
  markOrder: number[];
  geometry: FittingGeometry[];
  /** fitting index per node index, −1 for a node that is not a fitting */
  fittingAt: Int32Array;
  sums: ThrustSums;
  /**
   * per fitting, the block search's terms that do not depend on the thrust, made by the first load-case
   * edit and read by the next ones (a test-pressure slider sizes every block again at each step)
   */
  faces?: FaceTerms[];
  /** what the plausibility check found of the route's nodes, for a load-case edit to keep */
  plausible: PlausibilityKept;
  /** the maps made from these tables so far, shared by every analysis of the same route */
  views: RouteMaps;
}

/** The by-id views of a route, each made when first read. */
export interface RouteMaps {
  legs?: Map<string, Leg[]>;
  runs?: Run[];
  runOf?: Map<string, string>;
  chainage?: Map<string, number>;
  marks?: Map<string, string>;
}

/**
 * An analysis whose maps and runs (by node id: legs, runs, run letters, chainage, marks, fittings)
 * are made from its route tables when first read, and kept: the schedule reads none of them, the app
 * and the record read a few. Same contents, and the same order, as the maps built eagerly before.
 * Analyses of one route (a load-case edit, a rename) share them: the app keeps what it drew from a
 * map while the map is the same object.
 */
export class RouteAnalysis implements Analysis {
  private madeByNode: Map<string, FittingAnalysis> | undefined;

  constructor(
    readonly project: Project,
    readonly fittings: FittingAnalysis[],
    readonly diagnostics: Diagnostic[],
    readonly route: RouteTables,
  ) {}

  get byNode(): Map<string, FittingAnalysis> {
    return (this.madeByNode ??= new Map(this.fittings.map((f) => [f.node.id, f])));
  }

  get legs(): Map<string, Leg[]> {
    if (!this.route.views.legs) {
      const { nodes, legs } = this.route.graph;
      const m = new Map<string, Leg[]>();
      for (let i = 0; i < nodes.length; i++) m.set(nodes[i]!.id, legs[i]!);
      this.route.views.legs = m;
    }
    return this.route.views.legs;
  }

  get runs(): Run[] {
    const pipes = this.project.pipes;
    return (this.route.views.runs ??= runsOf(this.route.runs, this.route.graph, (k) => pipes[k]!.id));
  }

  get runOf(): Map<string, string> {
    if (!this.route.views.runOf) {
      const { runs, graph } = this.route;
      const m = new Map<string, string>();
      for (const i of runs.ownedOrder) m.set(graph.nodes[i]!.id, runs.letters[runs.owner[i]!]!);
      this.route.views.runOf = m;
    }
    return this.route.views.runOf;
  }

  get chainage(): Map<string, number> {
    if (!this.route.views.chainage) {
      const { runs, graph } = this.route;
      const m = new Map<string, number>();
      for (const i of runs.ownedOrder) m.set(graph.nodes[i]!.id, runs.chainage[i]!);
      this.route.views.chainage = m;
    }
    return this.route.views.chainage;
  }

  get marks(): Map<string, string> {
    if (!this.route.views.marks) {
      const { marks, markOrder, graph } = this.route;
      const m = new Map<string, string>();
      for (const i of markOrder) m.set(graph.nodes[i]!.id, marks[i]!);
      this.route.views.marks = m;
    }
    return this.route.views.marks;
  }
}
