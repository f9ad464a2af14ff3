import { CAUTIONS, calculationRecord, columnNumber, columnUnit, pickColumns, scheduleView } from '@mainbrace/solver';
import { useAnalysis, useApp } from '../state/StoreContext.js';
import { show } from '../format/quantity.js';
import { fittingTitle } from '../format/fittingNames.js';
import { CalcRecordView } from '../panels/CalcRecordView.js';
import { KeyPlan } from './KeyPlan.js';

/** The columns the printed schedule shows, from the one schedule view. */
const PRINT_COLUMNS = [
  'mark',
  'chainage',
  'fitting',
  'od',
  'pressure',
  'case',
  'horizontal',
  'upward',
  'downward',
  'bears',
  'soil',
  'restraint',
  'notes',
];

/**
 * The printable fitting schedule: its own layout (landscape sheet), shown as a preview over the app
 * and alone on paper. Project, date, units, design basis, the schedule, cautions, and an appendix
 * with each fitting's calculation record.
 */
export function PrintSheet({ onClose }: { onClose: () => void }) {
  const project = useApp((s) => s.project);
  const analysis = useAnalysis();
  const u = useApp((s) => s.units);
  const view = scheduleView(analysis, u);
  const columns = pickColumns(view, PRINT_COLUMNS);
  const d = project.design;
  const today = new Date().toISOString().slice(0, 10);
  const concrete = view.rows.reduce((v, r) => v + (r.values.concrete ?? 0), 0);
  return (
    <div className="print-preview" data-testid="print-sheet">
      <div className="print-toolbar no-print">
        <button onClick={() => window.print()}>Print</button>
        <button onClick={onClose}>Back to the plan</button>
        <span className="muted">Landscape; the schedule, then the calculation of every fitting.</span>
      </div>
      <article className="sheet">
        <header className="sheet-head">
          <div>
            <div className="sheet-kicker">Fitting schedule — thrust restraint</div>
            <h1>{project.name}</h1>
          </div>
          <dl>
            <dt>Date</dt>
            <dd>{today}</dd>
            <dt>Units</dt>
            <dd>{u === 'si' ? 'SI (kN, kPa, m, m³)' : 'US customary (lbf/kip, psi, ft, yd³)'}</dd>
            <dt>Fittings</dt>
            <dd>{view.rows.length}</dd>
          </dl>
        </header>
        <section className="sheet-caution" role="note">
          <strong>Design aid only.</strong> {CAUTIONS[0]} {CAUTIONS[1]}
        </section>
        <section className="sheet-basis">
          <h2>Design basis</h2>
          <div className="basis-grid">
            <table>
              <thead>
                <tr>
                  <th>Case</th>
                  <th>Pressure</th>
                  <th>at datum</th>
                  <th>Flow factor</th>
                </tr>
              </thead>
              <tbody>
                {project.loadCases.map((c) => (
                  <tr key={c.id}>
                    <td>{c.label ?? c.id}</td>
                    <td>{show(c.pressure, 'pressure', u)}</td>
                    <td>{c.datumElevation === undefined ? 'every node' : show(c.datumElevation, 'elevation', u, 4)}</td>
                    <td>{c.flowFactor}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            <table>
              <thead>
                <tr>
                  <th>Soil</th>
                  <th>Bearing</th>
                  <th>γ</th>
                  <th>φ</th>
                  <th>c</th>
                </tr>
              </thead>
              <tbody>
                {project.soils.map((s) => (
                  <tr key={s.id}>
                    <td>
                      {s.label ?? s.id}
                      {s.source ? <div className="small muted">{s.source}</div> : null}
                    </td>
                    <td>
                      {show(s.bearing, 'stress', u)}
                      {s.bearingPerDepth ? ` + ${show(s.bearingPerDepth, 'stressGradient', u)} of depth` : ''}
                    </td>
                    <td>{show(s.unitWeight, 'unitWeight', u)}</td>
                    <td>{show(s.frictionAngle, 'angle', u)}</td>
                    <td>{show(s.cohesion, 'stress', u)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            <KeyPlan project={project} analysis={analysis} />
            <ul className="basis-list">
              <li>
                Safety factors: bearing {d.bearingSafetyFactor}, uplift {d.upliftSafetyFactor}, restrained joints{' '}
                {d.restraintSafetyFactor}
              </li>
              <li>
                Pressure acts on the {d.thrustArea} diameter; water {show(project.water.density, 'density', u)}
              </li>
              <li>
                Concrete {show(d.concreteUnitWeight, 'unitWeight', u)}; blocks {show(d.blockDepth, 'length', u)} deep to
                the bearing face
              </li>
              <li>
                Groundwater{' '}
                {d.groundwaterElevation === null
                  ? 'below every block'
                  : `at ${show(d.groundwaterElevation, 'elevation', u, 4)}`}
              </li>
              <li>
                Thrust by the steady momentum balance at each fitting; bearing area A = SF·T/σ; anchors W ≥ SF·T_up
              </li>
            </ul>
          </div>
        </section>
        <section>
          <h2>Schedule</h2>
          <table className="sheet-schedule">
            <colgroup>
              {[4.5, 6.5, 9, 6, 6.5, 7, 6, 6.5, 7, 33, 8].map((w, i) => (
                <col key={i} style={{ width: `${w}%` }} />
              ))}
            </colgroup>
            <thead>
              <tr>
                {columns.map((c) => (
                  <th key={c.id}>{c.heading}</th>
                ))}
              </tr>
            </thead>
            <tbody>
              {view.rows.map((r) => (
                <tr
                  key={r.fitting.node}
                  className={r.fitting.diagnostics[0]?.severity === 'error' ? 'not-adequate' : ''}
                >
                  {columns.map((c) => (
                    <td key={c.id} className={c.kind === 'text' ? (c.id === 'mark' ? 'mark' : '') : 'num'}>
                      {r.cells[c.id]}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
          <p className="sheet-total">
            Total concrete in blocks and anchors:{' '}
            <strong>
              {columnNumber(concrete, 'volume', u)} {columnUnit('volume', u)}
            </strong>{' '}
            for {view.rows.length} fittings
          </p>
          {view.notes.length > 0 && (
            <>
              <h3>Notes</h3>
              <ol className="sheet-notes">
                {view.notes.map((n) => (
                  <li key={n.number} value={n.number} className={`note-${n.severity}`}>
                    {n.severity === 'error' ? <strong>Not adequate. </strong> : null}
                    {n.text} ({n.marks.join(', ')})
                  </li>
                ))}
              </ol>
            </>
          )}
        </section>
        <section className="sheet-cautions">
          <h2>Cautions</h2>
          <ol>
            {CAUTIONS.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ol>
        </section>
        <section className="appendix">
          <h2>Appendix — calculation of each fitting</h2>
          {analysis.fittings.map((f) => (
            <div className="appendix-fitting" key={f.node.id}>
              <h3>
                {f.mark} — {fittingTitle(f.geometry)} (node {f.node.id}
                {f.node.label ? `, ${f.node.label}` : ''})
              </h3>
              {calculationRecord(project, f).length > 0 && <CalcRecordView fitting={f} project={project} />}
            </div>
          ))}
        </section>
      </article>
    </div>
  );
}
