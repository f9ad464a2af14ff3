import { useMemo, useState } from 'react';
import { fromDisplay, proposeTestPressure, toDisplay, type TestRule } from '@mainbrace/solver';
import { useActions, useApp } from '../state/StoreContext.js';
import { show, unitOf } from '../format/quantity.js';
import { NumberField } from './NumberField.js';

/** The field-test pressure: a slider that recomputes the route while it moves, and the C600/C605 helper. */
export function TestPressureControl() {
  const project = useApp((s) => s.project);
  const actions = useActions();
  // The rule's first choice is read from the pipes once, when the control first shows (not per render).
  const [rule, setRule] = useState<TestRule>(() =>
    project.pipes.some((p) => p.material === 'pvc') ? 'awwa-c605' : 'awwa-c600',
  );
  const u = useApp((s) => s.units);
  const test = project.loadCases.find((c) => c.kind === 'test') ?? project.loadCases.find((c) => c.id === 'test');
  const working =
    project.loadCases.find((c) => c.kind === 'working') ??
    project.loadCases.find((c) => c.id === 'working') ??
    project.loadCases[0]!;
  // A fixed range, so the slider does not rescale under the pointer: to 3.5 MPa (about 500 psi, above
  // ductile-iron pressure class 350 plus its margin), or further if a case already asks for more.
  const highest = Math.max(3.5e6, ...project.loadCases.map((c) => c.pressure * 1.2));
  const [range, setRange] = useState(highest);
  if (highest > range) setRange(highest);
  // The proposal reads the node elevations, the water and the working case: a test-pressure step (the
  // slider) changes none of them, so the route's nodes are not walked again at every step.
  const { nodes, water } = project;
  const datum = test?.datumElevation;
  const proposal = useMemo(
    () => proposeTestPressure({ ...project, nodes, water }, working, rule, datum),
    // eslint-disable-next-line react-hooks/exhaustive-deps -- the proposal reads only these parts of the project
    [nodes, water, working, rule, datum],
  );
  if (!test) return <p className="muted">Mark a case as “Field test” to get the live test-pressure control.</p>;
  const maxShown = Math.round(toDisplay(range, 'pressure', u));
  const step = u === 'us' ? 1 : 5;
  const setLive = (display: number) => {
    const pressure = fromDisplay(display, 'pressure', u);
    actions.liveEdit((p) => ({ ...p, loadCases: p.loadCases.map((c) => (c.id === test.id ? { ...c, pressure } : c)) }));
  };
  return (
    <div className="test-control" aria-label="Field test pressure">
      <h4>Field test pressure — {test.label ?? test.id}</h4>
      <input
        type="range"
        min={0}
        max={maxShown}
        step={step}
        value={toDisplay(test.pressure, 'pressure', u)}
        aria-label={`Field test pressure, ${unitOf('pressure', u)}`}
        data-testid="test-slider"
        onPointerDown={actions.beginLiveEdit}
        onKeyDown={actions.beginLiveEdit}
        onPointerUp={actions.endLiveEdit}
        onKeyUp={actions.endLiveEdit}
        onBlur={actions.endLiveEdit}
        onChange={(e) => setLive(Number(e.target.value))}
      />
      <NumberField
        label="Test pressure at its datum"
        value={test.pressure}
        dimension="pressure"
        units={u}
        min={0}
        max={10e6}
        onCommit={(pressure) => actions.updateCase(test.id, { pressure })}
        testId="test-pressure"
      />
      {proposal && (
        <div className="proposal">
          <label>
            Rule{' '}
            <select value={rule} onChange={(e) => setRule(e.target.value as TestRule)}>
              <option value="awwa-c600">AWWA C600 (ductile iron)</option>
              <option value="awwa-c605">AWWA C605 (PVC)</option>
            </select>
          </label>
          <ul>
            {proposal.criteria.map((c, i) => (
              <li key={i} className={i === proposal.governing ? 'strong' : ''}>
                {c.rule}: working {show(c.working, 'pressure', u)} at {show(c.elevation, 'elevation', u, 4)} → at least{' '}
                {show(c.least, 'pressure', u)} there, {show(c.atTestPoint, 'pressure', u)} at the test point
                {i === proposal.governing ? ' — governs' : ''}
              </li>
            ))}
          </ul>
          <button
            onClick={() =>
              actions.updateCase(test.id, {
                pressure: Math.ceil(proposal.pressure / 100) * 100,
                datumElevation: proposal.testPointElevation,
              })
            }
            data-testid="apply-proposal"
          >
            Use {show(proposal.pressure, 'pressure', u)} at {show(proposal.testPointElevation, 'elevation', u, 4)}
          </button>
          <p className="muted small">
            The test must not exceed the pipe, fitting or thrust-restraint design pressure, nor the rating of closed
            valves in the section.
          </p>
        </div>
      )}
    </div>
  );
}
