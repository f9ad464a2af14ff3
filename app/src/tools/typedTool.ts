import { hitTest } from '../plan/hitTest.js';
import { parseEntry } from '../format/typedEntry.js';
import { drawWith } from './drawPointer.js';
import { TYPED_JOIN, typedStep } from './typedPoint.js';
import type { PlanInput, PlanOutcome } from './planInput.js';

/** Keys that, pressed over the plan with the draw tool, start a typed entry: a number or coordinates. */
export const STARTS_ENTRY = /^[0-9.@eE]$/;

/** A key that starts or extends the typed entry, or null when the key is not one. */
export function typedKey(s: PlanInput, key: string, modified: boolean): PlanInput | null {
  if (s.tool !== 'draw' || modified || !STARTS_ENTRY.test(key)) return null;
  return { ...s, typed: s.typed + key, typedError: null };
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
  return {
    state: { ...s, draw: r.state, typed: '', typedError: null },
    intents: r.commit ? [{ kind: 'addRun', ...r.commit }] : [],
  };
}
