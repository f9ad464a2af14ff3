import { restraintConcrete, type Analysis, type Restraint } from '@mainbrace/solver';
import type { PlanPoint } from '../state/documentEdits.js';

/** How one fitting's restraint and governing case moved during a live edit (the test-pressure slider). */
export interface LiveChange {
  node: string;
  mark: string;
  at: PlanPoint;
  /** concrete now over concrete before, − 1 (0.25 = a quarter more); null when there was none before */
  growth: number | null;
  /** the governing case before and now, when it changed */
  governing: { from: string; to: string } | null;
}

const concrete = new WeakMap<Restraint, number>();

/** m³ of a restraint, worked out once per restraint object: the gesture's start is read at every step. */
function concreteOf(r: Restraint, step: number): number {
  let v = concrete.get(r);
  if (v === undefined) {
    v = restraintConcrete(r, step);
    concrete.set(r, v);
  }
  return v;
}

/**
 * Each fitting's change against the analysis from before the gesture began: the growth of its block or
 * anchor (by concrete volume) and whether another case now governs it. Fittings that did not change
 * are left out.
 */
export function liveChanges(before: Analysis, now: Analysis): LiveChange[] {
  const out: LiveChange[] = [];
  const stepBefore = before.project.design.dimensionStep;
  const step = now.project.design.dimensionStep;
  for (const f of now.fittings) {
    const b = before.byNode.get(f.node.id);
    if (!b) continue;
    const was = concreteOf(b.restraint, stepBefore);
    const is = restraintConcrete(f.restraint, step);
    const growth = was > 0 ? is / was - 1 : null;
    const from = b.envelope.governing.caseId;
    const to = f.envelope.governing.caseId;
    const governing = from !== to ? { from, to } : null;
    if ((growth === null || Math.abs(growth) < 0.005) && !governing) continue;
    out.push({ node: f.node.id, mark: f.mark, at: { x: f.node.x, y: f.node.y }, growth, governing });
  }
  return out;
}
