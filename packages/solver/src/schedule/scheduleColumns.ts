import { DISPLAY_UNITS, toDisplay, type Dimension, type UnitSystem } from '../units/conversions.js';
import { roundForDrawing } from '../units/format.js';
import type { ScheduleFitting } from './scheduleRows.js';
import { norm } from '../geometry/vector.js';

/** A column of the tabular schedule: a heading, its display unit, and the cell's value. */
export interface ScheduleColumn {
  heading: string;
  dimension?: Dimension;
  /** SI number, text, or null for an empty cell */
  cell: (f: ScheduleFitting, caseLabel: (id: string) => string) => number | string | null;
}

/** The schedule's columns, shared by the CSV export, the text table and the app's table. */
export const SCHEDULE_COLUMNS: readonly ScheduleColumn[] = [
  { heading: 'Tag', cell: (f) => f.tag },
  { heading: 'Node', cell: (f) => f.node },
  { heading: 'Label', cell: (f) => f.label },
  { heading: 'Kind', cell: (f) => f.kind },
  { heading: 'Chainage', dimension: 'length', cell: (f) => f.chainage },
  { heading: 'East', dimension: 'length', cell: (f) => f.position[0] },
  { heading: 'North', dimension: 'length', cell: (f) => f.position[1] },
  { heading: 'Elevation', dimension: 'elevation', cell: (f) => f.position[2] },
  { heading: 'Largest OD', dimension: 'diameter', cell: (f) => Math.max(...f.pipes.map((p) => p.outsideDiameter)) },
  { heading: 'Deflection', dimension: 'angle', cell: (f) => f.deflection ?? f.branchAngle },
  { heading: 'Design pressure', dimension: 'pressure', cell: (f) => f.designPressure },
  { heading: 'Governing case', cell: (f, label) => label(f.governingCase) },
  { heading: 'Thrust', dimension: 'force', cell: (f) => norm(f.thrust) },
  { heading: 'Horizontal thrust', dimension: 'force', cell: (f) => f.horizontalThrust },
  { heading: 'Upward thrust', dimension: 'force', cell: (f) => f.upwardThrust },
  { heading: 'Downward thrust', dimension: 'force', cell: (f) => f.downwardThrust },
  { heading: 'Bears toward (from north)', dimension: 'angle', cell: (f) => f.bearingDirection },
  { heading: 'Soil', cell: (f) => f.soil },
  { heading: 'Bearing area required', dimension: 'area', cell: (f) => f.restraint.block?.bearingArea ?? null },
  { heading: 'Face width', dimension: 'length', cell: (f) => f.restraint.block?.faceWidth ?? null },
  { heading: 'Face height', dimension: 'length', cell: (f) => f.restraint.block?.faceHeight ?? null },
  { heading: 'Block concrete', dimension: 'volume', cell: (f) => f.restraint.block?.concreteVolume ?? null },
  { heading: 'Opposite block width', dimension: 'length', cell: (f) => f.restraint.reverseBlock?.faceWidth ?? null },
  { heading: 'Opposite block height', dimension: 'length', cell: (f) => f.restraint.reverseBlock?.faceHeight ?? null },
  {
    heading: 'Opposite block concrete',
    dimension: 'volume',
    cell: (f) => f.restraint.reverseBlock?.concreteVolume ?? null,
  },
  { heading: 'Anchor concrete', dimension: 'volume', cell: (f) => f.restraint.anchor?.concreteVolume ?? null },
  { heading: 'Trench-bottom area', dimension: 'area', cell: (f) => f.restraint.trenchBottom?.bearingArea ?? null },
  { heading: 'Restrained length', dimension: 'length', cell: (f) => f.restraint.restrainedLength },
  { heading: 'Warnings', cell: (f) => f.warnings.join(' | ') },
];

/** "Thrust (kN)": the heading with its display unit; forces keep one unit per column (no kip switch). */
export function columnHeading(c: ScheduleColumn, units: UnitSystem): string {
  if (!c.dimension) return c.heading;
  return `${c.heading} (${DISPLAY_UNITS[units][c.dimension].symbol})`;
}

/** A cell in display units: numbers to four significant figures (more for large integers). */
export function columnValue(
  c: ScheduleColumn,
  f: ScheduleFitting,
  units: UnitSystem,
  caseLabel: (id: string) => string,
): string {
  const v = c.cell(f, caseLabel);
  if (v === null) return '';
  if (typeof v === 'string') return v;
  if (!c.dimension) return String(v);
  return String(roundForDrawing(toDisplay(v, c.dimension, units), 4));
}
