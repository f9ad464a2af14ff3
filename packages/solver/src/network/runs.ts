import { dot } from '../geometry/vector.js';
import type { Project } from '../model/projectSchema.js';
import type { Leg } from './legs.js';

/** One line a crew walks: the main, or a branch from a fitting of another run. */
export interface Run {
  /** A for the main, then B, C … for branches in the order a crew meets them; AA after Z */
  letter: string;
  /** the node the run starts from (the branch's tee for a branch) */
  start: string;
  /** the run it branches from, or null */
  parent: string | null;
  /** nodes along the run from its start, each with its chainage along the run, m */
  nodes: { id: string; chainage: number }[];
  /** pipes along the run, in order */
  pipes: string[];
}

export interface RunLayout {
  runs: Run[];
  /** the run that owns each node (its first run) */
  runOf: Map<string, string>;
  /** chainage of each node along the run that owns it, m */
  chainage: Map<string, number>;
}

/** A, B … Z, AA, AB …: bijective base 26. */
export function runLetter(index: number): string {
  let n = index + 1;
  let out = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}

/**
 * Splits the network into runs. The main starts at the first tie-in at an end, else the first end,
 * else the first node; at every node it goes on along the straightest unwalked pipe, and every other
 * pipe there starts a branch. Branches are lettered in the order they leave their parent runs (the
 * main's first, by chainage), then their own branches; a network in pieces letters each piece after
 * the last. Chainage restarts at 0 at the start of each run.
 */
export function runLayout(project: Project, legs: ReadonlyMap<string, readonly Leg[]>): RunLayout {
  const degree = (id: string) => legs.get(id)?.length ?? 0;
  // The candidate starts in order, made one at a time: the first usually walks the whole route.
  function* starts() {
    for (const n of project.nodes) if (n.end === 'tie-in' && degree(n.id) === 1) yield n;
    for (const n of project.nodes) if (degree(n.id) === 1) yield n;
    for (const n of project.nodes) if (degree(n.id) > 0) yield n;
  }
  const walked = new Set<string>();
  const runOf = new Map<string, string>();
  const chainage = new Map<string, number>();
  const runs: Run[] = [];
  type Pending = { start: string; leg: Leg; parent: string | null };

  const walk = (p: Pending): Run => {
    const run: Run = { letter: runLetter(runs.length), start: p.start, parent: p.parent, nodes: [], pipes: [] };
    runs.push(run);
    let at = p.start;
    let along = 0;
    let leg: Leg | undefined = p.leg;
    if (!runOf.has(at)) {
      runOf.set(at, run.letter);
      chainage.set(at, 0);
    }
    run.nodes.push({ id: at, chainage: 0 });
    while (leg) {
      walked.add(leg.pipe.id);
      run.pipes.push(leg.pipe.id);
      along += leg.length;
      const came = leg.direction;
      at = leg.far.id;
      run.nodes.push({ id: at, chainage: along });
      if (runOf.has(at)) break; // a loop closes on a node another run owns
      runOf.set(at, run.letter);
      chainage.set(at, along);
      // Straight on: the unwalked pipe whose direction is nearest the one we arrived along.
      let next: Leg | undefined;
      for (const l of legs.get(at) ?? []) {
        if (walked.has(l.pipe.id)) continue;
        if (!next || dot(l.direction, came) > dot(next.direction, came)) next = l;
      }
      leg = next;
    }
    return run;
  };

  // Once every pipe is walked no start is left: stop instead of trying the rest (a long route has
  // three candidate starts per node).
  let pipeEnds = 0;
  for (const l of legs.values()) pipeEnds += l.length;
  for (const start of starts()) {
    if (2 * walked.size >= pipeEnds) break;
    const first = (legs.get(start.id) ?? []).find((l) => !walked.has(l.pipe.id));
    if (!first) continue;
    const queue: Pending[] = [{ start: start.id, leg: first, parent: null }];
    for (let q = 0; q < queue.length; q++) {
      const p = queue[q]!;
      if (walked.has(p.leg.pipe.id)) continue;
      const run = walk(p);
      // Branches leave this run's nodes in chainage order, each pipe not yet walked.
      for (const { id } of run.nodes) {
        for (const l of legs.get(id) ?? []) {
          if (!walked.has(l.pipe.id)) queue.push({ start: id, leg: l, parent: run.letter });
        }
      }
    }
  }
  return { runs, runOf, chainage };
}

/**
 * Marks of the fittings: the run letter and a number in chainage order along the run that owns the
 * node (A1, A2 … on the main, B1 … on the first branch). Only nodes `isFitting` accepts are numbered;
 * a node's mark changes only when its own run changes before it.
 */
export function fittingMarks(layout: RunLayout, isFitting: (node: string) => boolean): Map<string, string> {
  const marks = new Map<string, string>();
  for (const run of layout.runs) {
    let n = 0;
    for (const { id } of run.nodes) {
      if (layout.runOf.get(id) !== run.letter || marks.has(id) || !isFitting(id)) continue;
      marks.set(id, `${run.letter}${++n}`);
    }
  }
  return marks;
}
