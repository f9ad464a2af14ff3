import { findSize } from '../catalog/catalog.js';
import type { PressureRating } from '../catalog/pipeSeries.js';
import { diagnostic, type Diagnostic, type DiagnosticCode } from '../diagnostics/diagnostic.js';
import type { LoadCase, Pipe, Project, ProjectNode } from '../model/projectSchema.js';
import { pressureAt } from './nodePressure.js';

/** The rating of a pipe taken from the catalogue (series and nominal size), or null for custom diameters. */
export function pipeRating(pipe: Pipe): PressureRating | null {
  if (!pipe.series || !pipe.nominal) return null;
  return findSize(pipe.series, pipe.nominal)?.rating ?? null;
}

/** Which limit of a rating a case of this kind is held to, and the code reported over it. */
function limitOf(kind: LoadCase['kind']): { key: 'working' | 'withSurge' | 'test'; code: DiagnosticCode } {
  if (kind === 'working') return { key: 'working', code: 'pipe.over-working-rating' };
  if (kind === 'test') return { key: 'test', code: 'pipe.over-test-rating' };
  return { key: 'withSurge', code: 'pipe.over-surge-rating' };
}

/**
 * The limit a case is held to, with the code reported when it is exceeded: a working case against
 * the working rating, a field test against the test limit, and a surge case, or a case of no stated
 * kind, against working + surge (the case then stands for the highest transient the pipe sees).
 */
export function caseLimit(rating: PressureRating, kind: LoadCase['kind']): { limit: number; code: DiagnosticCode } {
  const { key, code } = limitOf(kind);
  return { limit: rating[key], code };
}

interface RatedPipe {
  pipe: string;
  rating: PressureRating;
  /** m, the elevation of the pipe's lower end, where its pressure is highest */
  low: number;
}

/** Rated pipes with their low ends, kept while the pipes and nodes arrays stay the same objects. */
const ratedCache = new WeakMap<readonly Pipe[], WeakMap<readonly ProjectNode[], RatedPipe[]>>();

function ratedPipes(project: Project): RatedPipe[] {
  let byNodes = ratedCache.get(project.pipes);
  if (!byNodes) ratedCache.set(project.pipes, (byNodes = new WeakMap()));
  let list = byNodes.get(project.nodes);
  if (list) return list;
  list = [];
  const elevation = new Map(project.nodes.map((n) => [n.id, n.elevation]));
  for (const pipe of project.pipes) {
    const rating = pipeRating(pipe);
    const za = elevation.get(pipe.from);
    const zb = elevation.get(pipe.to);
    if (rating && za !== undefined && zb !== undefined) list.push({ pipe: pipe.id, rating, low: Math.min(za, zb) });
  }
  byNodes.set(project.nodes, list);
  return list;
}

/**
 * Every case against the rating of every catalogue pipe: the pressure along a straight pipe is
 * linear in elevation and highest at its lower end (hydrostatics, pressureAt). Over the limit is an
 * error on the pipe and case. Runs on every edit of a route of thousands of pipes: the pipes' ratings
 * and low ends are kept while pipes and nodes are unchanged, so a change of a case costs one
 * comparison per pipe.
 */
export function pipeRatingChecks(project: Project): Diagnostic[] {
  const out: Diagnostic[] = [];
  const rated = ratedPipes(project);
  if (rated.length === 0) return out;
  const rho = project.water.density;
  for (const c of project.loadCases) {
    const { key, code } = limitOf(c.kind);
    for (const r of rated) {
      const pressure = pressureAt(c, r.low, rho);
      const limit = r.rating[key];
      if (pressure > limit * (1 + 1e-9)) out.push(diagnostic(code, { pipe: r.pipe, case: c.id }, { pressure, limit }));
    }
  }
  return out;
}
