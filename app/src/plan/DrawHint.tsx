import { useApp } from '../state/StoreContext.js';

/** A finger has no Enter key, no Alt and no hover: the hint speaks of taps and the buttons instead. */
const touch = () => typeof matchMedia === 'function' && matchMedia('(pointer: coarse)').matches;

/** What a click (or a tap) does with the draw tool, at the top of the plan. */
export function DrawHint() {
  const tool = useApp((s) => s.tool);
  const drawing = useApp((s) => s.draw.phase === 'drawing');
  const hoverKind = useApp((s) => s.hover.kind);
  const hasRoute = useApp((s) => s.project.nodes.length > 0);
  if (tool !== 'draw') return null;
  const finger = touch();
  return (
    <div className="plan-hint" role="status">
      {drawing
        ? finger
          ? 'Tap to add a bend · tap a node or pipe to join it · Finish run when done · Cancel drops the run'
          : 'Click to add a bend · click a node or pipe to join it · Enter or double-click to finish · Backspace removes the last point · Esc cancels · hold Alt to place off the snap'
        : finger
          ? 'Tap to start a run — on a node to branch from it, on a pipe to split it into a tee'
          : hasRoute && hoverKind === 'none'
            ? 'A click here starts a separate run, not joined to the main — move onto a node or pipe (it is ringed) to branch from it'
            : 'Click to start a run — on a node to branch from it, on a pipe to split it into a tee'}
    </div>
  );
}
