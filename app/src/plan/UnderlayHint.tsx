import { useApp } from '../state/StoreContext.js';

/** While points are picked to calibrate the site plan: what to click, and Esc to stop (the dispatcher's keys). */
export function UnderlayHint() {
  const picks = useApp((s) => s.underlayPick);
  if (picks === null || picks.length >= 2) return null;
  return (
    <div className="plan-hint plan-hint-pick" role="status" data-testid="pick-hint">
      Calibrating the site plan: click point {picks.length + 1} of 2 on the image (zoom in for precision) · Esc stops
    </div>
  );
}
