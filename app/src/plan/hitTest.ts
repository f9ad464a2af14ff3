import type { Project } from '@mainbrace/solver';
import type { PlanPoint } from '../state/documentEdits.js';
import { NO_HIT, type Hit } from '../tools/hit.js';

/**
 * What lies under a plan point: the nearest node within `tolerance` metres, else the nearest pipe
 * within it (with the point on the pipe nearest the pointer), else nothing.
 */
export function hitTest(project: Project, at: PlanPoint, tolerance: number): Hit {
  let best: Hit = NO_HIT;
  let bestDistance = tolerance;
  for (const n of project.nodes) {
    const d = Math.hypot(n.x - at.x, n.y - at.y);
    if (d <= bestDistance) {
      bestDistance = d;
      best = { kind: 'node', id: n.id, at: { x: n.x, y: n.y } };
    }
  }
  if (best.kind === 'node') return best;
  const nodes = new Map(project.nodes.map((n) => [n.id, n]));
  bestDistance = tolerance;
  for (const p of project.pipes) {
    const a = nodes.get(p.from);
    const b = nodes.get(p.to);
    if (!a || !b) continue;
    const dx = b.x - a.x;
    const dy = b.y - a.y;
    const t = Math.min(1, Math.max(0, ((at.x - a.x) * dx + (at.y - a.y) * dy) / (dx * dx + dy * dy || 1)));
    const q = { x: a.x + t * dx, y: a.y + t * dy };
    const d = Math.hypot(q.x - at.x, q.y - at.y);
    if (d <= bestDistance) {
      bestDistance = d;
      best = { kind: 'pipe', id: p.id, at: q };
    }
  }
  return best;
}

/** Nodes and pipes wholly inside a plan rectangle (box select). */
export function inBox(project: Project, from: PlanPoint, to: PlanPoint): { nodes: string[]; pipes: string[] } {
  const x0 = Math.min(from.x, to.x),
    x1 = Math.max(from.x, to.x);
  const y0 = Math.min(from.y, to.y),
    y1 = Math.max(from.y, to.y);
  const inside = new Set(
    project.nodes.filter((n) => n.x >= x0 && n.x <= x1 && n.y >= y0 && n.y <= y1).map((n) => n.id),
  );
  return {
    nodes: [...inside],
    pipes: project.pipes.filter((p) => inside.has(p.from) && inside.has(p.to)).map((p) => p.id),
  };
}
