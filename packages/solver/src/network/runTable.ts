import { dot } from '../geometry/vector.js';
import type { RouteGraph } from './routeGraph.js';
import { runLetter, type Run } from './runs.js';

/**
 * The network split into runs, on node and pipe indices in flat arrays. The main starts at the first
 * tie-in at an end, else the first end, else the first node; at every node it goes on along the
 * straightest unwalked pipe, and every other pipe there starts a branch. Branches are lettered in the
 * order they leave their parent runs (the main's first, by chainage), then their own branches; a
 * network in pieces letters each piece after the last. Chainage restarts at 0 at the start of each run. Run r's nodes are entries runFirst[r] …
 * runFirst[r + 1] − 1 of `seqNode` (with their chainage in `seqChainage`), its pipes entries
 * pipeFirst[r] … of `seqPipe`.
 */
export interface RunTable {
  letters: string[];
  /** node index each run starts from */
  runStart: number[];
  /** the run each run branches from, −1 for none */
  runParent: number[];
  runFirst: number[];
  pipeFirst: number[];
  seqNode: number[];
  seqChainage: number[];
  seqPipe: number[];
  /** the run that owns each node (its first run), −1 for a node on no pipe */
  owner: Int32Array;
  /** chainage of each node along the run that owns it, m */
  chainage: Float64Array;
  /** the nodes in the order their owner was set (the insertion order of `runOf`) */
  ownedOrder: number[];
}

export function runTable(project: { nodes: readonly { end?: string | undefined }[] }, g: RouteGraph): RunTable {
  const n = g.nodes.length;
  const { legs, legStart, legFar, legPipe } = g;
  const degree = (i: number) => legStart[i + 1]! - legStart[i]!;
  const walked = new Uint8Array(g.pipeCount);
  let walkedCount = 0;
  const owner = new Int32Array(n).fill(-1);
  const chainage = new Float64Array(n);
  const t: RunTable = {
    letters: [],
    runStart: [],
    runParent: [],
    runFirst: [],
    pipeFirst: [],
    seqNode: [],
    seqChainage: [],
    seqPipe: [],
    owner,
    chainage,
    ownedOrder: [],
  };
  const own = (i: number, r: number, along: number) => {
    owner[i] = r;
    chainage[i] = along;
    t.ownedOrder.push(i);
  };
  const legAt = (node: number, e: number) => legs[node]![e - legStart[node]!]!;

  /** Walks a run from node `start` along leg entry `e`: straight on at every node. */
  const walk = (start: number, e: number, parent: number): number => {
    const r = t.letters.length;
    t.letters.push(runLetter(r));
    t.runStart.push(start);
    t.runParent.push(parent);
    t.runFirst.push(t.seqNode.length);
    t.pipeFirst.push(t.seqPipe.length);
    let at = start;
    let along = 0;
    if (owner[at]! < 0) own(at, r, 0);
    t.seqNode.push(at);
    t.seqChainage.push(0);
    while (e >= 0) {
      const pipe = legPipe[e]!;
      if (!walked[pipe]) walkedCount++;
      walked[pipe] = 1;
      t.seqPipe.push(pipe);
      const leg = legAt(at, e);
      along += leg.length;
      const came = leg.direction;
      at = legFar[e]!;
      t.seqNode.push(at);
      t.seqChainage.push(along);
      if (owner[at]! >= 0) break; // a loop closes on a node another run owns
      own(at, r, along);
      let next = -1;
      for (let j = legStart[at]!; j < legStart[at + 1]!; j++) {
        if (walked[legPipe[j]!]) continue;
        if (next < 0 || dot(legAt(at, j).direction, came) > dot(legAt(at, next).direction, came)) next = j;
      }
      e = next;
    }
    return r;
  };

  const pipeEnds = legStart[n]!;
  const queueNode: number[] = [];
  const queueLeg: number[] = [];
  const queueParent: number[] = [];
  const from = (start: number): void => {
    if (2 * walkedCount >= pipeEnds) return;
    let first = -1;
    for (let j = legStart[start]!; j < legStart[start + 1]!; j++) {
      if (!walked[legPipe[j]!]) {
        first = j;
        break;
      }
    }
    if (first < 0) return;
    queueNode.length = queueLeg.length = queueParent.length = 0;
    queueNode.push(start);
    queueLeg.push(first);
    queueParent.push(-1);
    for (let q = 0; q < queueNode.length; q++) {
      if (walked[legPipe[queueLeg[q]!]!]) continue;
      const r = walk(queueNode[q]!, queueLeg[q]!, queueParent[q]!);
      // Branches leave this run's nodes in chainage order, each pipe not yet walked.
      for (let s = t.runFirst[r]!; s < t.seqNode.length; s++) {
        const id = t.seqNode[s]!;
        for (let j = legStart[id]!; j < legStart[id + 1]!; j++) {
          if (walked[legPipe[j]!]) continue;
          queueNode.push(id);
          queueLeg.push(j);
          queueParent.push(r);
        }
      }
    }
  };
  // The candidate starts in order; once every pipe is walked none is left.
  const nodes = project.nodes;
  for (let i = 0; i < n && 2 * walkedCount < pipeEnds; i++) if (nodes[i]!.end === 'tie-in' && degree(i) === 1) from(i);
  for (let i = 0; i < n && 2 * walkedCount < pipeEnds; i++) if (degree(i) === 1) from(i);
  for (let i = 0; i < n && 2 * walkedCount < pipeEnds; i++) if (degree(i) > 0) from(i);
  t.runFirst.push(t.seqNode.length);
  t.pipeFirst.push(t.seqPipe.length);
  return t;
}

/**
 * Marks of the fittings: the run letter and a number in chainage order along the run that owns the
 * node (A1, A2 … on the main, B1 … on the first branch); only nodes `isFitting` accepts are numbered,
 * and a node's mark changes only when its own run changes before it. Per node index its mark or
 * undefined, and the marked nodes in the order they were marked.
 */
export function runMarks(
  t: RunTable,
  isFitting: (node: number) => boolean,
): { marks: (string | undefined)[]; order: number[] } {
  const marks = new Array<string | undefined>(t.owner.length);
  const order: number[] = [];
  for (let r = 0; r < t.letters.length; r++) {
    let n = 0;
    for (let s = t.runFirst[r]!; s < t.runFirst[r + 1]!; s++) {
      const id = t.seqNode[s]!;
      if (t.owner[id] !== r || marks[id] !== undefined || !isFitting(id)) continue;
      marks[id] = `${t.letters[r]!}${++n}`;
      order.push(id);
    }
  }
  return { marks, order };
}

/** The runs as lists of node ids and pipe ids, made from the table (the app and the record read these). */
export function runsOf(t: RunTable, g: RouteGraph, pipeId: (k: number) => string): Run[] {
  const runs: Run[] = [];
  for (let r = 0; r < t.letters.length; r++) {
    const nodes: Run['nodes'] = [];
    for (let s = t.runFirst[r]!; s < t.runFirst[r + 1]!; s++)
      nodes.push({ id: g.nodes[t.seqNode[s]!]!.id, chainage: t.seqChainage[s]! });
    const pipes: string[] = [];
    for (let s = t.pipeFirst[r]!; s < t.pipeFirst[r + 1]!; s++) pipes.push(pipeId(t.seqPipe[s]!));
    const parent = t.runParent[r]!;
    runs.push({
      letter: t.letters[r]!,
      start: g.nodes[t.runStart[r]!]!.id,
      parent: parent < 0 ? null : t.letters[parent]!,
      nodes,
      pipes,
    });
  }
  return runs;
}
