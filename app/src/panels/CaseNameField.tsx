import { useState } from 'react';
import type { LoadCase } from '@mainbrace/solver';
import { useActions, useAppStore } from '../state/StoreContext.js';
import { CASE_FIELDS } from '../format/fieldLabels.js';

/** Another case already read by this name (its label, else its id), if any. */
export function caseNamedAlike(cases: readonly LoadCase[], id: string, name: string): LoadCase | undefined {
  return cases.find((o) => o.id !== id && (o.label ?? o.id) === name);
}

/** `base`, or `base 2`, `base 3`…: the first no other case is named. */
export function freeCaseName(cases: readonly LoadCase[], id: string, base: string): string {
  let name = base;
  for (let n = 2; caseNamedAlike(cases, id, name); n++) name = `${base} ${n}`;
  return name;
}

/**
 * A case's name. Every screen and sheet names the governing case by it, so a name another case already
 * has is not taken: the field keeps what was typed and says why, and goes back to the case's name when
 * left.
 */
export function CaseNameField({ c }: { c: LoadCase }) {
  const actions = useActions();
  const store = useAppStore();
  const [draft, setDraft] = useState<string | null>(null);
  const clash = draft === null ? undefined : caseNamedAlike(store.getState().project.loadCases, c.id, draft || c.id);
  const errorId = `case-name-${c.id}-err`;
  return (
    <>
      <input
        aria-label={`${CASE_FIELDS.label} of case ${c.id}`}
        value={draft ?? c.label ?? ''}
        placeholder={c.id}
        maxLength={80}
        aria-invalid={clash !== undefined}
        aria-describedby={clash ? errorId : undefined}
        onChange={(e) => {
          const typed = e.target.value;
          const other = caseNamedAlike(store.getState().project.loadCases, c.id, typed || c.id);
          setDraft(other ? typed : null);
          if (!other) actions.updateCase(c.id, { label: typed || undefined });
        }}
        onBlur={() => setDraft(null)}
      />
      {clash && (
        <div className="field-error" id={errorId} role="alert">
          “{draft || c.id}” already names another case: give each case a name of its own.
        </div>
      )}
    </>
  );
}
