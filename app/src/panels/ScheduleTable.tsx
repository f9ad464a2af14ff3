import { useMemo, useState } from 'react';
import {
  caseLabel,
  restraintConcrete,
  restraintSummary,
  scheduleOf,
  SHORT_CAUTION,
  norm,
  type ScheduleFitting,
} from '@mainbrace/solver';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { show, showColumnForce } from '../format/quantity.js';
import { bearingText, KIND_NAME } from '../format/fittingNames.js';

type SortKey = 'tag' | 'chainage' | 'kind' | 'pressure' | 'thrust' | 'concrete';

const concreteOf = (f: ScheduleFitting) => restraintConcrete(f.restraint);
const SORTS: Record<SortKey, (a: ScheduleFitting, b: ScheduleFitting) => number> = {
  tag: (a, b) => a.tag.localeCompare(b.tag, undefined, { numeric: true }),
  chainage: (a, b) => a.chainage - b.chainage,
  kind: (a, b) => a.kind.localeCompare(b.kind),
  pressure: (a, b) => a.designPressure - b.designPressure,
  thrust: (a, b) => norm(a.thrust) - norm(b.thrust),
  concrete: (a, b) => concreteOf(a) - concreteOf(b),
};

/** One row per fitting, sortable; a row selects its fitting on the plan. The canvas in words. */
export function ScheduleTable() {
  const project = useApp((s) => s.project);
  const selection = useApp((s) => s.selection);
  const analysis = useAnalysis();
  const actions = useActions();
  const [sort, setSort] = useState<{ key: SortKey; up: boolean }>({ key: 'chainage', up: true });
  const schedule = scheduleOf(analysis);
  const rows = useMemo(() => {
    const list = [...schedule.fittings].sort(SORTS[sort.key]);
    return sort.up ? list : list.reverse();
  }, [schedule, sort]);
  const u = project.units;
  const totals = schedule.fittings.reduce(
    (t, f) => ({
      block: t.block + restraintConcrete({ ...f.restraint, anchor: null }),
      anchor: t.anchor + (f.restraint.anchor?.concreteVolume ?? 0),
    }),
    { block: 0, anchor: 0 },
  );
  const head = (key: SortKey, text: string) => (
    <th aria-sort={sort.key === key ? (sort.up ? 'ascending' : 'descending') : 'none'}>
      <button className="th-sort" onClick={() => setSort({ key, up: sort.key === key ? !sort.up : true })}>
        {text}
        {sort.key === key ? (sort.up ? ' ▲' : ' ▼') : ''}
      </button>
    </th>
  );
  const diam = (f: ScheduleFitting) =>
    [...new Set(f.pipes.map((p) => show(p.outsideDiameter, 'diameter', u)))].join(' / ');
  return (
    <div className="schedule">
      <table className="schedule-table" data-testid="schedule-table">
        <thead>
          <tr>
            {head('tag', 'Tag')}
            {head('chainage', 'Chainage')}
            {head('kind', 'Fitting')}
            <th>Pipe OD</th>
            <th>Defl.</th>
            {head('pressure', 'Design pressure')}
            <th>Governs</th>
            {head('thrust', 'Thrust')}
            <th>Static / dynamic</th>
            <th title="Direction the thrust pushes, clockwise from north">Bears (from N)</th>
            <th>Soil</th>
            <th>Restraint</th>
            {head('concrete', 'Concrete')}
            <th>Warnings</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((f) => {
            const gov = f.cases.find((c) => c.case === f.governingCase)!;
            return (
              <tr
                key={f.node}
                className={selection.nodes.has(f.node) ? 'selected' : ''}
                onClick={() => actions.selectNode(f.node)}
                tabIndex={0}
                onKeyDown={(e) => e.key === 'Enter' && actions.selectNode(f.node)}
                data-testid={`row-${f.node}`}
              >
                <td className="tag">{f.tag}</td>
                <td className="num">{show(f.chainage, 'length', u, 4)}</td>
                <td>{KIND_NAME[f.kind]}</td>
                <td className="num">{diam(f)}</td>
                <td className="num">
                  {f.deflection !== null
                    ? show(f.deflection, 'angle', u)
                    : f.branchAngle !== null
                      ? show(f.branchAngle, 'angle', u)
                      : ''}
                </td>
                <td className="num">{show(f.designPressure, 'pressure', u)}</td>
                <td>{caseLabel(project, f.governingCase)}</td>
                <td className="num strong">{showColumnForce(norm(f.thrust), u)}</td>
                <td className="num">
                  {showColumnForce(norm(gov.static), u)} / {showColumnForce(norm(gov.dynamic), u)}
                </td>
                <td>{bearingText(f.bearingDirection)}</td>
                <td>{project.soils.find((s) => s.id === f.soil)?.label ?? f.soil}</td>
                <td>{restraintSummary(f, u)}</td>
                <td className="num">{concreteOf(f) > 0 ? show(concreteOf(f), 'volume', u) : '—'}</td>
                <td className="warn-cell">
                  {f.warnings.length > 0 ? <span title={f.warnings.join('\n')}>⚠ {f.warnings.length}</span> : ''}
                </td>
              </tr>
            );
          })}
        </tbody>
        <tfoot>
          <tr>
            <td colSpan={12}>
              {schedule.fittings.length} fittings · concrete in blocks {show(totals.block, 'volume', u)}, in anchors{' '}
              {show(totals.anchor, 'volume', u)}
            </td>
            <td className="num strong">{show(totals.block + totals.anchor, 'volume', u)}</td>
            <td />
          </tr>
        </tfoot>
      </table>
      <p className="caution-foot">{SHORT_CAUTION}</p>
    </div>
  );
}
