import { norm, type Analysis, type FittingAnalysis, type Project } from '@mainbrace/solver';
import { routePieces } from './connectivity.js';
import { keptPer } from './keptPer.js';

/** The fittings with the largest governing thrust, largest first. */
export function largestThrusts(analysis: Analysis, count: number): FittingAnalysis[] {
  // One pass keeping the `count` largest (a 10,000-fitting route is not sorted for six of them).
  const top: { f: FittingAnalysis; force: number }[] = [];
  if (count <= 0) return [];
  for (const f of analysis.fittings) {
    const force = norm(f.envelope.governing.total);
    if (top.length === count && force <= top[count - 1]!.force) continue;
    let i = top.length;
    while (i > 0 && top[i - 1]!.force < force) i--;
    top.splice(i, 0, { f, force });
    if (top.length > count) top.pop();
  }
  return top.map((t) => t.f);
}

/**
 * The fittings with a bearing block whose passive margin (resistance over thrust) is least, least
 * first; ties in route order, as a stable sort would give them. One pass, as `largestThrusts`.
 */
export function tightestMargins(analysis: Analysis, count: number): FittingAnalysis[] {
  const top: { f: FittingAnalysis; ratio: number }[] = [];
  if (count <= 0) return [];
  for (const f of analysis.fittings) {
    const block = f.restraint.block;
    if (!block) continue;
    const ratio = block.passiveRatio;
    if (top.length === count && ratio >= top[count - 1]!.ratio) continue;
    let i = top.length;
    while (i > 0 && top[i - 1]!.ratio > ratio) i--;
    top.splice(i, 0, { f, ratio });
    if (top.length > count) top.pop();
  }
  return top.map((t) => t.f);
}

/** Length of one pipe, m, node to node in 3-D, as the analysis measured it. */
export const pipeLength = (analysis: Analysis, pipe: { id: string; from: string }): number =>
  analysis.legs.get(pipe.from)?.find((l) => l.pipe.id === pipe.id)?.length ?? 0;

const lengths = new WeakMap<Analysis['legs'], number>();

/**
 * Length of the whole network, m: every pipe once (each appears as two legs). Worked out once per legs
 * map: a load-case edit keeps the analysis's legs, so a pressure change does not add them up again.
 */
export function networkLength(analysis: Analysis): number {
  let sum = lengths.get(analysis.legs);
  if (sum === undefined) {
    sum = 0;
    for (const legs of analysis.legs.values()) for (const l of legs) sum += l.length;
    sum /= 2;
    lengths.set(analysis.legs, sum);
  }
  return sum;
}

const pieceCounts = keptPer<Project['pipes'], number>();

/** How many separate pieces the route is in, worked out again only when its nodes or pipes change. */
const pieceCount = (project: Project): number =>
  pieceCounts(project.pipes, [project.nodes], () => routePieces(project).length);

/** The route in numbers, as the summary panel shows it with nothing selected. */
export interface RouteSummaryFigures {
  /** m, every pipe once */
  length: number;
  /** the six fittings with the largest governing thrust, largest first */
  ranked: FittingAnalysis[];
  /** pieces of the network that are not joined to each other */
  pieces: number;
  /** fittings with a finding above information */
  warned: number;
}

const summaries = new WeakMap<Analysis, RouteSummaryFigures>();

/** The summary figures of an analysis, worked out once (opening a long route does it before the first render). */
export function routeSummary(analysis: Analysis): RouteSummaryFigures {
  let s = summaries.get(analysis);
  if (!s) {
    s = {
      length: networkLength(analysis),
      ranked: largestThrusts(analysis, 6),
      pieces: pieceCount(analysis.project),
      warned: analysis.fittings.filter((f) => f.diagnostics.some((d) => d.severity !== 'info')).length,
    };
    summaries.set(analysis, s);
  }
  return s;
}
