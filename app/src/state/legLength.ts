import type { Project } from '@mainbrace/solver';
import { moveNodes } from './documentEdits.js';

/** Plan (horizontal) length of a pipe, m: what a typed length and the length field set. */
export function planLength(project: Project, pipeId: string): number {
  const pipe = project.pipes.find((p) => p.id === pipeId);
  const a = pipe && project.nodes.find((n) => n.id === pipe.from);
  const b = pipe && project.nodes.find((n) => n.id === pipe.to);
  return a && b ? Math.hypot(b.x - a.x, b.y - a.y) : 0;
}

/**
 * Sets a pipe's plan length by moving one of its nodes along the pipe, away from or toward the
 * other (which stays). Other pipes at the moved node follow it; elevations are unchanged. Returns
 * the project unchanged for a length of zero or less, or a move the document would refuse.
 */
export function setPlanLength(project: Project, pipeId: string, length: number, moving: 'from' | 'to'): Project {
  const pipe = project.pipes.find((p) => p.id === pipeId);
  if (!pipe || !(length > 0)) return project;
  const fixed = project.nodes.find((n) => n.id === (moving === 'to' ? pipe.from : pipe.to));
  const moved = project.nodes.find((n) => n.id === (moving === 'to' ? pipe.to : pipe.from));
  if (!fixed || !moved) return project;
  const dx = moved.x - fixed.x;
  const dy = moved.y - fixed.y;
  const now = Math.hypot(dx, dy);
  if (now === 0) return project;
  const k = length / now;
  return moveNodes(project, new Map([[moved.id, { x: fixed.x + dx * k, y: fixed.y + dy * k }]]));
}
