import {
  caseLabel,
  anchorConcrete,
  blockBaseDown,
  blockConcrete,
  elementName,
  fittingProfile,
  formatDimension,
  shownDimension,
  horizontalNorm,
  jointsText,
  layingLengthText,
  legTarget,
  norm,
  notVerifiedText,
  planBearing,
  quantityText,
  restrainedJointCount,
  REGISTER,
  unverified,
  columnNumber,
  columnUnit,
  type FittingAnalysis,
  type Project,
  readsZero,
} from '@mainbrace/solver';
import { columnForce, showColumnForce } from '../format/quantity.js';
import { bearingText, fittingTitle } from '../format/fittingNames.js';
import { useDiagnosticWords } from '../format/words.js';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { CalcRecordView } from './CalcRecordView.js';
import { RestraintSketch } from '../print/RestraintSketch.js';
import { scheduleViewOf } from '../state/scheduleViewOf.js';

/** The results of one fitting: thrust per case, the governing case, its restraint and warnings. */
/** What set a block's face, in words. */
const BLOCK_GOVERNS = {
  bearing: 'the bearing area',
  passive: 'the passive resistance',
  minimum: 'the least face, one OD each way',
} as const;

export function FittingResults({ fitting: f, project }: { fitting: FittingAnalysis; project: Project }) {
  const u = useApp((s) => s.units);
  const actions = useActions();
  const analysis = useAnalysis();
  const words = useDiagnosticWords();
  const r = f.restraint;
  const e = f.envelope;
  const sized = !!(r.block || r.anchor || r.trenchBottom || r.restrainedLegs.length > 0);
  // An error among the findings means what is listed (if anything) does not hold the fitting.
  const notAdequate = f.diagnostics.some((d) => d.severity === 'error');
  const open = unverified(f.basis);
  const forceUnit = columnUnit('force', u);
  // A part of the thrust is named only where it reads as more than nothing at the force column's precision.
  const horizontalShown = !readsZero(e.horizontal.force, 'force', u);
  const row = scheduleViewOf(analysis, u).rows[analysis.fittings.indexOf(f)];
  const baseDown = blockBaseDown(r, e.downward.force, norm(e.governing.total), f.diagnostics);
  return (
    <section className="results" aria-label={`Results for ${f.mark}`} data-testid="fitting-results">
      <h3>
        <span className="mark">{f.mark}</span>{' '}
        {fittingTitle({ ...f.geometry, profile: fittingProfile(f), diagnostics: f.diagnostics })}
      </h3>
      <button className="link zoom-to" onClick={() => actions.zoomToFitting(f.node.id)} data-testid="zoom-to-fitting">
        Zoom to {f.mark} on the plan
      </button>
      <dl className="facts">
        <dt>Chainage</dt>
        <dd>{quantityText(f.chainage, 'chainage', u)}</dd>
        <dt>Design pressure</dt>
        <dd data-testid="design-pressure">{quantityText(e.pressure, 'pressure', u)}</dd>
        <dt>Governing case</dt>
        <dd>{caseLabel(project, e.governing.caseId)}</dd>
        <dt>Thrust</dt>
        <dd data-testid="governing-thrust">
          {horizontalShown && (
            <>
              horizontal <strong>{showColumnForce(e.horizontal.force, u)}</strong>, bears toward{' '}
              {bearingText(planBearing(e.horizontal.direction))} (from north)
            </>
          )}
          {!readsZero(e.upward.force, 'force', u) && (
            <>
              {horizontalShown ? '; ' : ''}upward <strong>{showColumnForce(e.upward.force, u)}</strong>
            </>
          )}
          {!readsZero(e.downward.force, 'force', u) && (
            <>
              {horizontalShown || !readsZero(e.upward.force, 'force', u) ? '; ' : ''}downward{' '}
              <strong>{showColumnForce(e.downward.force, u)}</strong>
            </>
          )}{' '}
          (total {showColumnForce(norm(e.governing.total), u)})
        </dd>
      </dl>
      <div className="table-scroll">
        {/* One column per case (usually three), one row per quantity with its unit: it fits the panel,
            where a row per case with seven columns was cut. */}
        <table className="cases-table">
          <thead>
            <tr>
              <th>Case</th>
              {f.cases.map((c) => (
                <th key={c.caseId} className={c.caseId === e.governing.caseId ? 'governing' : ''}>
                  {caseLabel(project, c.caseId)}
                  {c.caseId === e.governing.caseId ? ' ◆' : ''}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {(
              [
                [`Pressure (${columnUnit('pressure', u)})`, (c) => columnNumber(c.pressure, 'pressure', u)],
                [`Static (${forceUnit})`, (c) => columnForce(norm(c.static), u)],
                [`Dynamic (${forceUnit})`, (c) => columnForce(norm(c.dynamic), u)],
                [`Total (${forceUnit})`, (c) => columnForce(norm(c.total), u)],
                [
                  `Up (+) (${forceUnit})`,
                  (c) => columnForce(Math.abs(c.total[2]) < 1e-6 * norm(c.total) ? 0 : c.total[2], u),
                ],
                [
                  'Bears',
                  (c) => bearingText(horizontalNorm(c.total) > 0 ? planBearing([c.total[0], c.total[1], 0]) : null),
                ],
              ] as [string, (c: (typeof f.cases)[number]) => string][]
            ).map(([label, cell]) => (
              <tr key={label}>
                <th scope="row">{label}</th>
                {f.cases.map((c) => (
                  <td key={c.caseId} className={c.caseId === e.governing.caseId ? 'governing' : ''}>
                    {cell(c)}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="muted small">
        ◆ governing case. Horizontal part {showColumnForce(horizontalNorm(e.governing.total), u)}; water in the fitting
        weighs {showColumnForce(f.waterWeight, u)} (not counted).
      </p>
      <h4>Restraint</h4>
      <ul className="restraint">
        {notAdequate && (
          <li className="not-adequate" data-testid="not-adequate">
            NOT ADEQUATE — {sized ? 'do not build as shown' : 'no restraint is sized that holds this fitting'}: see the
            findings below.
          </li>
        )}
        {r.block && (
          <li data-testid="block">
            <span className="element">{elementName(f.mark, 'block')}</span> Bearing block, bears{' '}
            {bearingText(planBearing(r.block.direction))} for {showColumnForce(r.block.thrust, u)} horizontal
            {r.block.upwardThrust > 0
              ? ` and holds ${showColumnForce(r.block.upwardThrust, u)} up by its weight`
              : ''}:{' '}
            <strong>
              {formatDimension(r.block.faceWidth, u)} wide × {formatDimension(r.block.faceHeight, u)} high
            </strong>
            , {formatDimension(r.block.depth, u)} from the fitting to the bearing face; bearing area{' '}
            {quantityText(r.block.bearingArea, 'area', u)} needed,{' '}
            {quantityText(shownDimension(r.block.faceWidth, u) * shownDimension(r.block.faceHeight, u), 'area', u)}{' '}
            given; concrete {quantityText(blockConcrete(r.block, u), 'volume', u)}. Passive resistance{' '}
            {r.block.passiveRatio.toFixed(2)} × the thrust (3-D factor {r.block.shapeFactor.toFixed(2)}); the face is
            set by {BLOCK_GOVERNS[r.block.governs]}.
            {baseDown > 0 &&
              ` Its base bears ${showColumnForce(baseDown, u)} down on the trench bottom: no pad is needed.`}
          </li>
        )}
        {r.reverseBlock && (
          <li data-testid="reverse-block">
            <span className="element">{elementName(f.mark, 'reverseBlock')}</span> Second block on the opposite side
            (the thrust reverses){' '}
            <strong>
              {formatDimension(r.reverseBlock.faceWidth, u)} wide × {formatDimension(r.reverseBlock.faceHeight, u)} high
            </strong>
            ; concrete {quantityText(blockConcrete(r.reverseBlock, u), 'volume', u)}.
          </li>
        )}
        {r.anchor && (
          <li data-testid="anchor">
            <span className="element">{elementName(f.mark, 'anchor')}</span> Gravity anchor, holds{' '}
            {showColumnForce(r.anchor.upwardThrust, u)} up:{' '}
            <strong>
              {formatDimension(r.anchor.length, u)} long × {formatDimension(r.anchor.width, u)} wide ×{' '}
              {formatDimension(r.anchor.height, u)} high
            </strong>
            , {quantityText(anchorConcrete(r.anchor, u), 'volume', u)} of concrete
            {r.anchor.submerged ? ', submerged weight' : ''}
            {r.anchor.horizontalThrust > 0 ? '; its base friction also holds the horizontal thrust' : ''}.
          </li>
        )}
        {r.trenchBottom && (
          <li data-testid="pad">
            <span className="element">{elementName(f.mark, 'trenchBottom')}</span> Trench-bottom bearing, bears{' '}
            {showColumnForce(e.downward.force, u)} down: {quantityText(r.trenchBottom.bearingArea, 'area', u)}: pad{' '}
            {formatDimension(r.trenchBottom.width, u)} across × {formatDimension(r.trenchBottom.length, u)} along the
            pipe.
          </li>
        )}
        {r.restrainedLegs.map((l) => {
          const toward = legTarget(analysis, f.node.id, l.pipe);
          return (
            <li key={l.pipe} data-testid="restrained">
              <span className="element">{elementName(f.mark, 'joints')}</span> Restrain{' '}
              <strong>{quantityText(l.length, 'restrained', u)}</strong>{' '}
              {toward ? `toward ${toward}` : 'to the end of the line'}:{' '}
              {jointsText(restrainedJointCount(l.length, project.design.layingLength))} at{' '}
              {layingLengthText(project.design.layingLength, u)} laying length, the first at the fitting.
            </li>
          );
        })}
        {!sized && !notAdequate && <li>None needed.</li>}
      </ul>
      {row && <RestraintSketch fitting={row.fitting} analysis={analysis} units={u} notes={row.cells.notes} />}
      {f.diagnostics.length > 0 && (
        <>
          <h4>Findings</h4>
          <ul className="warnings" data-testid="warnings">
            {f.diagnostics.map((d, i) => (
              <li key={i} className={`finding-${d.severity}`} data-code={d.code}>
                <span className="warn-mark" aria-hidden="true">
                  {d.severity === 'error' ? '✕' : d.severity === 'warning' ? '!' : 'i'}
                </span>
                {words(d)}
              </li>
            ))}
          </ul>
        </>
      )}
      {open.length > 0 && (
        <>
          <h4>Relies on values not yet verified</h4>
          <ul className="unverified small" data-testid="unverified">
            {open.map((id) => (
              <li key={id}>
                {REGISTER[id].quantity}: {notVerifiedText(REGISTER[id])}.
              </li>
            ))}
          </ul>
        </>
      )}
      <details className="record-box">
        <summary>Calculation record</summary>
        <CalcRecordView fitting={f} project={project} />
      </details>
    </section>
  );
}
