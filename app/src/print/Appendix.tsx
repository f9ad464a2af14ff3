import { CAUTIONS, calculationRecord, type Analysis, type Project, type UnitSystem } from '@mainbrace/solver';
import { show } from '../format/quantity.js';
import { fittingTitle } from '../format/fittingNames.js';
import { CalcRecordView } from '../panels/CalcRecordView.js';

/**
 * The calculation appendix, for the reviewing engineer only (printed when asked for): the design
 * basis, every caution, and each fitting's calculation record in crew order.
 */
export function Appendix({ project, analysis, units: u }: { project: Project; analysis: Analysis; units: UnitSystem }) {
  const d = project.design;
  return (
    <section className="appendix" data-testid="appendix">
      <h2>Appendix — design basis and calculation of each fitting</h2>
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
        <ul className="basis-list">
          <li>
            Safety factors: bearing {d.bearingSafetyFactor}, uplift {d.upliftSafetyFactor}, restrained joints{' '}
            {d.restraintSafetyFactor}
          </li>
          <li>
            Pressure acts on the {d.thrustArea} diameter; water {show(project.water.density, 'density', u)}
          </li>
          <li>
            Concrete {show(d.concreteUnitWeight, 'unitWeight', u)}; blocks {show(d.blockDepth, 'length', u)} from the
            fitting centre to the bearing face
          </li>
          <li>
            Groundwater{' '}
            {d.groundwaterElevation === null
              ? 'below every block'
              : `at ${show(d.groundwaterElevation, 'elevation', u, 4)}`}
          </li>
          <li>Thrust by the steady momentum balance at each fitting; bearing area A = SF·T/σ; anchors W ≥ SF·T_up</li>
        </ul>
      </div>
      <h3>Cautions</h3>
      <ol>
        {CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ol>
      {analysis.fittings.map((f) => (
        <div className="appendix-fitting" key={f.node.id}>
          <h3>
            {f.mark} — {fittingTitle({ ...f.geometry, diagnostics: f.diagnostics })}
            {f.node.label ? ` (${f.node.label})` : ''}
          </h3>
          {calculationRecord(project, f).length > 0 && <CalcRecordView fitting={f} project={project} />}
        </div>
      ))}
    </section>
  );
}
