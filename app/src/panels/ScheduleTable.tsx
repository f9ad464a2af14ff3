import { startTransition, useEffect, useMemo, useRef, useState } from 'react';
import {
  APP_COLUMNS,
  columnNumber,
  noteAfterHeading,
  pickColumns,
  positionColumns,
  SHORT_CAUTION,
  type ViewRow,
} from '@mainbrace/solver';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { scheduleViewOf } from '../state/scheduleViewOf.js';

/** A table longer than this renders only the rows in view (and a margin), with spacers for the rest. */
const WINDOW_FROM = 300;
/** Rows rendered beyond the visible ones, above and below, so a scroll never shows a gap. */
const OVERSCAN = 30;

/**
 * The rows of a long table that are in view of its scrolling ancestor: a 10,000-fitting schedule is
 * 140,000 cells, more than a browser lays out in a frame, while a screenful is a few hundred.
 * Rows are taken as one height (measured from a rendered row).
 */
function useRowWindow(total: number, table: React.RefObject<HTMLTableElement | null>) {
  // A first window of a few rows: the page's first layout after opening a long route stays small.
  const [win, setWin] = useState({ first: 0, count: OVERSCAN + 10, rowPx: 24 });
  const windowed = total > WINDOW_FROM;
  useEffect(() => {
    const el = table.current;
    const scroller = el?.closest('.drawer-body') ?? el?.parentElement;
    if (!windowed || !el || !scroller) return;
    const update = () => {
      const row = el.tBodies[0]?.rows[1];
      const rowPx = row && row.offsetHeight > 0 ? row.offsetHeight : 24;
      const top = scroller.scrollTop - el.offsetTop;
      const first = Math.max(0, Math.floor(top / rowPx) - OVERSCAN);
      const count = Math.ceil(scroller.clientHeight / rowPx) + 2 * OVERSCAN;
      // A transition: React renders the new rows in slices, so a 10,000-row table never holds the thread.
      startTransition(() =>
        setWin((w) => (w.first === first && w.count === count && w.rowPx === rowPx ? w : { first, count, rowPx })),
      );
    };
    // No measuring here: reading a row's height now would lay out the page inside this task. The
    // observer's first call comes after the browser's own layout, where the reads cost nothing.
    scroller.addEventListener('scroll', update, { passive: true });
    const ro = new ResizeObserver(update);
    ro.observe(scroller);
    return () => {
      scroller.removeEventListener('scroll', update);
      ro.disconnect();
    };
  }, [windowed, table]);
  if (!windowed) return { first: 0, last: total, above: 0, below: 0 };
  const first = Math.min(win.first, Math.max(0, total - win.count));
  const last = Math.min(total, first + win.count);
  return { first, last, above: first * win.rowPx, below: (total - last) * win.rowPx };
}

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
  const view = useMemo(() => scheduleViewOf(analysis, units), [analysis, units]);
  // Chainage, stations or both, as the project's sheet setting says (the print and the CLI table do the same).
  const style = useApp((s) => s.project.sheet?.chainageStyle);
  const columns = pickColumns(
    view,
    APP_COLUMNS.flatMap((id) => (id === 'chainage' ? positionColumns(style) : [id])),
  );
  const rows = useMemo(() => {
    const sorted = sort ? [...view.rows].sort(compare(sort.id)) : view.rows;
    return sort && !sort.up ? sorted.reverse() : sorted;
  }, [view, sort]);
  const totalColumn = columns.findIndex((c) => c.id === 'concrete');
  const table = useRef<HTMLTableElement>(null);
  const shown = useRowWindow(rows.length, table);
  return (
    <div className="schedule">
      <table className="schedule-table" data-testid="schedule-table" ref={table}>
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
          {shown.above > 0 && <tr aria-hidden="true" className="spacer-row" style={{ height: shown.above }} />}
          {rows.slice(shown.first, shown.last).map((r) => {
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
                    {c.id === 'mark' && worst === 'error' && (
                      <span className="na-flag" title="Not adequate: see the notes">
                        {' '}
                        ✕<span className="visually-hidden"> not adequate</span>
                      </span>
                    )}
                  </td>
                ))}
              </tr>
            );
          })}
          {shown.below > 0 && <tr aria-hidden="true" className="spacer-row" style={{ height: shown.below }} />}
        </tbody>
        <tfoot>
          <tr>
            <td colSpan={totalColumn}>{view.rows.length} fittings · total concrete</td>
            <td className="num strong">{columnNumber(view.concrete, 'volume', units)}</td>
            <td colSpan={columns.length - totalColumn - 1} />
          </tr>
        </tfoot>
      </table>
      {view.notes.length > 0 && (
        <ol className="schedule-notes" data-testid="schedule-notes">
          {view.notes.map((n) => (
            <li key={n.number} value={n.number} className={`note-${n.severity}`}>
              {n.severity === 'error' ? <strong>NOT ADEQUATE. </strong> : null}
              {noteAfterHeading(n)} <span className="muted">({n.marks.join(', ') || 'whole route'})</span>
            </li>
          ))}
        </ol>
      )}
      <p className="caution-foot">{SHORT_CAUTION}</p>
    </div>
  );
}
