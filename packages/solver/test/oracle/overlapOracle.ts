import type { Project } from '../../src/model/projectSchema.js';
import { norm } from '../../src/geometry/vector.js';
import { MIN_PIPE_LENGTH, OVERLAP_ANGLE, type Add } from '../../src/model/routeRules.js';

// The overlapping-pipes check as it was before it was written as plain loops (src/model/crossChecks.ts),
// kept as the reference a test holds the new one to: the same problems, in the same order.

/** A second pipe between the same two nodes, and two pipes leaving a node along the same line. */
export function overlappingPipesOracle(p: Project, add: Add) {
  const nodes = new Map(p.nodes.map((n) => [n.id, n]));
  const pairs = new Map<string, number>();
  const leaving = new Map<string, { pipe: number; dir: [number, number, number] }[]>();
  p.pipes.forEach((pipe, i) => {
    const key = [pipe.from, pipe.to].sort().join('\u0000');
    const first = pairs.get(key);
    if (first !== undefined) {
      add(
        ['pipes', i],
        `joins the same two nodes as pipes[${first}] ("${p.pipes[first]!.id}"): one pipe between two nodes`,
      );
      return;
    }
    pairs.set(key, i);
    const a = nodes.get(pipe.from);
    const b = nodes.get(pipe.to);
    if (!a || !b || pipe.from === pipe.to) return;
    const d: [number, number, number] = [b.x - a.x, b.y - a.y, b.elevation - a.elevation];
    const len = norm(d);
    if (len < MIN_PIPE_LENGTH) return;
    const u: [number, number, number] = [d[0] / len, d[1] / len, d[2] / len];
    for (const [id, dir] of [
      [a.id, u],
      [b.id, [-u[0], -u[1], -u[2]] as [number, number, number]],
    ] as const) {
      const list = leaving.get(id) ?? [];
      for (const other of list) {
        const cos = other.dir[0] * dir[0] + other.dir[1] * dir[1] + other.dir[2] * dir[2];
        if (cos > Math.cos((OVERLAP_ANGLE * Math.PI) / 180)) {
          add(
            ['pipes', i],
            `leaves node "${id}" along the same line as pipes[${other.pipe}] ("${p.pipes[other.pipe]!.id}"): the two lie on top of each other (is the route folded back on itself?)`,
          );
        }
      }
      list.push({ pipe: i, dir });
      leaving.set(id, list);
    }
  });
}
