import { useEffect, useRef, useState } from 'react';
import { useActions, useApp, useAppStore } from '../state/StoreContext.js';
import { describeEntry, parseEntry } from '../format/typedEntry.js';
import { TYPED_JOIN, typedStep } from '../tools/typedPoint.js';
import { drawStep } from '../tools/drawTool.js';
import { hitTest } from './hitTest.js';

/** Keys that start a typed entry when pressed over the plan while drawing: a number or coordinates. */
const STARTS_ENTRY = /^[0-9.@eE]$/;

const typingField = (t: EventTarget | null) =>
  t instanceof HTMLTextAreaElement ||
  t instanceof HTMLSelectElement ||
  (t instanceof HTMLInputElement && !['range', 'checkbox', 'radio', 'button', 'file'].includes(t.type));

/**
 * Typed input while drawing: a length (with a turn or a bearing) or coordinates, then Enter places
 * the next node exactly. Typing a digit over the plan starts an entry; the line below says what
 * Enter will do, or what was expected.
 */
export function TypedEntryBox() {
  const tool = useApp((s) => s.tool);
  const drawing = useApp((s) => s.draw.phase === 'drawing');
  const units = useApp((s) => s.units);
  const store = useAppStore();
  const actions = useActions();
  const input = useRef<HTMLInputElement>(null);
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [focused, setFocused] = useState(false);
  const active = tool === 'draw';

  useEffect(() => {
    if (!active) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.ctrlKey || e.metaKey || e.altKey || typingField(e.target) || !STARTS_ENTRY.test(e.key)) return;
      e.preventDefault();
      e.stopPropagation();
      setText((t) => t + e.key);
      setError(null);
      input.current?.focus();
    };
    window.addEventListener('keydown', onKey, true);
    return () => window.removeEventListener('keydown', onKey, true);
  }, [active]);

  if (!active) return null;
  const parsed = text.trim() ? parseEntry(text, units) : null;

  const step = (type: 'finish' | 'cancel' | 'removeVertex') => {
    const s = store.getState();
    const out = drawStep(s.draw, { type }, { snapping: false, lengthStep: 1, samePoint: 0 });
    actions.setDraw(out.state);
    if (out.commit) actions.addRun(out.commit.start, out.commit.vertices, out.commit.end);
  };

  const enter = () => {
    if (text.trim() === '') return step('finish');
    const s = store.getState();
    const r = parseEntry(text, s.units);
    if (!r.ok) return setError(r.message);
    const out = typedStep(s.draw, r.entry, (at) => hitTest(s.project, at, TYPED_JOIN));
    if (!out.ok) return setError(out.message);
    actions.setDraw(out.state);
    if (out.commit) actions.addRun(out.commit.start, out.commit.vertices, out.commit.end);
    setText('');
    setError(null);
  };

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
        aria-describedby={error || parsed || focused ? 'typed-entry-help' : undefined}
        aria-invalid={error !== null}
        data-testid="typed-entry"
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        onChange={(e) => {
          setText(e.target.value);
          setError(null);
        }}
        onKeyDown={(e) => {
          if (e.key === 'Enter') {
            e.preventDefault();
            enter();
          } else if (e.key === 'Escape') {
            e.preventDefault();
            if (text) setText('');
            else {
              step('cancel');
              input.current?.blur();
            }
            setError(null);
          } else if (e.key === 'Backspace' && text === '') {
            e.preventDefault();
            step('removeVertex');
          }
        }}
      />
      <div
        id="typed-entry-help"
        className={error ? 'field-error' : 'plan-typed-help'}
        role={error ? 'alert' : undefined}
      >
        {error ??
          (parsed
            ? parsed.ok
              ? `Enter: ${describeEntry(parsed.entry, units)}`
              : parsed.message
            : drawing
              ? 'Type a length, a turn (L/R) or bearing (@), or coordinates; Enter places the node, Enter on empty finishes'
              : 'Type coordinates to start a run there')}
      </div>
    </div>
  );
}
