import { nodeGround, pressureAt, STANDARD_GRAVITY, type Analysis, type Project } from '@mainbrace/solver';

export interface ProfilePoint {
  node: string;
  /** m along the route */
  chainage: number;
  /** m, pipe centreline */
  pipe: number;
  /** m, ground surface: surveyed, or centreline + OD/2 + cover */
  ground: number;
  mark: string | null;
}

export interface ProfileData {
  points: ProfilePoint[];
  /** static hydraulic grade of each case with a datum, m: datum + p/(ρ·g) */
  grades: { caseId: string; label: string; elevation: number }[];
  /** gauge pressure of each case at each point, Pa (same order as `points`) */
  pressures: { caseId: string; label: string; values: number[] }[];
}

/**
 * The profile along the main line: from the route's start to its farthest node by chainage,
 * following the shortest path back (branches are left out).
 */
export function profileData(project: Project, analysis: Analysis): ProfileData {
  const chain = analysis.chainage;
  let far: string | null = null;
  for (const [id, c] of chain) if (far === null || c > chain.get(far)!) far = id;
  const path: string[] = [];
  let at = far;
  const seen = new Set<string>();
  while (at !== null && !seen.has(at)) {
    seen.add(at);
    path.push(at);
    const here = chain.get(at)!;
    if (here === 0) break;
    let next: string | null = null;
    for (const leg of analysis.legs.get(at) ?? []) {
      const c = chain.get(leg.far.id);
      if (c !== undefined && Math.abs(c + leg.length - here) < 1e-6 * Math.max(1, here)) next = leg.far.id;
    }
    at = next;
  }
  path.reverse();
  const nodes = new Map(project.nodes.map((n) => [n.id, n]));
  const points = path.map((id) => {
    const n = nodes.get(id)!;
    const od = Math.max(0, ...(analysis.legs.get(id) ?? []).map((l) => l.pipe.outsideDiameter));
    return {
      node: id,
      chainage: chain.get(id)!,
      pipe: n.elevation,
      ground: nodeGround(n, od),
      mark: analysis.byNode.get(id)?.mark ?? null,
    };
  });
  const grades = project.loadCases
    .filter((c) => c.datumElevation !== undefined)
    .map((c) => ({
      caseId: c.id,
      label: c.label ?? c.id,
      elevation: c.datumElevation! + c.pressure / (project.water.density * STANDARD_GRAVITY),
    }));
  const pressures = project.loadCases.map((c) => ({
    caseId: c.id,
    label: c.label ?? c.id,
    values: points.map((pt) => pressureAt(c, pt.pipe, project.water.density)),
  }));
  return { points, grades, pressures };
}
