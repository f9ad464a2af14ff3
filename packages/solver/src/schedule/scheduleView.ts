import type { Analysis } from '../analysis/analyse.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { Wording } from '../diagnostics/wording.js';
import { wordingContext } from '../diagnostics/context.js';
import type { UnitSystem } from '../units/conversions.js';
import { columnNumber, columnUnit, type ColumnKind } from './columnUnits.js';
import { SCHEDULE_COLUMNS, type CellContext } from './scheduleColumns.js';
import { scheduleNotes, type ScheduleNote } from './scheduleNotes.js';
import { scheduleRowAt, type ScheduleFitting } from './scheduleRows.js';
import { shownConcrete } from './concrete.js';

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
  /** m³, the concrete of every row (the sum of the concrete column) */
  concrete: number;
}

const headingOf = (heading: string, kind: ColumnKind, units: UnitSystem) =>
  kind === 'text' ? heading : `${heading} (${columnUnit(kind, units)})`;

const views = new WeakMap<Analysis, Partial<Record<UnitSystem, ScheduleView>>>();

/**
 * The one view model of the schedule (CLI table, CSV, app table, print): the cell texts are made here
 * and only here, so every output shows the same value for the same cell. Memoised per analysis and units:
 * a program words its findings with one wording (WORDING), whichever call passes it first.
 */
export function scheduleView(a: Analysis, units: UnitSystem, wording: Wording): ScheduleView {
  const cached = views.get(a)?.[units];
  if (cached) return cached;
  const context = wordingContext(a, units);
  // Findings of the project as a whole come first, under no mark; a fitting's own follow.
  const rowsForNotes = [
    { mark: '', diagnostics: a.diagnostics.filter((d) => !a.byNode.has(d.subject.node ?? '')) },
    ...a.fittings,
  ];
  const words = (d: Diagnostic) => wording.text(d, context);
  const { notes, byMark } = scheduleNotes(rowsForNotes, words, wording.meanings, {
    pipe: context.pipeName,
    caseName: context.caseName,
  });
  const cellContext: CellContext = {
    project: a.project,
    units,
    notes: (f) => (byMark.get(f.mark) ?? []).join(', '),
    words,
  };
  const view: ScheduleView = {
    units,
    columns: SCHEDULE_COLUMNS.map((c) => ({ id: c.id, heading: headingOf(c.heading, c.kind, units), kind: c.kind })),
    rows: a.fittings.map((_, i) => lazyRow(a, i, cellContext, wording.text)),
    notes,
    concrete: scheduleConcrete(a, units),
  };
  views.set(a, { ...views.get(a), [units]: view });
  return view;
}

const totals = new WeakMap<Analysis, Partial<Record<UnitSystem, number>>>();

/**
 * m³, the concrete column's total as it prints: each piece rounded up in the display unit, as its own
 * line shows it, then added. Memoised apart from the view, so that a screen showing only the total (the
 * route summary, after every test-pressure change) does not word the schedule's notes.
 */
export function scheduleConcrete(a: Analysis, units: UnitSystem): number {
  const cached = totals.get(a)?.[units];
  if (cached !== undefined) return cached;
  const step = a.project.design.dimensionStep;
  const total = a.fittings.reduce((t, f) => t + shownConcrete(f.restraint, units, step), 0);
  totals.set(a, { ...totals.get(a), [units]: total });
  return total;
}

/**
 * Row `i` of the view, its cells made when first read: a table that shows the rows in view (or a
 * route opened at 10,000 fittings) does not word every cell of every row up front.
 */
function lazyRow(a: Analysis, i: number, context: CellContext, text: Wording['text']): ViewRow {
  let made: Pick<ViewRow, 'cells' | 'values'> | undefined;
  const make = () => (made ??= rowCells(scheduleRowAt(a, i, text), context));
  return {
    get fitting() {
      return scheduleRowAt(a, i, text);
    },
    get cells() {
      return make().cells;
    },
    get values() {
      return make().values;
    },
  };
}

function rowCells(fitting: ScheduleFitting, context: CellContext): Pick<ViewRow, 'cells' | 'values'> {
  const cells: Record<string, string> = {};
  const values: Record<string, number | null> = {};
  for (const c of SCHEDULE_COLUMNS) {
    const v = c.cell(fitting, context);
    values[c.id] = typeof v === 'number' ? v : null;
    cells[c.id] =
      v === null
        ? ''
        : typeof v === 'string'
          ? v
          : c.kind === 'text'
            ? String(v)
            : columnNumber(v, c.kind, context.units);
  }
  return { cells, values };
}

/** The columns of a view with these ids, in the order given. */
export const pickColumns = (view: ScheduleView, ids: readonly string[]): ViewColumn[] =>
  ids.map((id) => view.columns.find((c) => c.id === id)!).filter(Boolean);
