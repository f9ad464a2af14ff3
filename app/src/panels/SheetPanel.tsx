import {
  LIMITS,
  REGISTER,
  SHORT_CAUTION,
  notVerifiedText,
  sheetOf,
  takeOff,
  takeOffRows,
  type ChainageStyle,
  type Sheet,
} from '@mainbrace/solver';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { NumberField } from './NumberField.js';
import { TakeOffTable } from '../print/TakeOffTable.js';
import { scheduleViewOf } from '../state/scheduleViewOf.js';

const TITLE_FIELDS: { key: Exclude<keyof Sheet, 'chainageStyle'>; label: string; max: number }[] = [
  { key: 'drawingNumber', label: 'Drawing number', max: 40 },
  { key: 'revision', label: 'Revision', max: 12 },
  { key: 'date', label: 'Date of issue', max: 30 },
  { key: 'drawnBy', label: 'Drawn', max: 40 },
  { key: 'checkedBy', label: 'Checked', max: 40 },
  { key: 'approvedBy', label: 'Approved', max: 40 },
];

/**
 * The drawing sheet and the quantities: title-block fields printed on every page, how positions along
 * the route are written (chainage or stations), the concrete waste allowance, and the job's take-off
 * (the same lines as the printed sheet, the CSV and `mainbrace quantities`).
 */
export function SheetPanel() {
  const project = useApp((s) => s.project);
  const units = useApp((s) => s.units);
  const analysis = useAnalysis();
  const actions = useActions();
  const sheet = sheetOf(project.sheet);
  const view = scheduleViewOf(analysis, units);
  const t = takeOff(
    view.rows.map((r) => r.fitting),
    project,
    units,
  );
  const waste = REGISTER['quantities.concrete-waste'];
  return (
    <div className="sheet-panel">
      <section className="settings-group" aria-labelledby="title-block-title">
        <h4 id="title-block-title">Title block</h4>
        <div className="field-row title-fields">
          {TITLE_FIELDS.map((f) => (
            <div className="field" key={f.key}>
              <label htmlFor={`sheet-${f.key}`}>{f.label}</label>
              <input
                id={`sheet-${f.key}`}
                data-testid={`sheet-${f.key}`}
                value={sheet[f.key]}
                maxLength={f.max}
                onChange={(e) => actions.updateSheet({ [f.key]: e.target.value })}
              />
            </div>
          ))}
        </div>
        <div className="field">
          <label htmlFor="chainage-style">Positions along the route</label>
          <select
            id="chainage-style"
            value={sheet.chainageStyle}
            onChange={(e) => actions.updateSheet({ chainageStyle: e.target.value as ChainageStyle })}
          >
            <option value="chainage">Chainage ({units === 'us' ? 'ft' : 'm'} from the start of each run)</option>
            <option value="stations">Stations ({units === 'us' ? '9+31.8 = 931.8 ft' : '0+931.8 = 931.8 m'})</option>
            <option value="both">Chainage and stations</option>
          </select>
        </div>
      </section>
      <section className="settings-group" aria-labelledby="takeoff-title">
        <h4 id="takeoff-title">Quantities take-off</h4>
        <NumberField
          label="Concrete waste allowance (0.10 = 10 %)"
          value={t.waste}
          dimension="ratio"
          units={units}
          min={LIMITS.concreteWaste.hard.min}
          max={LIMITS.concreteWaste.hard.max}
          hint={project.design.concreteWaste === undefined ? `Default: ${notVerifiedText(waste)}.` : undefined}
          onCommit={(v) => actions.updateDesign({ concreteWaste: v })}
          testId="concrete-waste"
        />
        <TakeOffTable rows={takeOffRows(t, units)} />
      </section>
      <p className="caution-foot">{SHORT_CAUTION}</p>
    </div>
  );
}
