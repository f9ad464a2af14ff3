import type { Pipe, Project } from '../model/projectSchema.js';

interface Link {
  spec: Pipe;
  far: string;
  /** m, 3-D length of the pipe */
  length: number;
}

const adjacency = new WeakMap<Project, Map<string, Link[]>>();
const tieIns = new WeakMap<Project, Set<string>>();

/** Each node's pipes with the node at the far end, built once per project document. */
function linksOf(project: Project): Map<string, Link[]> {
  let links = adjacency.get(project);
  if (links) return links;
  links = new Map();
  const at = new Map(project.nodes.map((n) => [n.id, n]));
  for (const p of project.pipes) {
    const a = at.get(p.from);
    const b = at.get(p.to);
    if (!a || !b) continue;
    const length = Math.hypot(b.x - a.x, b.y - a.y, b.elevation - a.elevation);
    (links.get(a.id) ?? links.set(a.id, []).get(a.id)!).push({ spec: p, far: b.id, length });
    (links.get(b.id) ?? links.set(b.id, []).get(b.id)!).push({ spec: p, far: a.id, length });
  }
  adjacency.set(project, links);
  tieIns.set(project, new Set(project.nodes.filter((n) => n.end === 'tie-in').map((n) => n.id)));
  return links;
}

/** The line a restrained zone can run along from a fitting: its length, and whether it ends at a tie-in. */
export interface LineAlong {
  /** m, along the line from the fitting to the node where it branches or ends */
  length: number;
  /** the line ends at a tie-in: it runs on into the existing main */
  tieIn: boolean;
}

/** One pipe of a line walked out from a fitting: its id, 3-D length, and the node the walk entered it at. */
export interface LineStep {
  pipe: string;
  /** the pipe as the project gives it (its size and material) */
  spec: Pipe;
  /** the node the walk came from: the pipe's `from` or its `to` */
  entered: string;
  /** m, 3-D length of the pipe */
  length: number;
}

/**
 * The pipes of the line from `node` out along `pipe`, in order: through every node where the line simply
 * continues (two pipes: straight joints and the fittings a zone may run through), up to the first node
 * where it branches or ends (or, given `within`, m, the first pipe that reaches that far); and whether it
 * ends at a tie-in, where it runs on into the existing main.
 */
export function pipesAlong(
  project: Project,
  node: string,
  pipe: string,
  within = Infinity,
): { steps: LineStep[]; tieIn: boolean } {
  const links = linksOf(project);
  const steps: LineStep[] = [];
  let here = node;
  let via = pipe;
  let total = 0;
  const seen = new Set<string>([node]);
  for (;;) {
    const link = links.get(here)?.find((l) => l.spec.id === via);
    if (!link) return { steps, tieIn: false };
    steps.push({ pipe: via, spec: link.spec, entered: here, length: link.length });
    total += link.length;
    // A walk for a restrained length stops where the length is covered: a long line is not walked whole.
    if (total >= within) return { steps, tieIn: false };
    const next = links.get(link.far) ?? [];
    if (next.length === 1 && tieIns.get(project)!.has(link.far)) return { steps, tieIn: true };
    if (next.length !== 2 || seen.has(link.far)) return { steps, tieIn: false };
    seen.add(link.far);
    here = link.far;
    via = next[0]!.spec.id === via ? next[1]!.spec.id : next[0]!.spec.id;
  }
}

/**
 * The length of the line from `node` out along `pipe` (`pipesAlong`). Pipe–soil friction acts only on
 * pipe that exists, so no restrained length can run past its end; at a tie-in the line runs on into the
 * existing main, whose length the project does not know.
 */
export function lineAlong(project: Project, node: string, pipe: string): LineAlong {
  const { steps, tieIn } = pipesAlong(project, node, pipe);
  let length = 0;
  for (const s of steps) length += s.length;
  return { length, tieIn };
}
