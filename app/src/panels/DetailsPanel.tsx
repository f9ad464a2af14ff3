import { useLayoutEffect, useRef } from 'react';
import { SHORT_CAUTION } from '@mainbrace/solver';
import { useAnalysis, useApp } from '../state/StoreContext.js';
import { RouteSummary } from './RouteSummary.js';
import { lazyPart } from '../chrome/lazyPart.js';

const parts = () => import('./selectionParts.js');
const FittingResults = lazyPart(() => parts().then((m) => m.FittingResults));
const NodeDetails = lazyPart(() => parts().then((m) => m.NodeDetails));
const PipeDetails = lazyPart(() => parts().then((m) => m.PipeDetails));

/** What is selected — node, pipe or fitting — with its inputs and results; the route summary otherwise. */
export function DetailsPanel() {
  const project = useApp((s) => s.project);
  const selection = useApp((s) => s.selection);
  const analysis = useAnalysis();
  const count = selection.nodes.size + selection.pipes.size;
  // Another item chosen: its details start at the top, not at the last one's scroll position. Not on
  // mount: a new panel is at the top, and setting scrollTop there forces a layout of the whole page in
  // the first draw.
  const panel = useRef<HTMLElement>(null);
  const chosen = [...selection.nodes, '|', ...selection.pipes].join(' ');
  const shown = useRef(chosen);
  useLayoutEffect(() => {
    if (shown.current === chosen) return;
    shown.current = chosen;
    if (panel.current) panel.current.scrollTop = 0;
  }, [chosen]);
  let body;
  if (count === 1 && selection.nodes.size === 1) {
    const id = [...selection.nodes][0]!;
    const node = project.nodes.find((n) => n.id === id);
    const fitting = analysis.byNode.get(id);
    body = node && (
      <>
        {fitting && <FittingResults fitting={fitting} project={project} />}
        {/* Keyed by the node: a refused entry left in a field stays with its node, not the next one shown. */}
        <NodeDetails key={id} node={node} project={project} pipeCount={analysis.legs.get(id)?.length ?? 0} />
      </>
    );
  } else if (count === 1) {
    const pipe = project.pipes.find((p) => p.id === [...selection.pipes][0]);
    body = pipe && <PipeDetails key={pipe.id} pipe={pipe} project={project} />;
  } else if (count > 1) {
    body = (
      <section className="inputs">
        <h3>{count} items selected</h3>
        <p className="muted">Drag a selected node to move them together, or press Delete to remove them.</p>
      </section>
    );
  } else body = <RouteSummary />;
  return (
    <aside className="details" aria-label="Details" data-testid="details" ref={panel} tabIndex={-1}>
      {body}
      <p className="caution-foot" role="note">
        {SHORT_CAUTION}
      </p>
    </aside>
  );
}
