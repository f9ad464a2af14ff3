import type { z } from 'zod';
import type { Project } from './projectSchema.js';
import { norm } from '../geometry/vector.js';

type Ctx = z.core.$RefinementCtx<Project>;

function uniqueIds(items: readonly { id: string }[], list: string, ctx: Ctx) {
  const seen = new Map<string, number>();
  items.forEach((item, i) => {
    const first = seen.get(item.id);
    if (first !== undefined) {
      ctx.addIssue({
        code: 'custom',
        path: [list, i, 'id'],
        message: `duplicate id "${item.id}" (already used by ${list}[${first}])`,
      });
    } else seen.set(item.id, i);
  });
}

/** Minimum distance between a pipe's two ends, m: below this the pipe has no direction. */
export const MIN_PIPE_LENGTH = 0.001;

/** Checks that span several fields: unique ids, references that resolve, sane pipes. */
export function crossCheck(p: Project, ctx: Ctx): void {
  uniqueIds(p.loadCases, 'loadCases', ctx);
  uniqueIds(p.soils, 'soils', ctx);
  uniqueIds(p.nodes, 'nodes', ctx);
  uniqueIds(p.pipes, 'pipes', ctx);

  const soilIds = new Set(p.soils.map((s) => s.id));
  if (p.defaultSoil !== undefined && !soilIds.has(p.defaultSoil)) {
    ctx.addIssue({
      code: 'custom',
      path: ['defaultSoil'],
      message: `must name a soil in "soils" (no soil "${p.defaultSoil}")`,
    });
  }
  const nodes = new Map(p.nodes.map((n) => [n.id, n]));
  p.nodes.forEach((n, i) => {
    if (n.soil !== undefined && !soilIds.has(n.soil)) {
      ctx.addIssue({
        code: 'custom',
        path: ['nodes', i, 'soil'],
        message: `must name a soil in "soils" (no soil "${n.soil}")`,
      });
    }
  });
  p.pipes.forEach((pipe, i) => {
    const a = nodes.get(pipe.from);
    const b = nodes.get(pipe.to);
    if (!a)
      ctx.addIssue({
        code: 'custom',
        path: ['pipes', i, 'from'],
        message: `must name a node in "nodes" (no node "${pipe.from}")`,
      });
    if (!b)
      ctx.addIssue({
        code: 'custom',
        path: ['pipes', i, 'to'],
        message: `must name a node in "nodes" (no node "${pipe.to}")`,
      });
    if (pipe.from === pipe.to) {
      ctx.addIssue({
        code: 'custom',
        path: ['pipes', i, 'to'],
        message: 'must differ from "from" (a pipe joins two nodes)',
      });
    } else if (a && b && norm([a.x - b.x, a.y - b.y, a.elevation - b.elevation]) < MIN_PIPE_LENGTH) {
      ctx.addIssue({
        code: 'custom',
        path: ['pipes', i, 'to'],
        message: `must be at another point than "from" (nodes ${a.id} and ${b.id} coincide)`,
      });
    }
    if (pipe.insideDiameter >= pipe.outsideDiameter) {
      ctx.addIssue({
        code: 'custom',
        path: ['pipes', i, 'insideDiameter'],
        message: `must be less than outsideDiameter (${pipe.outsideDiameter} m)`,
      });
    }
  });
}
