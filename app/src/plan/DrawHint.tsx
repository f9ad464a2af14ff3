import { useApp } from '../state/StoreContext.js';

/** What a click does with the draw tool, at the top of the plan. */
export function DrawHint() {
  const tool = useApp((s) => s.tool);
  const drawing = useApp((s) => s.draw.phase === 'drawing');
  const hoverKind = useApp((s) => s.hover.kind);
  const hasRoute = useApp((s) => s.project.nodes.length > 0);
  if (tool !== 'draw') return null;
  return (
    <div className="plan-hint" role="status">
      {drawing
        ? 'Click to add a bend · click a node or pipe to join it · Enter or double-click to finish · Backspace removes the last point · Esc cancels · hold Alt to place off the snap'
        : hasRoute && hoverKind === 'none'
          ? 'A click here starts a separate run, not joined to the main — move onto a node or pipe (it is ringed) to branch from it'
          : 'Click to start a run — on a node to branch from it, on a pipe to split it into a tee'}
    </div>
  );
}
