import type { z } from 'zod';
import type { Project } from './projectSchema.js';
import { norm } from '../geometry/vector.js';
import { pathText, type Problem } from './problems.js';
import { caseName } from './caseLabel.js';
import { MIN_PIPE_LENGTH, OVERLAP_ANGLE, pipeBelowGround, type Add } from './routeRules.js';

type Ctx = z.core.$RefinementCtx<Project>;

/** Each item whose key an earlier item already has, with that earlier item's index. */
function repeats<T>(
  items: readonly T[],
  key: (item: T) => string,
  found: (i: number, first: number, k: string) => void,
) {
  const seen = new Map<string, number>();
  items.forEach((item, i) => {
    const k = key(item);
    const first = seen.get(k);
    if (first === undefined) seen.set(k, i);
    else found(i, first, k);
  });
}

function uniqueIds(items: readonly { id: string }[], list: string, ctx: Pick<Ctx, 'addIssue'>) {
  repeats(
    items,
    (item) => item.id,
    (i, first, id) =>
      ctx.addIssue({
        code: 'custom',
        path: [list, i, 'id'],
        message: `duplicate id "${id}" (already used by ${list}[${first}])`,
      }),
  );
}

/**
 * Each case is read by its name (caseLabel.ts) on every screen and sheet: two cases of one name would
 * make "governed by" ambiguous.
 */
function uniqueCaseNames(cases: Project['loadCases'], ctx: Pick<Ctx, 'addIssue'>) {
  repeats(cases, caseName, (i, first, name) =>
    ctx.addIssue({
      code: 'custom',
      path: ['loadCases', i, cases[i]!.label === undefined ? 'id' : 'label'],
      message: `"${name}" already names loadCases[${first}]: give each case a name of its own`,
    }),
  );
}

/** Nodes standing at one point (within MIN_PIPE_LENGTH) but not joined by a pipe. */
function coincidentNodes(p: Project, add: Add) {
  const cell = (v: number) => Math.floor(v / MIN_PIPE_LENGTH);
  const grid = new Map<string, number[]>();
  const joined = new Set(p.pipes.map((x) => `${x.from}\u0000${x.to}`));
  p.nodes.forEach((n, i) => {
    const [cx, cy, cz] = [cell(n.x), cell(n.y), cell(n.elevation)];
    for (let dx = -1; dx <= 1; dx++)
      for (let dy = -1; dy <= 1; dy++)
        for (let dz = -1; dz <= 1; dz++) {
          for (const j of grid.get(`${cx + dx},${cy + dy},${cz + dz}`) ?? []) {
            const m = p.nodes[j]!;
            const near = norm([n.x - m.x, n.y - m.y, n.elevation - m.elevation]) < MIN_PIPE_LENGTH;
            if (near && !joined.has(`${n.id}\u0000${m.id}`) && !joined.has(`${m.id}\u0000${n.id}`)) {
              add(
                ['nodes', i],
                `stands at the same point as nodes[${j}] ("${m.id}") but is not joined to it: merge the two nodes or move one`,
              );
            }
          }
        }
    const key = `${cx},${cy},${cz}`;
    grid.set(key, [...(grid.get(key) ?? []), i]);
  });
}

/**
 * A second pipe between the same two nodes, and two pipes leaving a node along the same line. Plain
 * loops over numbers (a 10,000-pipe file is checked on every command-line run and every edit): the
 * directions leaving each node are kept as flat lists of pipe index and unit vector.
 */
export function overlappingPipes(p: Project, add: Add) {
  const nodes = new Map<string, Project['nodes'][number]>();
  for (const n of p.nodes) nodes.set(n.id, n);
  const pairs = new Map<string, number>();
  const leaving = new Map<string, number[]>();
  const limit = Math.cos((OVERLAP_ANGLE * Math.PI) / 180);
  const leave = (i: number, id: string, x: number, y: number, z: number) => {
    let list = leaving.get(id);
    if (!list) leaving.set(id, (list = []));
    for (let k = 0; k < list.length; k += 4) {
      const cos = list[k + 1]! * x + list[k + 2]! * y + list[k + 3]! * z;
      if (cos > limit) {
        const other = list[k]!;
        add(
          ['pipes', i],
          `leaves node "${id}" along the same line as pipes[${other}] ("${p.pipes[other]!.id}"): the two lie on top of each other (is the route folded back on itself?)`,
        );
      }
    }
    list.push(i, x, y, z);
  };
  for (let i = 0; i < p.pipes.length; i++) {
    const pipe = p.pipes[i]!;
    // the two ids in code-unit order, as [from, to].sort() puts them
    const key = pipe.from < pipe.to ? `${pipe.from}\u0000${pipe.to}` : `${pipe.to}\u0000${pipe.from}`;
    const first = pairs.get(key);
    if (first !== undefined) {
      add(
        ['pipes', i],
        `joins the same two nodes as pipes[${first}] ("${p.pipes[first]!.id}"): one pipe between two nodes`,
      );
      continue;
    }
    pairs.set(key, i);
    const a = nodes.get(pipe.from);
    const b = nodes.get(pipe.to);
    if (!a || !b || pipe.from === pipe.to) continue;
    const dx = b.x - a.x;
    const dy = b.y - a.y;
    const dz = b.elevation - a.elevation;
    const len = norm([dx, dy, dz]);
    if (len < MIN_PIPE_LENGTH) continue;
    const ux = dx / len;
    const uy = dy / len;
    const uz = dz / len;
    leave(i, a.id, ux, uy, uz);
    leave(i, b.id, -ux, -uy, -uz);
  }
}

/** Checks that span several fields: unique ids, references that resolve, sane pipes. */
export function crossCheck(p: Project, ctx: Ctx): void {
  referenceChecks(p, ctx);
  const add: Add = (path, message) => ctx.addIssue({ code: 'custom', path, message });
  pipeBelowGround(p, add);
  coincidentNodes(p, add);
  overlappingPipes(p, add);
}

/** Unique ids and case names, references that resolve, pipes joining two distinct points with ID below OD. */
export function referenceChecks(p: Project, ctx: Pick<Ctx, 'addIssue'>): void {
  uniqueIds(p.loadCases, 'loadCases', ctx);
  uniqueCaseNames(p.loadCases, ctx);
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

/**
 * The geometric checks alone (coincident nodes, overlapping pipes), without the rest of the schema:
 * cheap enough for an editor to run on every edit of a document that is otherwise valid.
 */
export function geometryProblems(p: Project): Problem[] {
  const out: Problem[] = [];
  const add: Add = (path, message) => out.push({ path: pathText(path), message });
  coincidentNodes(p, add);
  overlappingPipes(p, add);
  return out;
}
