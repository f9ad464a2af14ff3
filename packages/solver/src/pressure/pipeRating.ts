import { findSize } from '../catalog/catalog.js';
import type { PressureRating } from '../catalog/pipeSeries.js';
import { diagnostic, type Diagnostic, type DiagnosticCode } from '../diagnostics/diagnostic.js';
import type { LoadCase, Pipe, Project } from '../model/projectSchema.js';
import { pressureAt } from './nodePressure.js';

/** The rating of a pipe taken from the catalogue (series and nominal size), or null for custom diameters. */
export function pipeRating(pipe: Pipe): PressureRating | null {
  if (!pipe.series || !pipe.nominal) return null;
  return findSize(pipe.series, pipe.nominal)?.rating ?? null;
}

/**
 * The limit a case is held to, with the code reported when it is exceeded: a working case against
 * the working rating, a field test against the test limit, and a surge case, or a case of no stated
 * kind, against working + surge (the case then stands for the highest transient the pipe sees).
 */
export function caseLimit(rating: PressureRating, kind: LoadCase['kind']): { limit: number; code: DiagnosticCode } {
  if (kind === 'working') return { limit: rating.working, code: 'pipe.over-working-rating' };
  if (kind === 'test') return { limit: rating.test, code: 'pipe.over-test-rating' };
  return { limit: rating.withSurge, code: 'pipe.over-surge-rating' };
}

/**
 * Every case against the rating of every catalogue pipe: the pressure along a straight pipe is
 * linear in elevation, so its highest value is at the lower end (hydrostatics, pressureAt). Over the
 * limit is an error on the pipe and case.
 */
export function pipeRatingChecks(project: Project): Diagnostic[] {
  const out: Diagnostic[] = [];
  const elevation = new Map(project.nodes.map((n) => [n.id, n.elevation]));
  const rho = project.water.density;
  for (const pipe of project.pipes) {
    const rating = pipeRating(pipe);
    const ends = [elevation.get(pipe.from), elevation.get(pipe.to)].filter((z): z is number => z !== undefined);
    if (!rating || ends.length === 0) continue;
    for (const c of project.loadCases) {
      const pressure = Math.max(...ends.map((z) => pressureAt(c, z, rho)));
      const { limit, code } = caseLimit(rating, c.kind);
      if (pressure > limit * (1 + 1e-9)) out.push(diagnostic(code, { pipe: pipe.id, case: c.id }, { pressure, limit }));
    }
  }
  return out;
}
