import type { Project } from '../model/projectSchema.js';
import type { Leg } from './legs.js';

/**
 * Chainage of every node, m: the shortest distance along the pipes (3-D lengths) from the route's
 * start. The start is the first tie-in, else the first node with one pipe, else the first node.
 * Nodes not connected to the start are measured from their own component's start.
 */
export function chainage(project: Project, legs: ReadonlyMap<string, readonly Leg[]>): Map<string, number> {
  const result = new Map<string, number>();
  const degree = (id: string) => legs.get(id)?.length ?? 0;
  const starts = [
    ...project.nodes.filter((n) => n.end === 'tie-in' && degree(n.id) === 1),
    ...project.nodes.filter((n) => degree(n.id) === 1),
    ...project.nodes,
  ];
  for (const start of starts) {
    if (result.has(start.id)) continue;
    dijkstra(start.id, legs, result);
  }
  return result;
}

/** Shortest path lengths from `start` into `out`; a simple binary heap keeps it O(E log V). */
function dijkstra(start: string, legs: ReadonlyMap<string, readonly Leg[]>, out: Map<string, number>) {
  const heap: [number, string][] = [[0, start]];
  const push = (item: [number, string]) => {
    heap.push(item);
    let i = heap.length - 1;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (heap[parent]![0] <= heap[i]![0]) break;
      [heap[parent], heap[i]] = [heap[i]!, heap[parent]!];
      i = parent;
    }
  };
  const pop = (): [number, string] => {
    const top = heap[0]!;
    const last = heap.pop()!;
    if (heap.length > 0) {
      heap[0] = last;
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        const r = l + 1;
        let m = i;
        if (l < heap.length && heap[l]![0] < heap[m]![0]) m = l;
        if (r < heap.length && heap[r]![0] < heap[m]![0]) m = r;
        if (m === i) break;
        [heap[m], heap[i]] = [heap[i]!, heap[m]!];
        i = m;
      }
    }
    return top;
  };
  while (heap.length > 0) {
    const [d, id] = pop();
    if (out.has(id)) continue;
    out.set(id, d);
    for (const leg of legs.get(id) ?? []) {
      if (!out.has(leg.far.id)) push([d + leg.length, leg.far.id]);
    }
  }
}
