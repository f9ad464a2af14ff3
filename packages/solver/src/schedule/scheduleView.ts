import type { Analysis } from '../analysis/analyse.js';
import { diagnosticText } from '../diagnostics/wording.js';
import { wordingContext } from '../diagnostics/context.js';
import type { UnitSystem } from '../units/conversions.js';
import { columnNumber, columnUnit, type ColumnKind } from './columnUnits.js';
import { SCHEDULE_COLUMNS, type CellContext } from './scheduleColumns.js';
import { scheduleNotes, type ScheduleNote } from './scheduleNotes.js';
import { scheduleOf, type ScheduleFitting } from './scheduleRows.js';

export interface ViewColumn {
  id: string;
  /** "Thrust (kN)": the heading with the column's one unit */
  heading: string;
  kind: ColumnKind;
}

export interface ViewRow {
  fitting: ScheduleFitting;
  /** one text per column, the same in every output */
  cells: Record<string, string>;
  /** the SI number behind a numeric cell, for sorting; null for text and empty cells */
  values: Record<string, number | null>;
}

/** The schedule as every output shows it: columns, rows in crew order, numbered notes, in one unit system. */
export interface ScheduleView {
  units: UnitSystem;
  columns: ViewColumn[];
  rows: ViewRow[];
  notes: ScheduleNote[];
}

const headingOf = (heading: string, kind: ColumnKind, units: UnitSystem) =>
  kind === 'text' ? heading : `${heading} (${columnUnit(kind, units)})`;

const views = new WeakMap<Analysis, Partial<Record<UnitSystem, ScheduleView>>>();

/**
 * The one view model of the schedule (CLI table, CSV, app table, print): the cell texts are made here
 * and only here, so every output shows the same value for the same cell. Memoised per analysis and units.
 */
export function scheduleView(a: Analysis, units: UnitSystem): ScheduleView {
  const cached = views.get(a)?.[units];
  if (cached) return cached;
  const schedule = scheduleOf(a);
  const context = wordingContext(a, units);
  // Findings of the project as a whole come first, under no mark; a fitting's own follow.
  const rowsForNotes = [
    { mark: '', diagnostics: schedule.diagnostics.filter((d) => !a.byNode.has(d.subject.node ?? '')) },
    ...schedule.fittings,
  ];
  const { notes, byMark } = scheduleNotes(rowsForNotes, (d) => diagnosticText(d, context));
  const cellContext: CellContext = {
    project: a.project,
    units,
    notes: (f) => (byMark.get(f.mark) ?? []).join(', '),
  };
  const rows = schedule.fittings.map((fitting): ViewRow => {
    const cells: Record<string, string> = {};
    const values: Record<string, number | null> = {};
    for (const c of SCHEDULE_COLUMNS) {
      const v = c.cell(fitting, cellContext);
      values[c.id] = typeof v === 'number' ? v : null;
      cells[c.id] =
        v === null ? '' : typeof v === 'string' ? v : c.kind === 'text' ? String(v) : columnNumber(v, c.kind, units);
    }
    return { fitting, cells, values };
  });
  const view: ScheduleView = {
    units,
    columns: SCHEDULE_COLUMNS.map((c) => ({ id: c.id, heading: headingOf(c.heading, c.kind, units), kind: c.kind })),
    rows,
    notes,
  };
  views.set(a, { ...views.get(a), [units]: view });
  return view;
}

/** The columns of a view with these ids, in the order given. */
export const pickColumns = (view: ScheduleView, ids: readonly string[]): ViewColumn[] =>
  ids.map((id) => view.columns.find((c) => c.id === id)!).filter(Boolean);
