import { columnNumber, formatSi, quantityText, unitSymbol, type Dimension, type UnitSystem } from '@mainbrace/solver';

/**
 * Dimensions that are a schedule column's kind wherever the app shows them: a pressure or a force reads
 * in that column's unit and precision, without thousands separators as the CSV needs (columnUnits.ts),
 * so the panel, the plan and the print word it as the schedule does.
 */
const COLUMN_KIND: Partial<Record<Dimension, 'pressure' | 'force'>> = { pressure: 'pressure', force: 'force' };

/** An SI value as the user reads it: number and unit in the chosen system. */
export function show(si: number, dim: Dimension, units: UnitSystem, significant = 3): string {
  const kind = COLUMN_KIND[dim];
  return kind ? quantityText(si, kind, units) : formatSi(si, dim, units, significant);
}

/**
 * A force with its unit as the schedule's force column has it (columnUnits.ts: kN to 0.1, kip to 0.01):
 * a thrust reads the same on the plan, in the panel and in the schedule and print.
 */
export const showColumnForce = (si: number, units: UnitSystem): string => quantityText(si, 'force', units);

/** A force as a bare number in the force column's unit and precision, the unit in the heading. */
export const columnForce = (si: number, units: UnitSystem): string => columnNumber(si, 'force', units);

/** The unit symbol of a dimension in the chosen system. */
export const unitOf = (dim: Dimension, units: UnitSystem): string => unitSymbol(dim, units);
