import { useMemo, useState } from 'react';
import { notVerifiedText, REGISTER, surgeEstimate, unverified, wordingContext, type LoadCase } from '@mainbrace/solver';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { freeCaseName } from './CaseNameField.js';
import { nextId } from '../state/documentEdits.js';
import { show } from '../format/quantity.js';
import { NumberField } from './NumberField.js';

/** 2 ft/s, the sudden stop the older AWWA C900 classes allowed for: a starting value the user changes. */
const DEFAULT_CHANGE = 0.6096;

/** The case `surgeEstimate` adds the rise to, by its own rule: the working case, else the first that is neither a test nor a surge. */
const surgeWorkingCase = (cases: readonly LoadCase[]): LoadCase =>
  cases.find((c) => c.kind === 'working') ?? cases.find((c) => c.kind !== 'test' && c.kind !== 'surge') ?? cases[0]!;

/**
 * A surge case suggested from a velocity change (Joukowsky ΔP = ρ·a·Δv, a by Korteweg for each pipe's
 * material, wall and diameter), the largest rise over the route added to the working case. The user
 * accepts it into a surge case; nothing changes until then.
 */
export function SurgeSuggestion() {
  const project = useApp((s) => s.project);
  const u = useApp((s) => s.units);
  const analysis = useAnalysis();
  const actions = useActions();
  const [mode, setMode] = useState<'flow' | 'change'>('flow');
  const [change, setChange] = useState(DEFAULT_CHANGE);
  // The per-pipe list is worded only while it is open: on a long route it is thousands of lines.
  const [listOpen, setListOpen] = useState(false);
  // The estimate reads the pipes, the water and the working case only: a test-pressure change (the
  // slider) keeps all three, so the estimate and the largest pipe's name are not worked out again.
  const working = surgeWorkingCase(project.loadCases);
  const { pipes, water } = project;
  const estimate = useMemo(
    () => surgeEstimate({ ...project, pipes, water, loadCases: [working] }, mode === 'change' ? change : undefined),
    // eslint-disable-next-line react-hooks/exhaustive-deps -- the estimate reads only these parts of the project
    [pipes, water, working, mode, change],
  );
  const surge = project.loadCases.find((c) => c.kind === 'surge');
  const words = wordingContext(analysis, u);
  // Naming a pipe indexes the whole route once per document (the name reads marks and positions only).
  const { marks } = analysis;
  const largestPipe = estimate?.largest.pipe;
  const largestName = useMemo(
    () => (largestPipe === undefined ? '' : words.pipeName(largestPipe)),
    // eslint-disable-next-line react-hooks/exhaustive-deps -- the name reads the marks, nodes and pipes only
    [largestPipe, marks, project.nodes, pipes, u],
  );
  const caveats = unverified(['surge.water-bulk-modulus', 'surge.pipe-elasticity', 'surge.support-factor']);

  const accept = () => {
    if (!estimate) return;
    const datum = working.datumElevation !== undefined ? { datumElevation: working.datumElevation } : {};
    if (surge) {
      actions.updateCase(surge.id, { pressure: estimate.suggestedPressure, ...datum });
      return;
    }
    const id = nextId(
      'surge',
      project.loadCases.map((x) => x.id),
    );
    const c: LoadCase = {
      id,
      label: freeCaseName(project.loadCases, id, 'Working + surge (estimate)'),
      kind: 'surge',
      pressure: estimate.suggestedPressure,
      flowFactor: working.flowFactor,
      ...datum,
    };
    actions.addCase(c);
  };

  return (
    <div className="test-control surge-suggestion" aria-label="Surge estimate" data-testid="surge-suggestion">
      <h4>Surge estimate</h4>
      <div className="field">
        <label htmlFor="surge-mode">Velocity change</label>
        <select id="surge-mode" value={mode} onChange={(e) => setMode(e.target.value as 'flow' | 'change')}>
          <option value="flow">Each pipe’s working flow stopping at once</option>
          <option value="change">The same change in every pipe</option>
        </select>
      </div>
      {mode === 'change' && (
        <NumberField
          label="Change of velocity"
          value={change}
          dimension="velocity"
          units={u}
          min={0}
          exclusiveMin
          max={10}
          onCommit={setChange}
          testId="surge-velocity"
        />
      )}
      {estimate ? (
        <>
          <p>
            Largest rise on {largestName}: ΔP = ρ·a·Δv ={' '}
            <strong data-testid="surge-rise">{show(estimate.largest.rise, 'pressure', u)}</strong> (wave speed a ={' '}
            {show(estimate.largest.waveSpeed, 'velocity', u, 4)} by Korteweg, Δv ={' '}
            {show(estimate.largest.velocityChange, 'velocity', u, 3)}).
          </p>
          <p>
            {words.caseName(estimate.workingCase)} + surge ={' '}
            <strong data-testid="surge-suggested">{show(estimate.suggestedPressure, 'pressure', u)}</strong> at its
            datum.
          </p>
          <button onClick={accept} data-testid="surge-accept">
            {surge ? `Set “${words.caseName(surge.id)}” to this` : 'Add as a surge case'}
          </button>
          <details onToggle={(e) => setListOpen(e.currentTarget.open)}>
            <summary>Every pipe</summary>
            {listOpen && (
              <ul>
                {estimate.pipes.map((p) => (
                  <li key={p.pipe}>
                    {words.pipeName(p.pipe)}: a {show(p.waveSpeed, 'velocity', u, 4)}, Δv{' '}
                    {show(p.velocityChange, 'velocity', u, 3)}, ΔP {show(p.rise, 'pressure', u)}
                  </li>
                ))}
              </ul>
            )}
          </details>
          {estimate.unknownMaterial.length > 0 && (
            <p className="muted small">
              Left out, no modulus for their material: {estimate.unknownMaterial.map(words.pipeName).join('; ')}.
            </p>
          )}
        </>
      ) : (
        <p className="muted">Give the pipes their flows, or a velocity change, for an estimate.</p>
      )}
      <p className="muted small">
        Instant closure (Joukowsky) with the rise taken at its largest everywhere: an upper estimate, not a transient
        analysis. Water and pipe properties {caveats.map((id) => notVerifiedText(REGISTER[id])).join('; ')}.
      </p>
    </div>
  );
}
