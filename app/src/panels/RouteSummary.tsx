import { norm, restraintConcrete } from '@mainbrace/solver';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { show } from '../format/quantity.js';
import { KIND_NAME } from '../format/fittingNames.js';

/** With nothing selected: the route in numbers, the largest thrusts, and how to begin. */
export function RouteSummary() {
  const project = useApp((s) => s.project);
  const analysis = useAnalysis();
  const actions = useActions();
  const u = project.units;
  const length = project.pipes.reduce((sum, p) => {
    const a = project.nodes.find((n) => n.id === p.from)!;
    const b = project.nodes.find((n) => n.id === p.to)!;
    return sum + Math.hypot(b.x - a.x, b.y - a.y, b.elevation - a.elevation);
  }, 0);
  const concrete = analysis.fittings.reduce((v, f) => v + restraintConcrete(f.restraint), 0);
  const ranked = [...analysis.fittings].sort((a, b) => norm(b.envelope.governing.total) - norm(a.envelope.governing.total)).slice(0, 6);
  const warned = analysis.fittings.filter((f) => f.warnings.length > 0).length;
  return (
    <section className="inputs">
      <h3>Route</h3>
      {project.nodes.length === 0 ? (
        <p>
          Press <kbd>D</kbd> or pick <em>Draw main</em>, then click on the plan to lay out the main. Each click is a bend; Enter or a double-click finishes.
        </p>
      ) : (
        <>
          <dl className="facts">
            <dt>Length of main</dt>
            <dd>{show(length, 'length', u, 4)}</dd>
            <dt>Fittings to restrain</dt>
            <dd>{analysis.fittings.length}</dd>
            <dt>Concrete (blocks and anchors)</dt>
            <dd>{show(concrete, 'volume', u)}</dd>
            <dt>Fittings with warnings</dt>
            <dd>{warned}</dd>
          </dl>
          <h4>Largest thrusts</h4>
          <ol className="ranked">
            {ranked.map((f) => (
              <li key={f.node.id}>
                <button className="link" onClick={() => actions.selectNode(f.node.id)}>
                  {f.tag}
                </button>{' '}
                {KIND_NAME[f.geometry.kind].toLowerCase()} — {show(norm(f.envelope.governing.total), 'force', u)}
              </li>
            ))}
          </ol>
          <p className="muted small">Click a fitting on the plan, or a row of the schedule, to see its results and calculation.</p>
        </>
      )}
    </section>
  );
}
