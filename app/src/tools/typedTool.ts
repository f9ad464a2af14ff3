import { hitTest } from '../plan/hitTest.js';
import { parseEntry } from '../format/typedEntry.js';
import { drawWith } from './drawPointer.js';
import { TYPED_JOIN, typedStep } from './typedPoint.js';
import type { PlanInput, PlanOutcome } from './planInput.js';
import { revealPoint } from './planView.js';

/** Keys that, pressed over the plan with the draw tool, start a typed entry: a number or coordinates. */
export const STARTS_ENTRY = /^[0-9.@eE]$/;

/**
 * A key over the plan that starts or goes on with the typed entry, or null when the key is not one. Once
 * an entry has begun, every character is its own, Backspace takes one back and Enter places it: keys
 * typed before the box has the keyboard (its code loads with the draw tool) still reach the entry, in order.
 */
export function typedKey(s: PlanInput, key: string, modified: boolean): PlanOutcome | null {
  if (s.tool !== 'draw' || modified) return null;
  if (s.typed === '')
    return STARTS_ENTRY.test(key) ? { state: { ...s, typed: key, typedError: null }, intents: [] } : null;
  if (key.length === 1) return { state: { ...s, typed: s.typed + key, typedError: null }, intents: [] };
  if (key === 'Backspace') return { state: { ...s, typed: s.typed.slice(0, -1), typedError: null }, intents: [] };
  if (key === 'Enter') return typedEnter(s);
  if (key === 'Escape') return { state: { ...s, typed: '', typedError: null }, intents: [] };
  return null;
}

/**
 * Enter on the typed entry: an empty entry finishes the run; otherwise the node it describes is placed
 * exactly (no snapping), or the entry stays with the reason it was not placed.
 */
export function typedEnter(s: PlanInput): PlanOutcome {
  if (s.typed.trim() === '') {
    const r = s.draw.phase === 'drawing' ? drawWith(s, { type: 'finish' }) : { state: s, intents: [] };
    return { ...r, state: { ...r.state, typedError: null } };
  }
  const parsed = parseEntry(s.typed, s.units);
  if (!parsed.ok) return { state: { ...s, typedError: parsed.message }, intents: [] };
  const r = typedStep(s.draw, parsed.entry, (at) => hitTest(s.project, at, TYPED_JOIN));
  if (!r.ok) return { state: { ...s, typedError: r.message }, intents: [] };
  const placed = { ...s, draw: r.state, typed: '', typedError: null };
  // A leg typed off the screen's edge is followed: the node just placed is brought into view.
  const last = r.state.phase === 'drawing' ? (r.state.vertices.at(-1) ?? r.state.startPoint) : null;
  return {
    state: last ? revealPoint(placed, last) : placed,
    intents: r.commit ? [{ kind: 'addRun', ...r.commit }] : [],
  };
}
