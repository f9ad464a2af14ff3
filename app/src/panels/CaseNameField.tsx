import { useState } from 'react';
import { caseName, type LoadCase } from '@mainbrace/solver';
import { useActions, useAppStore } from '../state/StoreContext.js';
import { CASE_FIELDS } from '../format/fieldLabels.js';

/** Another case already read by this name, if any. */
export function caseNamedAlike(cases: readonly LoadCase[], id: string, name: string): LoadCase | undefined {
  return cases.find((o) => o.id !== id && caseName(o) === name);
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
  // What was typed, kept only while another case has that name (then it is not saved).
  const [clash, setClash] = useState<string | null>(null);
  const errorId = `case-name-${c.id}-err`;
  return (
    <>
      <input
        aria-label={`${CASE_FIELDS.label} of case ${c.id}`}
        value={clash ?? c.label ?? ''}
        placeholder={c.id}
        maxLength={80}
        aria-invalid={clash !== null}
        aria-describedby={clash !== null ? errorId : undefined}
        onChange={(e) => {
          const typed = e.target.value;
          const other = caseNamedAlike(store.getState().project.loadCases, c.id, typed || c.id);
          setClash(other ? typed : null);
          if (!other) actions.updateCase(c.id, { label: typed || undefined });
        }}
        onBlur={() => setClash(null)}
      />
      {clash !== null && (
        <div className="field-error" id={errorId} role="alert">
          “{clash || c.id}” already names another case: give each case a name of its own.
        </div>
      )}
    </>
  );
}
