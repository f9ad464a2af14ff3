import { useEffect } from 'react';
import { useActions, useApp } from '../state/StoreContext.js';

/** While points are picked to calibrate the site plan: what to click, and Esc to stop. */
export function UnderlayHint() {
  const picks = useApp((s) => s.underlayPick);
  const actions = useActions();
  const picking = picks !== null && picks.length < 2;
  useEffect(() => {
    if (!picking) return;
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && actions.cancelUnderlayPick();
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [picking, actions]);
  if (!picking) return null;
  return (
    <div className="plan-hint plan-hint-pick" role="status" data-testid="pick-hint">
      Calibrating the site plan: click point {picks.length + 1} of 2 on the image (zoom in for precision) · Esc stops
    </div>
  );
}
