import { coverFor, nodeCover, nodeGround, pipeLevelFor, type ProjectNode } from '@mainbrace/solver';

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
