import { coverFor, nodeCover, nodeGround, pipeLevelFor, type Project, type ProjectNode } from '@mainbrace/solver';

/** Which of ground, cover and pipe level the user typed; the other follows (project-format.md, "Ground levels"). */
export type LevelEdit =
  | { typed: 'ground'; value: number }
  | { typed: 'cover'; value: number }
  | { typed: 'pipe'; value: number }
  | { typed: 'add-ground' }
  | { typed: 'remove-ground' };

const mm = (v: number) => Math.round(v * 1e6) / 1e6;

/**
 * The node fields one typed level changes, `od` the largest outside diameter at the node. With a ground
 * level: the cover places the pipe, the pipe gives the cover, a new ground keeps the cover and moves the
 * pipe with it. Without one, cover and pipe level are independent as before. The stored cover is kept
 * equal to the derived one so the file reads consistently.
 */
export function levelPatch(node: ProjectNode, od: number, e: LevelEdit): Partial<ProjectNode> {
  const cover = nodeCover(node, od);
  switch (e.typed) {
    case 'add-ground':
      return { groundLevel: mm(nodeGround(node, od)), cover: mm(cover) };
    case 'remove-ground':
      return { groundLevel: undefined, cover: mm(cover) };
    case 'ground':
      return { groundLevel: e.value, elevation: mm(pipeLevelFor(e.value, cover, od)), cover: mm(cover) };
    case 'cover':
      return node.groundLevel === undefined
        ? { cover: e.value }
        : { cover: e.value, elevation: mm(pipeLevelFor(node.groundLevel, e.value, od)) };
    case 'pipe':
      return node.groundLevel === undefined
        ? { elevation: e.value }
        : { elevation: e.value, cover: mm(coverFor(node.groundLevel, e.value, od)) };
  }
}

/** m, the largest outside diameter of the pipes meeting at a node: it sets where the pipe's top is. */
export const largestOd = (project: Project, nodeId: string): number =>
  Math.max(0, ...project.pipes.filter((p) => p.from === nodeId || p.to === nodeId).map((p) => p.outsideDiameter));

/**
 * The patches that lay the pipe on an even grade between two nodes of a run: every node between them takes
 * the centreline level on the straight line from the first node's level to the last's, by chainage along
 * the run (the ends keep theirs). A node with a ground level keeps it and its cover follows, as when its
 * pipe level is typed. `stretch` is the run's nodes from one end to the other, in order.
 */
export function evenGrade(
  project: Project,
  stretch: readonly { id: string; chainage: number }[],
): Map<string, Partial<ProjectNode>> {
  const byId = new Map(project.nodes.map((n) => [n.id, n]));
  const first = stretch[0];
  const last = stretch.at(-1);
  const patches = new Map<string, Partial<ProjectNode>>();
  if (!first || !last || stretch.length < 3) return patches;
  const [a, b] = [byId.get(first.id)!, byId.get(last.id)!];
  const run = last.chainage - first.chainage;
  if (run === 0) return patches;
  for (const p of stretch.slice(1, -1)) {
    const node = byId.get(p.id)!;
    const level = mm(a.elevation + ((b.elevation - a.elevation) * (p.chainage - first.chainage)) / run);
    if (Math.abs(level - node.elevation) < 5e-7) continue;
    patches.set(p.id, levelPatch(node, largestOd(project, p.id), { typed: 'pipe', value: level }));
  }
  return patches;
}
