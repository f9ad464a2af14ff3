import type { Project } from '../model/projectSchema.js';
import type { Leg } from '../network/legs.js';

/**
 * What an edit changed, from two versions of the document (the store replaces what it edits and keeps
 * the rest, so an unchanged part is the same object):
 * - `same`: nothing the analysis reads;
 * - `cases`: only the load cases — every fitting keeps its geometry and its sums, and is rescaled;
 * - `route`: nodes or pipes — only the `dirty` nodes (those edited, their pipes' ends, their neighbours
 *   before and after) need their legs, geometry, thrust and restraint again;
 * - `all`: water, design or soils, which every fitting reads.
 */
export type RouteChange =
  { kind: 'same' } | { kind: 'cases' } | { kind: 'route'; dirty: Set<string>; cases: boolean } | { kind: 'all' };

export function routeChange(
  before: Project,
  after: Project,
  legsBefore: ReadonlyMap<string, readonly Leg[]>,
): RouteChange {
  if (before.water !== after.water || before.design !== after.design) return { kind: 'all' };
  if (before.soils !== after.soils || before.defaultSoil !== after.defaultSoil) return { kind: 'all' };
  const cases = before.loadCases !== after.loadCases;
  if (before.nodes === after.nodes && before.pipes === after.pipes) return cases ? { kind: 'cases' } : { kind: 'same' };

  const dirty = new Set<string>();
  const oldNodes = new Map(before.nodes.map((n) => [n.id, n]));
  const changedNodes = new Set<string>();
  const seen = new Set<string>();
  for (const n of after.nodes) {
    seen.add(n.id);
    if (oldNodes.get(n.id) !== n) changedNodes.add(n.id);
  }
  for (const n of before.nodes) if (!seen.has(n.id)) changedNodes.add(n.id);

  // Legs are listed in pipe order: if the pipes that stay were reordered, rebuild everything.
  const oldPipes = new Map(before.pipes.map((p, i) => [p.id, { pipe: p, index: i }]));
  const newIds = new Set<string>();
  let last = -1;
  for (const p of after.pipes) {
    newIds.add(p.id);
    const old = oldPipes.get(p.id);
    if (!old) {
      dirty.add(p.from).add(p.to);
      continue;
    }
    if (old.index < last) return { kind: 'all' };
    last = old.index;
    if (old.pipe !== p) dirty.add(p.from).add(p.to).add(old.pipe.from).add(old.pipe.to);
  }
  for (const p of before.pipes) if (!newIds.has(p.id)) dirty.add(p.from).add(p.to);

  // A moved node turns the pipes at its neighbours: they are recomputed too.
  for (const id of changedNodes) {
    dirty.add(id);
    for (const l of legsBefore.get(id) ?? []) dirty.add(l.far.id);
  }
  for (const p of after.pipes) {
    if (changedNodes.has(p.from)) dirty.add(p.to);
    if (changedNodes.has(p.to)) dirty.add(p.from);
  }
  return { kind: 'route', dirty, cases };
}
