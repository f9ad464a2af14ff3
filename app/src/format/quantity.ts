import { formatNumber, formatSi, KIP, unitSymbol, type Dimension, type UnitSystem } from '@mainbrace/solver';

/** An SI value as the user reads it: number and unit in the chosen system. */
export const show = (si: number, dim: Dimension, units: UnitSystem, significant = 3): string =>
  formatSi(si, dim, units, significant);

/** A force in a table column: kN, or kip in US units, so that one column never mixes lbf and kip. */
export const showColumnForce = (si: number, units: UnitSystem): string =>
  units === 'us' ? `${formatNumber(si / KIP)} kip` : formatSi(si, 'force', 'si');

/** A force as a bare number in the column's one unit (kN, or kip in US units), the unit in the heading. */
export const columnForce = (si: number, units: UnitSystem): string =>
  formatNumber(units === 'us' ? si / KIP : si / 1000);

/** The unit symbol of a dimension in the chosen system. */
export const unitOf = (dim: Dimension, units: UnitSystem): string => unitSymbol(dim, units);
