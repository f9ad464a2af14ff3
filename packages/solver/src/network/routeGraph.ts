import type { Project, ProjectNode } from '../model/projectSchema.js';
import { pipeLegs, type Leg } from './legs.js';

/**
 * The route as the analysis walks it: nodes and pipes by their place in the document, each node's
 * pipe ends in a compressed list (the legs of node i are entries legStart[i] … legStart[i + 1] − 1,
 * in pipe order, as `legsByNode` lists them). Walking runs and ordering fittings on indices and typed
 * arrays costs a fraction of the string-keyed maps and sets it replaced; the maps the app reads are
 * made from this when first read (analysis/routeViews.ts).
 */
export interface RouteGraph {
  nodes: readonly ProjectNode[];
  /** node index by id */
  index: Map<string, number>;
  /** each node's legs, in pipe order (the objects of `Analysis.legs`) */
  legs: Leg[][];
  legStart: Int32Array;
  /** index of the node at the far end of each leg */
  legFar: Int32Array;
  /** index in `project.pipes` of each leg's pipe */
  legPipe: Int32Array;
  pipeCount: number;
}

/**
 * The graph of `project`; a node for which `kept` gives legs keeps them (an edit that did not touch
 * it: the same objects, in the same pipe order), every other node gets new ones. Assumes a validated
 * project: a pipe whose ends do not resolve is left out, as `legsByNode` leaves it out.
 */
export function routeGraph(project: Project, kept?: (id: string) => Leg[] | undefined): RouteGraph {
  const nodes = project.nodes;
  const pipes = project.pipes;
  const n = nodes.length;
  const index = new Map<string, number>();
  for (let i = 0; i < n; i++) index.set(nodes[i]!.id, i);
  const from = new Int32Array(pipes.length);
  const to = new Int32Array(pipes.length);
  const legStart = new Int32Array(n + 1);
  for (let k = 0; k < pipes.length; k++) {
    const a = index.get(pipes[k]!.from);
    const b = index.get(pipes[k]!.to);
    if (a === undefined || b === undefined) {
      from[k] = -1;
      continue;
    }
    from[k] = a;
    to[k] = b;
    legStart[a + 1]!++;
    legStart[b + 1]!++;
  }
  for (let i = 0; i < n; i++) legStart[i + 1]! += legStart[i]!;
  const ends = legStart[n]!;
  const legFar = new Int32Array(ends);
  const legPipe = new Int32Array(ends);
  const cursor = legStart.slice(0, n);
  const legs = new Array<Leg[]>(n);
  const fresh = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    const old = kept?.(nodes[i]!.id);
    if (old) legs[i] = old;
    else {
      // sized to the node's pipe ends: a list grown by push keeps room for 17
      legs[i] = new Array<Leg>(legStart[i + 1]! - legStart[i]!);
      fresh[i] = 1;
    }
  }
  const useOutside = project.design.thrustArea === 'outside';
  for (let k = 0; k < pipes.length; k++) {
    const a = from[k]!;
    if (a < 0) continue;
    const b = to[k]!;
    const ea = cursor[a]!++;
    legFar[ea] = b;
    legPipe[ea] = k;
    const eb = cursor[b]!++;
    legFar[eb] = a;
    legPipe[eb] = k;
    if (!fresh[a] && !fresh[b]) continue;
    const [fromA, fromB] = pipeLegs(pipes[k]!, nodes[a]!, nodes[b]!, useOutside);
    if (fresh[a]) legs[a]![ea - legStart[a]!] = fromA;
    if (fresh[b]) legs[b]![eb - legStart[b]!] = fromB;
  }
  return { nodes, index, legs, legStart, legFar, legPipe, pipeCount: pipes.length };
}
