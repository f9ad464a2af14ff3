import { useId, useState } from 'react';
import type { Dimension, UnitSystem } from '@mainbrace/solver';
import { show, unitOf } from '../format/quantity.js';
import { editable, parseTyped } from '../format/typedQuantity.js';

export interface NumberFieldProps {
  label: string;
  /** SI value */
  value: number;
  dimension: Dimension;
  units: UnitSystem;
  /**
   * receives the new SI value; only called with a value that passed the checks. It may return the
   * lines of the document's refusal of the value, shown at the field like a refusal of its own.
   */
  onCommit: (si: number) => void | readonly string[];
  /** SI bounds; a value outside is refused with a message naming the bound */
  min?: number;
  max?: number;
  /** the bound itself is not allowed */
  exclusiveMin?: boolean;
  hint?: string;
  testId?: string;
  /** a table cell: the label is for screen readers only and the unit is in the column's heading */
  compact?: boolean;
}

/**
 * A number typed in display units with its unit beside it. A bad entry is refused at the field with a
 * message saying what was expected, and the document keeps its value. Enter or leaving the field
 * commits; Escape restores the value.
 */
export function NumberField(p: NumberFieldProps) {
  const id = useId();
  const [text, setText] = useState(editable(p.value, p.dimension, p.units));
  const [error, setError] = useState<string | null>(null);
  // A new value from the document (undo, another field, a unit switch) replaces what is shown.
  const source = `${p.value}|${p.dimension}|${p.units}`;
  const [shownSource, setShownSource] = useState(source);
  if (shownSource !== source) {
    setShownSource(source);
    setText(editable(p.value, p.dimension, p.units));
    setError(null);
  }

  const commit = () => {
    // Leaving a field that was not changed must not rewrite the value (display rounding) or add an undo step.
    if (text === editable(p.value, p.dimension, p.units)) return setError(null);
    const r = parseTyped(text, p.dimension, p.units);
    if (!r.ok) return setError(`${p.label}: ${r.message}`);
    if (p.min !== undefined && (p.exclusiveMin ? r.si <= p.min : r.si < p.min)) {
      return setError(
        `${p.label}: must be ${p.exclusiveMin ? 'more than' : 'at least'} ${show(p.min, p.dimension, p.units, 4)}`,
      );
    }
    if (p.max !== undefined && r.si > p.max)
      return setError(`${p.label}: must be at most ${show(p.max, p.dimension, p.units, 4)}`);
    setError(null);
    if (Math.abs(r.si - p.value) <= 1e-12 * Math.max(1, Math.abs(p.value))) return;
    const refused = p.onCommit(r.si);
    if (refused && refused.length > 0) setError(refused.join(' '));
  };
  const unit = unitOf(p.dimension, p.units);
  return (
    <div className={`field ${p.compact ? 'field-compact' : ''} ${error ? 'field-bad' : ''}`}>
      <label htmlFor={id} className={p.compact ? 'visually-hidden' : undefined}>
        {p.label}
      </label>
      <div className="field-input">
        <input
          id={id}
          inputMode="decimal"
          value={text}
          aria-invalid={error !== null}
          aria-describedby={error ? `${id}-err` : undefined}
          data-testid={p.testId}
          onChange={(e) => setText(e.target.value)}
          onBlur={commit}
          onKeyDown={(e) => {
            if (e.key === 'Enter') commit();
            if (e.key === 'Escape') {
              setText(editable(p.value, p.dimension, p.units));
              setError(null);
            }
          }}
        />
        {unit && !p.compact && <span className="unit">{unit}</span>}
      </div>
      {error && (
        <div className="field-error" id={`${id}-err`} role="alert">
          {error}
        </div>
      )}
      {p.hint && !error && <div className="field-hint">{p.hint}</div>}
    </div>
  );
}
