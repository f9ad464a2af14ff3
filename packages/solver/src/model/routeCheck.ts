import type { Project } from './projectSchema.js';
import { MIN_PIPE_LENGTH, OVERLAP_ANGLE } from './crossChecks.js';

/** True when the items' ids are all different. */
function distinct(items: readonly { id: string }[]): boolean {
  const seen = new Set<string>();
  for (let i = 0; i < items.length; i++) seen.add(items[i]!.id);
  return seen.size === items.length;
}

/**
 * Whether a project passes the cross-field rules of crossChecks.ts that the hand check needs answered
 * — `referenceChecks` (unique ids, soils and nodes that exist, a pipe between two distinct points with
 * its inside diameter below its outside one) and `overlappingPipes` (one pipe per pair of nodes, no two
 * pipes leaving a node along one line) — as yes or no, with the same arithmetic. The command line asks
 * it of every file it reads: nodes are looked up once into an index, and pairs and directions are kept
 * as numbers, with no string, object or array made per pipe. When it says no, the schema words why; a
 * test holds it to the two checks' answer.
 */
export function routeRulesHold(p: Project): boolean {
  const { nodes, pipes } = p;
  if (!distinct(p.loadCases) || !distinct(p.soils) || !distinct(pipes)) return false;
  const soils = new Set<string>();
  for (const s of p.soils) soils.add(s.id);
  if (p.defaultSoil !== undefined && !soils.has(p.defaultSoil)) return false;
  const index = new Map<string, number>();
  for (let i = 0; i < nodes.length; i++) {
    const n = nodes[i]!;
    if (index.has(n.id)) return false;
    index.set(n.id, i);
    if (n.soil !== undefined && !soils.has(n.soil)) return false;
  }
  // Each pipe's two ends as node indices and its direction from the first to the second.
  const count = nodes.length;
  const from = new Int32Array(pipes.length);
  const to = new Int32Array(pipes.length);
  const dir = new Float64Array(3 * pipes.length);
  const degree = new Int32Array(count + 1);
  const pairs = new Set<number>();
  for (let i = 0; i < pipes.length; i++) {
    const pipe = pipes[i]!;
    if (!(pipe.insideDiameter < pipe.outsideDiameter)) return false;
    const a = index.get(pipe.from);
    const b = index.get(pipe.to);
    if (a === undefined || b === undefined || a === b) return false;
    const pair = a < b ? a * count + b : b * count + a;
    if (pairs.has(pair)) return false;
    pairs.add(pair);
    const na = nodes[a]!;
    const nb = nodes[b]!;
    const dx = nb.x - na.x;
    const dy = nb.y - na.y;
    const dz = nb.elevation - na.elevation;
    const len = Math.sqrt(dx * dx + dy * dy + dz * dz);
    if (len < MIN_PIPE_LENGTH) return false;
    from[i] = a;
    to[i] = b;
    dir[3 * i] = dx / len;
    dir[3 * i + 1] = dy / len;
    dir[3 * i + 2] = dz / len;
    degree[a + 1]!++;
    degree[b + 1]!++;
  }
  // The directions leaving each node side by side (leaving the second end, the pipe's direction reversed).
  for (let i = 0; i < count; i++) degree[i + 1]! += degree[i]!;
  const fill = degree.slice(0, count);
  const leaving = new Float64Array(3 * 2 * pipes.length);
  for (let i = 0; i < pipes.length; i++) {
    const x = dir[3 * i]!;
    const y = dir[3 * i + 1]!;
    const z = dir[3 * i + 2]!;
    let k = 3 * fill[from[i]!]!++;
    leaving[k] = x;
    leaving[k + 1] = y;
    leaving[k + 2] = z;
    k = 3 * fill[to[i]!]!++;
    leaving[k] = -x;
    leaving[k + 1] = -y;
    leaving[k + 2] = -z;
  }
  const limit = Math.cos((OVERLAP_ANGLE * Math.PI) / 180);
  for (let n = 0; n < count; n++) {
    const end = 3 * degree[n + 1]!;
    for (let j = 3 * degree[n]!; j < end; j += 3)
      for (let k = j + 3; k < end; k += 3)
        if (leaving[j]! * leaving[k]! + leaving[j + 1]! * leaving[k + 1]! + leaving[j + 2]! * leaving[k + 2]! > limit)
          return false;
  }
  return true;
}
