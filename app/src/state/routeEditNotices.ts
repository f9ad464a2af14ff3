import type { Project } from '@mainbrace/solver';
import type { Notice } from './store.js';

/** A run drawn apart from the main: it is sized on its own, and how to join it. */
export const separateRunNotice = (pieces: number): Notice => ({
  tone: 'warning',
  title: `That run is not connected to the rest of the main (the route is now ${pieces} separate pieces)`,
  lines: [
    'Each piece is sized on its own, with a dead-end block at every free end.',
    'To join it, undo (Ctrl+Z) and draw it again starting or ending on a node or pipe: the plan rings what a click would join.',
  ],
});

/** What a delete took away, and that undo brings it back. */
export function deletedNotice(before: Project, after: Project): Notice {
  const nodes = before.nodes.length - after.nodes.length;
  const pipes = before.pipes.length - after.pipes.length;
  return {
    tone: 'info',
    title: `Deleted ${nodes} node${nodes === 1 ? '' : 's'} and ${pipes} pipe${pipes === 1 ? '' : 's'} — Ctrl+Z brings them back`,
    lines: [],
  };
}
