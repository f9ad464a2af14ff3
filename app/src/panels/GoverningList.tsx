import { useMemo } from 'react';
import { norm } from '@mainbrace/solver';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { showColumnForce } from '../format/quantity.js';
import { largestThrusts, tightestMargins } from '../state/routeFigures.js';

/** Which case governs how many fittings, and the fittings with the largest thrust and tightest margins. */
export function GoverningList() {
  const project = useApp((s) => s.project);
  const analysis = useAnalysis();
  const actions = useActions();
  const u = useApp((s) => s.units);
  // Worked out once per analysis, in one pass each (no sort of every fitting for five of them).
  const { counts, largest, tight } = useMemo(() => {
    const counts = new Map<string, number>();
    for (const f of analysis.fittings)
      counts.set(f.envelope.governing.caseId, (counts.get(f.envelope.governing.caseId) ?? 0) + 1);
    return { counts, largest: largestThrusts(analysis, 5), tight: tightestMargins(analysis, 5) };
  }, [analysis]);
  return (
    <div className="governing" data-testid="governing">
      <h4>Governing case</h4>
      <ul>
        {project.loadCases.map((c) => (
          <li key={c.id}>
            {c.label ?? c.id}: {counts.get(c.id) ?? 0} fittings
          </li>
        ))}
      </ul>
      <h4>Largest thrust (resultant, worst case)</h4>
      <ol>
        {largest.map((f) => (
          <li key={f.node.id}>
            <button className="link" onClick={() => actions.revealNode(f.node.id)}>
              {f.mark}
            </button>{' '}
            {showColumnForce(norm(f.envelope.governing.total), u)}
          </li>
        ))}
      </ol>
      <h4>Tightest passive margin</h4>
      <ol>
        {tight.map((f) => (
          <li key={f.node.id}>
            <button className="link" onClick={() => actions.revealNode(f.node.id)}>
              {f.mark}
            </button>{' '}
            {f.restraint.block!.passiveRatio.toFixed(2)} × thrust
          </li>
        ))}
      </ol>
    </div>
  );
}
