import { CASE_KINDS, type LoadCase } from '@mainbrace/solver';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { nextId } from '../state/documentEdits.js';
import { NumberField } from './NumberField.js';
import { TestPressureControl } from './TestPressureControl.js';
import { GoverningList } from './GoverningList.js';
import { SurgeSuggestion } from './SurgeSuggestion.js';

const KIND_LABEL: Record<(typeof CASE_KINDS)[number], string> = {
  working: 'Working',
  surge: 'Surge',
  test: 'Field test',
  other: 'Other',
};

/** The load cases: pressure at a datum, flow factor; the live test-pressure control; what governs where. */
export function CasesPanel() {
  const project = useApp((s) => s.project);
  const actions = useActions();
  useAnalysis();
  const u = useApp((s) => s.units);
  const set = (id: string, patch: Partial<LoadCase>) => actions.updateCase(id, patch);
  const add = () => {
    const id = nextId(
      'case',
      project.loadCases.map((c) => c.id),
    );
    const like = project.loadCases[0]!;
    actions.addCase({
      id,
      label: 'New case',
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
              {project.loadCases.map((c) => (
                <tr key={c.id}>
                  <td>
                    <input
                      aria-label={`Name of case ${c.id}`}
                      value={c.label ?? ''}
                      placeholder={c.id}
                      maxLength={80}
                      onChange={(e) => set(c.id, { label: e.target.value || undefined })}
                    />
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
                      label={`Pressure of ${c.label ?? c.id}`}
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
                      <button
                        className="link"
                        onClick={() => set(c.id, { datumElevation: project.nodes[0]?.elevation ?? 100 })}
                      >
                        at every node — set a datum
                      </button>
                    ) : (
                      <NumberField
                        label={`Datum of ${c.label ?? c.id}`}
                        value={c.datumElevation}
                        dimension="elevation"
                        units={u}
                        onCommit={(datumElevation) => set(c.id, { datumElevation })}
                      />
                    )}
                  </td>
                  <td>
                    <NumberField
                      label={`Flow factor of ${c.label ?? c.id}`}
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
                      disabled={project.loadCases.length <= 1}
                      onClick={() => actions.removeCase(c.id)}
                      aria-label={`Remove case ${c.label ?? c.id}`}
                    >
                      Remove
                    </button>
                  </td>
                </tr>
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
