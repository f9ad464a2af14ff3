import { useEffect, useRef, useState } from 'react';
import { useActions, useApp, useAppStore } from '../state/StoreContext.js';
import { describeEntry, parseEntry } from '../format/typedEntry.js';
import { sendPlanEvent } from '../tools/planBridge.js';
import type { PlanEvent } from '../tools/planInput.js';

/**
 * Typed input while drawing: a length (with a turn or a bearing) or coordinates, then Enter places
 * the next node exactly. The entry is the dispatcher's state (a digit typed over the plan starts it);
 * this box shows it, takes the keyboard, and says what Enter will do or what was expected.
 */
export function TypedEntryBox() {
  const tool = useApp((s) => s.tool);
  const drawing = useApp((s) => s.draw.phase === 'drawing');
  const units = useApp((s) => s.units);
  const text = useApp((s) => s.typed);
  const error = useApp((s) => s.typedError);
  const store = useAppStore();
  const actions = useActions();
  const input = useRef<HTMLInputElement>(null);
  const [focused, setFocused] = useState(false);
  const send = (e: PlanEvent) => sendPlanEvent(store, actions, e);

  // A key typed over the plan started an entry: the keyboard moves here to go on with it.
  useEffect(() => {
    const el = input.current;
    if (!el || text === '' || document.activeElement === el) return;
    el.focus();
    el.setSelectionRange(text.length, text.length);
  }, [text]);

  if (tool !== 'draw') return null;
  const parsed = text.trim() ? parseEntry(text, units) : null;
  const help =
    error ??
    (parsed
      ? parsed.ok
        ? `Enter: ${describeEntry(parsed.entry, units)}`
        : parsed.message
      : drawing
        ? 'A length (12.5), a turn (12.5 L30, R15), a bearing (12.5 @90, N45E) or coordinates (E 120 N 340); Enter places the node, Enter on empty finishes'
        : 'Coordinates (E 120 N 340) start a run there');
  const showHelp = error !== null || parsed !== null || focused;

  return (
    <div className="plan-typed" onPointerDown={(e) => e.stopPropagation()} onDoubleClick={(e) => e.stopPropagation()}>
      <label htmlFor="typed-entry">{drawing ? 'Next node' : 'Start at'}</label>
      <input
        id="typed-entry"
        ref={input}
        value={text}
        autoComplete="off"
        spellCheck={false}
        placeholder={drawing ? 'type 12.5, 12.5 L30, 12.5 @90…' : 'type E 120 N 340, or click'}
        aria-describedby={showHelp ? 'typed-entry-help' : undefined}
        aria-invalid={error !== null}
        data-testid="typed-entry"
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        onChange={(e) => send({ type: 'typedText', text: e.target.value })}
        onKeyDown={(e) => {
          if (e.key === 'Enter') {
            e.preventDefault();
            send({ type: 'typedEnter' });
          } else if (e.key === 'Escape') {
            e.preventDefault();
            if (text) send({ type: 'typedText', text: '' });
            else {
              send({ type: 'command', name: 'cancel' });
              input.current?.blur();
            }
          } else if (e.key === 'Backspace' && text === '') {
            e.preventDefault();
            send({ type: 'command', name: 'delete' }); // removes the last point of the run
          }
        }}
      />
      {showHelp && (
        <div
          id="typed-entry-help"
          className={error ? 'field-error' : 'plan-typed-help'}
          role={error ? 'alert' : undefined}
        >
          {help}
        </div>
      )}
    </div>
  );
}
