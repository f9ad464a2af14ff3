import type { Project } from '@mainbrace/solver';

/**
 * The separate pieces of the route: groups of node ids joined by pipes, largest first. A route drawn
 * as one main is one piece; a run that starts and ends on open ground away from it is a second piece,
 * sized with its own dead-end blocks though on site it would be joined.
 */
export function routePieces(p: Project): string[][] {
  const parent = new Map<string, string>(p.nodes.map((n) => [n.id, n.id]));
  const root = (id: string): string => {
    let r = id;
    while (parent.get(r) !== r) r = parent.get(r)!;
    let c = id;
    while (parent.get(c) !== r) {
      const next = parent.get(c)!;
      parent.set(c, r);
      c = next;
    }
    return r;
  };
  for (const pipe of p.pipes)
    if (parent.has(pipe.from) && parent.has(pipe.to)) parent.set(root(pipe.from), root(pipe.to));
  const groups = new Map<string, string[]>();
  for (const n of p.nodes) {
    const r = root(n.id);
    const g = groups.get(r);
    if (g) g.push(n.id);
    else groups.set(r, [n.id]);
  }
  return [...groups.values()].sort((a, b) => b.length - a.length);
}
