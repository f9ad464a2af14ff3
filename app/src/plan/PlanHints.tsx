import { memo } from 'react';
import { NoticeBar } from '../chrome/NoticeBar.js';
import { useApp } from '../state/StoreContext.js';
import { lazyPart } from '../chrome/lazyPart.js';
import { TypedEntryBox } from './TypedEntryPart.js';

/** What a click does with the draw tool: its words load after the first screen, which never shows them. */
const DrawHintText = lazyPart(() => import('./DrawHint.js').then((m) => m.DrawHint));
function DrawHint() {
  return useApp((s) => s.tool) === 'draw' ? <DrawHintText /> : null;
}

/** What to click while the site plan is calibrated: its words load after the first screen too. */
const UnderlayHintText = lazyPart(() => import('./UnderlayHint.js').then((m) => m.UnderlayHint));
function UnderlayHint() {
  return useApp((s) => s.underlayPick !== null && s.underlayPick.length < 2) ? <UnderlayHintText /> : null;
}

/**
 * The notice, the hints and the typed-entry box stack down from the top of the plan: a notice or a hint
 * that wraps on a narrow plan pushes what is below it down instead of covering it (a notice that stays
 * until dismissed must not hide the typed-entry box while a run is drawn). They lie over the plan, never
 * resizing it, and read the store themselves, so a redraw of the plan (every test-pressure change) does
 * not render them again. A press on them is theirs, not the plan's.
 */
export const PlanHints = memo(function PlanHints() {
  return (
    <div className="plan-top" onPointerDown={(e) => e.stopPropagation()} onDoubleClick={(e) => e.stopPropagation()}>
      <NoticeBar />
      <DrawHint />
      <UnderlayHint />
      <TypedEntryBox />
    </div>
  );
});
