import { norm, quantityText, scheduleConcrete } from '@mainbrace/solver';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { show, showColumnForce } from '../format/quantity.js';
import { kindName } from '../format/fittingNames.js';
import { useDiagnosticWords } from '../format/words.js';
import { routeSummary } from '../state/routeFigures.js';

/** With nothing selected: the route in numbers, the largest thrusts, and how to begin. */
export function RouteSummary() {
  const analysis = useAnalysis();
  // The analysed document: the same object after an edit of the name, so a keystroke there on a
  // 10,000-node route recomputes none of the figures below.
  const project = analysis.project;
  const actions = useActions();
  const u = useApp((s) => s.units);
  const { length, ranked, pieces, warned } = routeSummary(analysis);
  // The schedule's own total (memoised): the same figure as its footer.
  const concrete = scheduleConcrete(analysis, u);
  const words = useDiagnosticWords();
  return (
    <section className="inputs">
      <h3>Route</h3>
      {project.nodes.length === 0 ? (
        <p>
          Press <kbd>D</kbd> or pick <em>Draw main</em>, then click on the plan to lay out the main. Each click is a
          bend; Enter or a double-click finishes.
        </p>
      ) : (
        <>
          <dl className="facts">
            <dt>Length of main</dt>
            <dd>{show(length, 'length', u, 4)}</dd>
            <dt>Fittings to restrain</dt>
            <dd>{analysis.fittings.length}</dd>
            <dt>Concrete (blocks, anchors, pads)</dt>
            <dd>{quantityText(concrete, 'volume', u)}</dd>
            <dt>Fittings with warnings</dt>
            <dd>{warned}</dd>
          </dl>
          {pieces > 1 && (
            <p className="warn-line" role="note" data-testid="pieces-warning">
              <span className="legend-warn" aria-hidden="true">
                !
              </span>{' '}
              The route is in {pieces} separate pieces, not one connected main: each is sized on its own, with a
              dead-end block at every free end. Draw a run between them to join them.
            </p>
          )}
          {analysis.diagnostics.length > 0 && (
            <>
              <h4>Checks on the inputs</h4>
              <ul className="warnings" data-testid="input-checks">
                {analysis.diagnostics.map((d, i) => (
                  <li key={i} className={`finding-${d.severity}`} data-code={d.code}>
                    <span className="warn-mark" aria-hidden="true">
                      !
                    </span>
                    {words(d)}
                  </li>
                ))}
              </ul>
            </>
          )}
          <h4>Largest thrusts (resultant, worst case)</h4>
          <ol className="ranked">
            {ranked.map((f) => (
              <li key={f.node.id}>
                <button className="link" onClick={() => actions.revealNode(f.node.id)}>
                  {f.mark}
                </button>{' '}
                {kindName({ kind: f.geometry.kind, diagnostics: f.diagnostics }).toLowerCase()} —{' '}
                {showColumnForce(norm(f.envelope.governing.total), u)}
              </li>
            ))}
          </ol>
          <p className="muted small">Click a fitting or a schedule row for its results and calculation.</p>
        </>
      )}
    </section>
  );
}
