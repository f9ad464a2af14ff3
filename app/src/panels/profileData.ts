import { nodeGround, pressureAt, REGISTER, STANDARD_GRAVITY, type Analysis, type Project } from '@mainbrace/solver';

/** The fittings' straight-joint tolerance, degrees (register: fitting.straight-tolerance). */
const STRAIGHT_TOLERANCE = REGISTER['fitting.straight-tolerance'].value;

export interface ProfilePoint {
  node: string;
  /** m along the route */
  chainage: number;
  /** m, pipe centreline */
  pipe: number;
  /** m, ground surface: surveyed, or centreline + OD/2 + cover */
  ground: number;
  mark: string | null;
  /** a vertical bend along the line: a crest (the grade turns down) or a sag (it turns up), else null */
  bend: 'crest' | 'sag' | null;
}

/** A branch drawn from its tee: chainage on the section continues from the tee's. */
export interface ProfileBranch {
  letter: string;
  /** the tee's (or wye's) node */
  from: string;
  points: ProfilePoint[];
}

export interface ProfileData {
  points: ProfilePoint[];
  /** static hydraulic grade of each case with a datum, m: datum + p/(ρ·g) */
  grades: { caseId: string; label: string; elevation: number }[];
  /** gauge pressure of each case at each point, Pa (same order as `points`) */
  pressures: { caseId: string; label: string; values: number[] }[];
  /** every other run, from the point of the section where it leaves */
  branches: ProfileBranch[];
  /** m, the design groundwater level, or null */
  groundwater: number | null;
}

/**
 * Degrees the grade must turn by at a point to be marked as a crest or a sag: the straight-joint
 * tolerance of the fittings (project-format.md), so that a mark means a vertical bend.
 */
export const VERTICAL_BEND_MARK = STRAIGHT_TOLERANCE;

/** Crest or sag at each interior point, from the grade in and out along the chainage. */
function markBends(points: ProfilePoint[]): void {
  const slope = (a: ProfilePoint, b: ProfilePoint) => {
    const run = Math.sqrt(Math.max(0, (b.chainage - a.chainage) ** 2 - (b.pipe - a.pipe) ** 2));
    return (Math.atan2(b.pipe - a.pipe, run) * 180) / Math.PI;
  };
  for (let i = 1; i + 1 < points.length; i++) {
    const turn = slope(points[i]!, points[i + 1]!) - slope(points[i - 1]!, points[i]!);
    if (Math.abs(turn) >= VERTICAL_BEND_MARK) points[i]!.bend = turn < 0 ? 'crest' : 'sag';
  }
}

/**
 * The profile along the main line: run A from its start, in chainage order (branches are drawn from
 * where they leave it). Chainages are along each run, so the main is read from its run rather than
 * found by chainage: a branch node's chainage plus its pipe can equal the tee's own.
 */
export function profileData(project: Project, analysis: Analysis): ProfileData {
  const main = analysis.runs.find((r) => r.parent === null) ?? analysis.runs[0];
  const path = main ? main.nodes.map((n) => n.id) : [];
  const chain = new Map(main?.nodes.map((n) => [n.id, n.chainage]) ?? []);
  const nodes = new Map(project.nodes.map((n) => [n.id, n]));
  const pointAt = (id: string, chainage: number): ProfilePoint => {
    const n = nodes.get(id)!;
    const od = Math.max(0, ...(analysis.legs.get(id) ?? []).map((l) => l.pipe.outsideDiameter));
    return {
      node: id,
      chainage,
      pipe: n.elevation,
      ground: nodeGround(n, od),
      mark: analysis.byNode.get(id)?.mark ?? null,
      bend: null,
    };
  };
  const points = path.map((id) => pointAt(id, chain.get(id)!));
  markBends(points);
  // Every other run, unfolded from where it leaves a line already drawn (runs come parents first).
  const drawnAt = new Map(points.map((p) => [p.node, p.chainage]));
  const onMain = new Set(path);
  const branches: ProfileBranch[] = [];
  for (const run of analysis.runs) {
    if (run.nodes.every((n) => onMain.has(n.id))) continue;
    const offset = drawnAt.get(run.start);
    if (offset === undefined) continue;
    const list = run.nodes[0]?.id === run.start ? run.nodes : [{ id: run.start, chainage: 0 }, ...run.nodes];
    const branch = list.map((n) => pointAt(n.id, offset + n.chainage));
    markBends(branch);
    for (const p of branch) if (!drawnAt.has(p.node)) drawnAt.set(p.node, p.chainage);
    branches.push({ letter: run.letter, from: run.start, points: branch });
  }
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
  return { points, grades, pressures, branches, groundwater: project.design.groundwaterElevation };
}
