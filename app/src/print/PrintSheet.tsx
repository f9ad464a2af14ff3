import { memo, useEffect, useLayoutEffect, useMemo, useRef, useState } from 'react';
import {
  PAGE_CAUTIONS,
  columnNumber,
  columnUnit,
  noteAfterHeading,
  pickColumns,
  positionColumns,
  takeOff,
  takeOffRows,
  type Analysis,
  type Project,
  type ScheduleView,
  type UnitSystem,
  type ViewRow,
} from '@mainbrace/solver';
import { useAnalysis, useApp } from '../state/StoreContext.js';
import { KeyPlan } from './KeyPlan.js';
import { RestraintSketch } from './RestraintSketch.js';
import { TakeOffDigest, TakeOffTable } from './TakeOffTable.js';
import { TitleBlock } from './TitleBlock.js';
import { sizedForLine } from './sizedFor.js';
import { Appendix } from './Appendix.js';
import { PlanExportButtons } from './PlanExportButtons.js';
import { scheduleViewOf } from '../state/scheduleViewOf.js';

/** Fittings per crew page: six sketches a page is the budget (crew-sheet.md). */
export const PER_PAGE = 6;
/** Pages made per step while the sheet is prepared: each step stays a short task on a long route. */
const PAGES_PER_STEP = 1;
/**
 * Sheets in one print run: a long route is printed in runs of this many sheets (a browser holding
 * 1,700 sheets at once takes minutes to lay them out), chosen in the print dialog.
 */
export const SHEETS_PER_RUN = 50;

/** The schedule columns of the crew part: where each fitting is and what to build, no forces. */
const crewColumns = (project: Project) => [
  'mark',
  ...positionColumns(project.sheet?.chainageStyle),
  'fitting',
  'od',
  'east',
  'north',
  'level',
  'ground',
  'restraint',
  'concrete',
  'notes',
];

type Paper = 'a4' | 'letter';

/**
 * Makes `total` items in steps of `step` (one step per macrotask), so that a 10,000-node route's
 * sheet is built without a long task: returns how many are ready.
 */
function useSteps(total: number, step: number, key: number): number {
  const [state, setState] = useState(() => ({ total, key, ready: Math.min(total, step) }));
  // A new schedule or run starts over (adjusting state during render, not in an effect).
  const current = state.total === total && state.key === key;
  if (!current) setState({ total, key, ready: Math.min(total, step) });
  const ready = current ? state.ready : Math.min(total, step);
  useEffect(() => {
    if (ready >= total) return;
    const id = setTimeout(() => setState((s) => ({ ...s, ready: Math.min(s.total, s.ready + step) })), 0);
    return () => clearTimeout(id);
  }, [ready, total, step]);
  return ready;
}

const CrewPage = memo(function CrewPage({
  rows,
  index,
  pages,
  view,
  analysis,
  project,
  units,
  extra,
  side,
  onSideOverflow,
  onExtraOverflow,
}: {
  rows: ViewRow[];
  index: number;
  pages: number;
  view: ScheduleView;
  analysis: Analysis;
  project: Project;
  units: UnitSystem;
  /** what fills the free half of a short last page: the job's take-off */
  extra?: React.ReactNode;
  /** what follows the notes in the side column of a full last page: the job's take-off */
  side?: React.ReactNode;
  /** the side column could not hold `side`: it must go on a page of its own */
  onSideOverflow?: () => void;
  /** the page could not hold `extra` below its sketches and notes: it must go elsewhere */
  onExtraOverflow?: () => void;
}) {
  const aside = useRef<HTMLElement>(null);
  const body = useRef<HTMLDivElement>(null);
  useLayoutEffect(() => {
    const el = aside.current;
    if (!el || el.scrollHeight <= el.clientHeight + 1) return;
    if (side && onSideOverflow) onSideOverflow();
    // Notes too many for the side column are set closer rather than cut off at the page's foot.
    else el.classList.add('sheet-side-tight');
  }, [side, onSideOverflow]);
  // Long notes (a route that is not adequate) can leave the take-off no room: it would print over the
  // cautions.
  useLayoutEffect(() => {
    const el = body.current;
    const own = el?.querySelector(':scope > .sheet-takeoff');
    const over = (e: Element | null | undefined) => !!e && e.scrollHeight > e.clientHeight + 1;
    if (extra && onExtraOverflow && (over(el) || over(own))) onExtraOverflow();
  }, [extra, onExtraOverflow]);
  const columns = pickColumns(view, crewColumns(project));
  const marks = new Set(rows.map((r) => r.fitting.mark));
  const notes = view.notes.filter((n) => n.marks.some((m) => marks.has(m)) || (index === 0 && n.marks.length === 0));
  const pageTakeOff = takeOff(
    rows.map((r) => r.fitting),
    project,
    units,
  );
  const position = positionColumns(project.sheet?.chainageStyle)[0]!;
  // Chainage restarts on each run: a sheet holding the end of one run and the start of the next gives
  // each run's span of its own.
  const spans: (typeof rows)[] = [];
  for (const r of rows) {
    const last = spans[spans.length - 1];
    if (last && last[0]!.fitting.run === r.fitting.run) last.push(r);
    else spans.push([r]);
  }
  const subtitle = spans
    .map((span) => {
      const first = span[0]!.cells,
        end = span[span.length - 1]!.cells;
      if (span.length === 1) return `${first.mark}, ${position} ${first[position]}`;
      const word = position === 'station' ? 'stations' : position;
      return `${first.mark}–${end.mark}, ${word} ${first[position]} to ${end[position]}`;
    })
    .join('; ');
  return (
    <section className="sheet-page" data-testid="crew-page" aria-label={`Sheet ${index + 1} of ${pages}`}>
      <TitleBlock
        project={project}
        units={units}
        subtitle={subtitle}
        sheet={`Sheet ${index + 1} of ${pages}`}
        note={
          pageTakeOff.concreteNet > 0
            ? `Concrete this sheet ${columnNumber(pageTakeOff.concreteNet, 'volume', units)} ${columnUnit('volume', units)} net, ` +
              `${columnNumber(pageTakeOff.concreteOrdered, 'volume', units)} ${columnUnit('volume', units)} to order with ${Math.round(pageTakeOff.waste * 1000) / 10} % waste`
            : undefined
        }
        detail={sizedForLine(
          project,
          rows.map((r) => r.fitting),
          units,
        )}
      />
      <table className="sheet-schedule crew-table">
        <thead>
          <tr>
            {columns.map((c) => (
              <th key={c.id} className={`col-${c.id}`}>
                {c.heading}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr
              key={r.fitting.node}
              className={r.fitting.diagnostics.some((d) => d.severity === 'error') ? 'not-adequate' : ''}
            >
              {columns.map((c) => (
                <td key={c.id} className={c.kind === 'text' ? (c.id === 'mark' ? 'mark' : '') : 'num'}>
                  {r.cells[c.id]}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <div className={`sheet-body ${extra ? 'with-extra' : ''}`} ref={body}>
        <div className={`sketches ${rows.length <= PER_PAGE / 2 ? 'one-row' : ''}`}>
          {rows.map((r) => (
            <RestraintSketch
              key={r.fitting.node}
              fitting={r.fitting}
              analysis={analysis}
              units={units}
              notes={r.cells.notes}
            />
          ))}
        </div>
        <aside className="sheet-side" ref={aside}>
          <KeyPlan project={project} analysis={analysis} marks={marks} />
          {notes.length > 0 && (
            <ol className="sheet-notes">
              {notes.map((n) => (
                <li key={n.number} value={n.number} className={`note-${n.severity}`}>
                  {n.severity === 'error' ? <strong>NOT ADEQUATE. </strong> : null}
                  {noteAfterHeading(n)} ({n.marks.join(', ') || 'whole route'})
                </li>
              ))}
            </ol>
          )}
          {side}
        </aside>
        {extra}
      </div>
      <footer className="sheet-foot">
        <ul className="sheet-cautions">
          {PAGE_CAUTIONS.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
        <div className="sheet-pageno">
          Sheet {index + 1} of {pages}
        </div>
      </footer>
    </section>
  );
});

/**
 * The printable sheet (crew-sheet.md): the crew part — pages of six fittings, each with the title
 * block, the schedule rows, a dimensioned sketch per fitting, the key plan, the numbered notes and
 * quantities, cautions and page number — then the job's quantities take-off, then, if asked for, the
 * calculation appendix for the reviewing engineer. Pages are made a few at a time with progress, so
 * that a long route does not freeze the tab.
 */
export function PrintSheet({ onClose }: { onClose: () => void }) {
  const project = useApp((s) => s.project);
  const analysis = useAnalysis();
  const units = useApp((s) => s.units);
  const [appendix, setAppendix] = useState(false);
  // The paper of the sheet's units: Letter where it prints feet and inches, else A4.
  const [paper, setPaper] = useState<Paper>(() => (units === 'us' ? 'letter' : 'a4'));
  const view = scheduleViewOf(analysis, units);
  const pages = useMemo(() => {
    const out: ViewRow[][] = [];
    for (let i = 0; i < view.rows.length; i += PER_PAGE) out.push(view.rows.slice(i, i + PER_PAGE));
    return out;
  }, [view]);
  // The job's take-off fills the second row of sketches of a last page with three fittings or fewer;
  // on a fuller last page, or where long notes leave it no room below them, it follows the notes in the
  // side column, and only where it does not fit there does it take a page of its own (the crew part keeps
  // to one page per six fittings).
  const [pageOverflow, setPageOverflow] = useState<readonly ViewRow[][] | null>(null);
  const fitsOnLast = (pages[pages.length - 1]?.length ?? PER_PAGE) <= PER_PAGE / 2 && pageOverflow !== pages;
  const markPageOverflow = useMemo(() => () => setPageOverflow(pages), [pages]);
  const [sideOverflow, setSideOverflow] = useState<readonly ViewRow[][] | null>(null);
  const inSide = !fitsOnLast && sideOverflow !== pages;
  const markSideOverflow = useMemo(() => () => setSideOverflow(pages), [pages]);
  const runs = Math.ceil(pages.length / SHEETS_PER_RUN);
  const [run, setRun] = useState(0);
  const first = Math.min(run, Math.max(0, runs - 1)) * SHEETS_PER_RUN;
  const inRun = pages.slice(first, first + SHEETS_PER_RUN);
  const lastRun = first + inRun.length >= pages.length;
  const ready = useSteps(inRun.length, PAGES_PER_STEP, first);
  const done = ready >= inRun.length;
  // The route's take-off prints after the last sheet: made only for the last run.
  const job = useMemo(
    () =>
      !lastRun
        ? []
        : takeOffRows(
            takeOff(
              view.rows.map((r) => r.fitting),
              project,
              units,
            ),
            units,
          ),
    [view, project, units, lastRun],
  );
  return (
    <div className={`print-preview paper-${paper}`} data-testid="print-sheet">
      <div className="print-toolbar no-print">
        <button onClick={() => window.print()} disabled={!done} data-testid="print-now">
          Print
        </button>
        <button onClick={onClose}>Back to the plan</button>
        <label>
          Paper{' '}
          <select value={paper} onChange={(e) => setPaper(e.target.value as Paper)} aria-label="Paper size">
            <option value="a4">A4 landscape</option>
            <option value="letter">Letter landscape</option>
          </select>
        </label>
        <label>
          <input
            type="checkbox"
            checked={appendix}
            onChange={(e) => setAppendix(e.target.checked)}
            data-testid="print-appendix"
          />{' '}
          Calculation appendix (for the reviewing engineer)
        </label>
        {runs > 1 && (
          <label>
            Sheets{' '}
            <select
              value={run}
              onChange={(e) => setRun(Number(e.target.value))}
              aria-label="Sheets to print"
              data-testid="print-run"
            >
              {Array.from({ length: runs }, (_, r) => (
                <option key={r} value={r}>
                  {r * SHEETS_PER_RUN + 1}–{Math.min(pages.length, (r + 1) * SHEETS_PER_RUN)} of {pages.length}
                </option>
              ))}
            </select>
          </label>
        )}
        <PlanExportButtons />
        <span className="muted" role="status" aria-live="polite" data-testid="print-progress">
          {done
            ? `${runs > 1 ? `Sheets ${first + 1}–${first + inRun.length} of ` : ''}${pages.length} sheet${pages.length === 1 ? '' : 's'} for ${view.rows.length} fittings${appendix ? ', then the appendix' : ''}`
            : `Preparing sheet ${first + ready} of ${first + inRun.length}…`}
        </span>
      </div>
      <article className="sheet crew-sheet" data-ready={done ? 'yes' : 'no'}>
        {inRun.slice(0, ready).map((rows, k) => {
          const i = first + k;
          return (
            <CrewPage
              key={i}
              rows={rows}
              index={i}
              pages={pages.length}
              view={view}
              analysis={analysis}
              project={project}
              units={units}
              extra={
                i === pages.length - 1 && fitsOnLast ? (
                  <section className="sheet-takeoff in-page" data-testid="job-takeoff">
                    <h3>Quantities take-off — whole route</h3>
                    <div className="takeoff-pair">
                      <TakeOffTable rows={job.filter((l) => l.section === 'Concrete')} compact />
                      <TakeOffTable
                        rows={job.filter((l) => l.section === 'Restrained joints' || l.section === 'Anchors')}
                        compact
                      />
                      <TakeOffTable rows={job.filter((l) => l.section === 'Fittings')} compact />
                    </div>
                  </section>
                ) : undefined
              }
              side={
                i === pages.length - 1 && inSide ? (
                  <section className="sheet-takeoff in-side" data-testid="job-takeoff">
                    <h3>Quantities take-off — whole route</h3>
                    <TakeOffDigest rows={job} />
                  </section>
                ) : undefined
              }
              onSideOverflow={i === pages.length - 1 && inSide ? markSideOverflow : undefined}
              onExtraOverflow={i === pages.length - 1 && fitsOnLast ? markPageOverflow : undefined}
            />
          );
        })}
        {pages.length === 0 && <p className="muted">No fitting needs restraint yet: draw the route first.</p>}
        {done && lastRun && pages.length > 0 && !fitsOnLast && !inSide && (
          <section className="sheet-takeoff" data-testid="job-takeoff">
            <h2>Quantities take-off — whole route</h2>
            <TakeOffTable rows={job} />
          </section>
        )}
        {done && lastRun && appendix && <Appendix project={project} analysis={analysis} units={units} />}
      </article>
    </div>
  );
}
