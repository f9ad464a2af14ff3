import type { Project } from '../model/projectSchema.js';
import { pipesAlong } from '../restraint/routeReach.js';
import { pipeLegs } from '../network/legs.js';
import { fittingGeometry } from '../network/fittingKind.js';

/** A stretch of one pipe to restrain, m along the pipe from its `from` node (past its ends into a tie-in). */
export interface RestrainedStretch {
  pipe: string;
  start: number;
  end: number;
  /** m, 3-D length of the pipe */
  pipeLength: number;
}

type Zones = { node: string; restraint: { restrainedLegs: readonly { pipe: string; length: number }[] } };

const TOUCH = 1e-6;

/**
 * The pipe the restrained zones of `fittings` cover, each metre once: two fittings whose zones overlap on
 * the pipe between them restrain that pipe, not twice its length. Each zone runs from its fitting along its
 * pipe and on along the line (`pipesAlong`) for its restrained length; past a tie-in it runs on into the
 * existing main.
 */
export function restrainedStretches(project: Project, fittings: readonly Zones[]): RestrainedStretch[] {
  const from = new Map(project.pipes.map((p) => [p.id, p.from]));
  const byPipe = new Map<string, { pipeLength: number; spans: [number, number][] }>();
  const add = (pipe: string, pipeLength: number, span: [number, number]) => {
    const entry = byPipe.get(pipe) ?? { pipeLength, spans: [] };
    entry.spans.push(span);
    byPipe.set(pipe, entry);
  };
  for (const f of fittings)
    for (const leg of f.restraint.restrainedLegs) {
      const { steps, tieIn } = pipesAlong(project, f.node, leg.pipe, leg.length);
      let left = leg.length;
      for (const s of steps) {
        if (!(left > 0)) break;
        const covered = Math.min(left, s.length);
        add(s.pipe, s.length, from.get(s.pipe) === s.entered ? [0, covered] : [s.length - covered, s.length]);
        left -= covered;
      }
      const last = steps[steps.length - 1];
      if (left > TOUCH && tieIn && last)
        add(
          last.pipe,
          last.length,
          from.get(last.pipe) === last.entered ? [last.length, last.length + left] : [-left, 0],
        );
    }
  const out: RestrainedStretch[] = [];
  for (const [pipe, { pipeLength, spans }] of byPipe) {
    spans.sort((a, b) => a[0] - b[0]);
    let [start, end] = spans[0]!;
    for (const [a, b] of spans.slice(1)) {
      if (a <= end + TOUCH) end = Math.max(end, b);
      else {
        out.push({ pipe, start, end, pipeLength });
        [start, end] = [a, b];
      }
    }
    out.push({ pipe, start, end, pipeLength });
  }
  return out;
}

/**
 * Joints to restrain in `stretches` with pipes `layingLength` long: one at every pipe end a stretch
 * reaches (a fitting's socket; where two pipes simply join, a straight joint, the one joint between them),
 * and between the ends one every laying length from the end it is laid from, ⌈s/ℓ⌉ − 1 in a piece of
 * length s. A single zone inside one pipe so gets ⌈L/ℓ⌉, as its row counts (`restrainedJointCount`).
 */
export function stretchJoints(
  project: Project,
  stretches: readonly RestrainedStretch[],
  layingLength: number,
): Map<string, number> {
  const ends = new Map(project.pipes.map((p) => [p.id, [p.from, p.to] as const]));
  const nodes = new Map(project.nodes.map((n) => [n.id, n]));
  const reached = new Map<string, string[]>();
  const byPipe = new Map<string, number>();
  for (const s of stretches) {
    const [a, b] = ends.get(s.pipe) ?? ['', ''];
    // The stretch in pieces between the pipe's two ends and beyond them (into a tie-in).
    const cuts = [s.start, ...[0, s.pipeLength].filter((x) => x > s.start + TOUCH && x < s.end - TOUCH), s.end];
    let n = 0;
    for (let i = 1; i < cuts.length; i++)
      n += Math.max(0, Math.ceil((cuts[i]! - cuts[i - 1]!) / layingLength - 1e-9) - 1);
    for (const [node, at] of [
      [a, 0],
      [b, s.pipeLength],
    ] as const)
      if (s.start <= at + TOUCH && s.end >= at - TOUCH) {
        const pipes = reached.get(node) ?? [];
        if (pipes.includes(s.pipe)) continue;
        reached.set(node, [...pipes, s.pipe]);
        n++;
      }
    byPipe.set(s.pipe, (byPipe.get(s.pipe) ?? 0) + n);
  }
  // Two pipe ends meeting at a straight joint are one joint, not two.
  const pipeById = new Map(project.pipes.map((p) => [p.id, p]));
  const outside = project.design.thrustArea === 'outside';
  const legAt = (node: string, pipe: string) => {
    const p = pipeById.get(pipe);
    const a = p && nodes.get(p.from);
    const b = p && nodes.get(p.to);
    return p && a && b ? pipeLegs(p, a, b, outside)[p.from === node ? 0 : 1] : undefined;
  };
  const joined = new Map<string, number>();
  for (const p of project.pipes) for (const n of [p.from, p.to]) joined.set(n, (joined.get(n) ?? 0) + 1);
  for (const [id, pipes] of reached) {
    const node = nodes.get(id);
    const own = pipes.map((pipe) => legAt(id, pipe));
    if (node && joined.get(id) === 2 && pipes.length === 2 && own[0] && own[1])
      if (fittingGeometry(node, [own[0], own[1]]).kind === 'straight')
        byPipe.set(pipes[1]!, byPipe.get(pipes[1]!)! - 1);
  }
  return byPipe;
}
