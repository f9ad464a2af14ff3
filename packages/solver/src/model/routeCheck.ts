import type { Project } from './projectSchema.js';
import { MIN_PIPE_LENGTH, OVERLAP_ANGLE } from './routeRules.js';
import { caseName } from './caseLabel.js';

/** True when the items' ids are all different. */
function distinct(items: readonly { id: string }[]): boolean {
  const seen = new Set<string>();
  for (let i = 0; i < items.length; i++) seen.add(items[i]!.id);
  return seen.size === items.length;
}

/**
 * Whether a project passes the cross-field rules of crossChecks.ts that the hand check needs answered
 * — `referenceChecks` (unique ids and case names, soils and nodes that exist, a pipe between two distinct points with
 * its inside diameter below its outside one) and `overlappingPipes` (one pipe per pair of nodes, no two
 * pipes leaving a node along one line) — as yes or no, with the same arithmetic. The command line asks
 * it of every file it reads: nodes are looked up once into an index and the pipes checked in one pass,
 * with directions kept as numbers and no string, object or array made per pipe. When it says no, the
 * schema words why; a test holds it to the two checks' answer.
 */
export function routeRulesHold(p: Project): boolean {
  const { nodes, pipes } = p;
  if (!distinct(p.loadCases) || !distinct(p.soils)) return false;
  const names = new Set<string>();
  for (const c of p.loadCases) names.add(caseName(c));
  if (names.size < p.loadCases.length) return false;
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
  // One pass over the pipes (a cold process runs each loop mostly before it is compiled): the
  // directions already leaving each node are a list through `next`, from `first[node]`, of pipe ends
  // 2i (leaving the first node) and 2i + 1 (leaving the second, the direction reversed).
  const first = new Int32Array(nodes.length).fill(-1);
  const next = new Int32Array(2 * pipes.length);
  const dir = new Float64Array(6 * pipes.length);
  const limit = Math.cos((OVERLAP_ANGLE * Math.PI) / 180);
  const leaves = (end: number, node: number, x: number, y: number, z: number): boolean => {
    for (let e = first[node]!; e !== -1; e = next[e]!)
      if (dir[3 * e]! * x + dir[3 * e + 1]! * y + dir[3 * e + 2]! * z > limit) return false;
    dir[3 * end] = x;
    dir[3 * end + 1] = y;
    dir[3 * end + 2] = z;
    next[end] = first[node]!;
    first[node] = end;
    return true;
  };
  const ids = new Set<string>();
  for (let i = 0; i < pipes.length; i++) {
    const pipe = pipes[i]!;
    ids.add(pipe.id);
    if (ids.size !== i + 1) return false;
    if (!(pipe.insideDiameter < pipe.outsideDiameter)) return false;
    const a = index.get(pipe.from);
    const b = index.get(pipe.to);
    if (a === undefined || b === undefined || a === b) return false;
    const na = nodes[a]!;
    const nb = nodes[b]!;
    const dx = nb.x - na.x;
    const dy = nb.y - na.y;
    const dz = nb.elevation - na.elevation;
    const len = Math.sqrt(dx * dx + dy * dy + dz * dz);
    if (len < MIN_PIPE_LENGTH) return false;
    const x = dx / len;
    const y = dy / len;
    const z = dz / len;
    // A second pipe between the same two nodes, either way round, leaves its first node along the
    // same unit vector as the first pipe (cos = 1): refused here as overlappingPipes refuses it.
    if (!leaves(2 * i, a, x, y, z) || !leaves(2 * i + 1, b, -x, -y, -z)) return false;
  }
  return true;
}
