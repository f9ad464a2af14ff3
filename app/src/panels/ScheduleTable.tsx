import { useState } from 'react';
import { APP_COLUMNS, columnNumber, pickColumns, scheduleView, SHORT_CAUTION, type ViewRow } from '@mainbrace/solver';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';

/** Columns the table can sort by the number behind the cell; text columns sort by their text. */
function compare(id: string) {
  return (a: ViewRow, b: ViewRow) => {
    const x = a.values[id] ?? null;
    const y = b.values[id] ?? null;
    if (x !== null || y !== null) return (x ?? -Infinity) - (y ?? -Infinity);
    return a.cells[id]!.localeCompare(b.cells[id]!, undefined, { numeric: true });
  };
}

/**
 * One row per fitting in crew order (by run and chainage), sortable; a row selects its fitting on the
 * plan. The cells are the schedule view's, the same as the CSV, the command line and the print.
 */
export function ScheduleTable() {
  const selection = useApp((s) => s.selection);
  const units = useApp((s) => s.units);
  const analysis = useAnalysis();
  const actions = useActions();
  const [sort, setSort] = useState<{ id: string; up: boolean } | null>(null);
  const view = scheduleView(analysis, units);
  const columns = pickColumns(view, APP_COLUMNS);
  const sorted = sort ? [...view.rows].sort(compare(sort.id)) : view.rows;
  const rows = sort && !sort.up ? sorted.reverse() : sorted;
  const total = view.rows.reduce((t, r) => t + (r.values.concrete ?? 0), 0);
  const totalColumn = columns.findIndex((c) => c.id === 'concrete');
  return (
    <div className="schedule">
      <table className="schedule-table" data-testid="schedule-table">
        <thead>
          <tr>
            {columns.map((c) => (
              <th key={c.id} aria-sort={sort?.id === c.id ? (sort.up ? 'ascending' : 'descending') : 'none'}>
                <button
                  className="th-sort"
                  onClick={() => setSort({ id: c.id, up: sort?.id === c.id ? !sort.up : true })}
                >
                  {c.heading}
                  {sort?.id === c.id ? (sort.up ? ' ▲' : ' ▼') : ''}
                </button>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => {
            const node = r.fitting.node;
            const worst = r.fitting.diagnostics[0]?.severity;
            return (
              <tr
                key={node}
                className={`${selection.nodes.has(node) ? 'selected' : ''} ${worst === 'error' ? 'not-adequate' : ''}`}
                onClick={() => actions.revealNode(node)}
                tabIndex={0}
                onKeyDown={(e) => e.key === 'Enter' && actions.revealNode(node)}
                data-testid={`row-${node}`}
              >
                {columns.map((c) => (
                  <td
                    key={c.id}
                    className={c.kind === 'text' ? (c.id === 'mark' ? 'mark' : '') : 'num'}
                    data-col={c.id}
                  >
                    {r.cells[c.id]}
                  </td>
                ))}
              </tr>
            );
          })}
        </tbody>
        <tfoot>
          <tr>
            <td colSpan={totalColumn}>{view.rows.length} fittings · total concrete</td>
            <td className="num strong">{columnNumber(total, 'volume', units)}</td>
            <td colSpan={columns.length - totalColumn - 1} />
          </tr>
        </tfoot>
      </table>
      {view.notes.length > 0 && (
        <ol className="schedule-notes" data-testid="schedule-notes">
          {view.notes.map((n) => (
            <li key={n.number} value={n.number} className={`note-${n.severity}`}>
              {n.text} <span className="muted">({n.marks.join(', ')})</span>
            </li>
          ))}
        </ol>
      )}
      <p className="caution-foot">{SHORT_CAUTION}</p>
    </div>
  );
}
