import { memo } from 'react';
import { CASE_KINDS, LIMITS, type LoadCase, type UnitSystem } from '@mainbrace/solver';
import { useActions, useApp } from '../state/StoreContext.js';
import { nextId } from '../state/documentEdits.js';
import { NumberField } from './NumberField.js';
import { CaseNameField, freeCaseName } from './CaseNameField.js';
import { TestPressureControl } from './TestPressureControl.js';
import { GoverningList } from './GoverningList.js';
import { SurgeSuggestion } from './SurgeSuggestion.js';
import { CASE_FIELDS } from '../format/fieldLabels.js';

const KIND_LABEL: Record<(typeof CASE_KINDS)[number], string> = {
  working: 'Working',
  surge: 'Surge',
  test: 'Field test',
  other: 'Other',
};

/**
 * One case's row. Memoised on the case object: an edit of one case replaces that object only, so the
 * other rows (and their number fields) are not rendered again.
 */
const CaseRow = memo(function CaseRow({
  c,
  units: u,
  removable,
  firstElevation,
}: {
  c: LoadCase;
  units: UnitSystem;
  removable: boolean;
  firstElevation: number | undefined;
}) {
  const actions = useActions();
  const set = (id: string, patch: Partial<LoadCase>) => actions.updateCase(id, patch);
  return (
    <tr>
      <td>
        <CaseNameField c={c} />
      </td>
      <td>
        <select
          aria-label={`Kind of case ${c.id}`}
          value={c.kind ?? 'other'}
          onChange={(e) => set(c.id, { kind: e.target.value as LoadCase['kind'] })}
        >
          {CASE_KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABEL[k]}
            </option>
          ))}
        </select>
      </td>
      <td>
        <NumberField
          label={`${CASE_FIELDS.pressure} of ${c.label ?? c.id}`}
          value={c.pressure}
          dimension="pressure"
          units={u}
          min={0}
          max={10e6}
          onCommit={(pressure) => set(c.id, { pressure })}
          testId={`case-pressure-${c.id}`}
        />
      </td>
      <td>
        {c.datumElevation === undefined ? (
          <button className="link" onClick={() => set(c.id, { datumElevation: firstElevation ?? 100 })}>
            at every node — set a datum
          </button>
        ) : (
          <NumberField
            label={`${CASE_FIELDS.datumElevation} of ${c.label ?? c.id}`}
            value={c.datumElevation}
            dimension="elevation"
            units={u}
            min={LIMITS.elevation.hard.min}
            max={LIMITS.elevation.hard.max}
            onCommit={(datumElevation) => set(c.id, { datumElevation })}
            testId={`case-datum-${c.id}`}
          />
        )}
      </td>
      <td>
        <NumberField
          label={`${CASE_FIELDS.flowFactor} of ${c.label ?? c.id}`}
          value={c.flowFactor}
          dimension="ratio"
          units={u}
          min={0}
          max={10}
          onCommit={(flowFactor) => set(c.id, { flowFactor })}
        />
      </td>
      <td>
        <button
          className="link"
          disabled={!removable}
          onClick={() => actions.removeCase(c.id)}
          aria-label={`Remove case ${c.label ?? c.id}`}
        >
          Remove
        </button>
      </td>
    </tr>
  );
});

/** The load cases: pressure at a datum, flow factor; the live test-pressure control; what governs where. */
export function CasesPanel() {
  // The cases and the first node's elevation only: a pressure change renders the panel's table again
  // (one row of it), not the results beside it, which follow the analysis themselves.
  const loadCases = useApp((s) => s.project.loadCases);
  const firstElevation = useApp((s) => s.project.nodes[0]?.elevation);
  const actions = useActions();
  const u = useApp((s) => s.units);
  const add = () => {
    const id = nextId(
      'case',
      loadCases.map((c) => c.id),
    );
    const like = loadCases[0]!;
    actions.addCase({
      id,
      label: freeCaseName(loadCases, id, 'New case'),
      kind: 'other',
      pressure: like.pressure,
      flowFactor: 1,
      ...(like.datumElevation !== undefined ? { datumElevation: like.datumElevation } : {}),
    });
  };
  return (
    <div className="cases-panel">
      <div className="cases-columns">
        <div>
          <table className="edit-table" data-testid="cases-table">
            <thead>
              <tr>
                <th>Case</th>
                <th>Kind</th>
                <th>Pressure at datum</th>
                <th>Datum elevation</th>
                <th>Flow factor</th>
                <th />
              </tr>
            </thead>
            <tbody>
              {loadCases.map((c) => (
                <CaseRow key={c.id} c={c} units={u} removable={loadCases.length > 1} firstElevation={firstElevation} />
              ))}
            </tbody>
          </table>
          <button onClick={add}>Add a case</button>
          <p className="muted small">
            Pressure is gauge pressure at the datum elevation; each node sees it corrected by ρ·g·(datum − node
            elevation). A flow factor of 0 means no flow, as in a field test.
          </p>
          <SurgeSuggestion />
        </div>
        <TestPressureControl />
        <GoverningList />
      </div>
    </div>
  );
}
