import { norm } from '../geometry/vector.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { Project } from '../model/projectSchema.js';
import { anchorConcrete, blockConcrete, shownConcrete } from './concrete.js';
import { blockTopShown, readsZero, type ColumnKind } from './columnUnits.js';
import { bearingText, fittingTitle } from './fittingNames.js';
import { restrainedText, restraintSummary } from './restraintText.js';
import type { ScheduleFitting } from './scheduleRows.js';
import type { UnitSystem } from '../units/conversions.js';
import { settingOut, type SettingOut } from './settingOut.js';
import { stationText } from './stations.js';

/** What a text cell may read besides the row: names of cases and soils, the units, the note numbers. */
export interface CellContext {
  project: Project;
  units: UnitSystem;
  /** numbers of the notes this row carries: "1, 3" */
  notes: (f: ScheduleFitting) => string;
  /** a finding as one sentence in the view's units, as its notes word it */
  words: (d: Diagnostic) => string;
}

/** One column of the schedule, shared by every output: the CLI table, CSV, the app's table and the print. */
export interface ScheduleColumn {
  id: string;
  heading: string;
  kind: ColumnKind;
  /** the SI number (numeric kinds) or the text of the cell; null for an empty cell */
  cell: (f: ScheduleFitting, c: CellContext) => number | string | null;
}

const BLOCK_GOVERNS = { bearing: 'bearing area', passive: 'passive resistance', minimum: 'least face' } as const;
const setOuts = new WeakMap<ScheduleFitting, SettingOut>();
/** Setting-out of a row, made once per schedule row (several columns read it). */
function setOut(f: ScheduleFitting, c: CellContext): SettingOut {
  let s = setOuts.get(f);
  if (!s) setOuts.set(f, (s = settingOut(f, c.project.design.dimensionStep)));
  return s;
}
const size = (f: ScheduleFitting) => Math.max(...f.pipes.map((p) => p.outsideDiameter));
const caseName = (c: CellContext, id: string) => c.project.loadCases.find((x) => x.id === id)?.label ?? id;
const soilName = (c: CellContext, id: string) => c.project.soils.find((x) => x.id === id)?.label ?? id;
const col = (id: string, heading: string, kind: ColumnKind, cell: ScheduleColumn['cell']): ScheduleColumn => ({
  id,
  heading,
  kind,
  cell,
});

/** Every column, in the order the CSV writes them. Other outputs choose ids from this list. */
export const SCHEDULE_COLUMNS: readonly ScheduleColumn[] = [
  col('mark', 'Mark', 'text', (f) => f.mark),
  col('chainage', 'Chainage', 'chainage', (f) => f.chainage),
  col('station', 'Station', 'text', (f, c) => stationText(f.chainage, c.units)),
  col('fitting', 'Fitting', 'text', (f) => fittingTitle(f)),
  col('label', 'Label', 'text', (f) => f.label),
  col('od', 'Largest OD', 'diameter', size),
  col('east', 'East', 'coordinate', (f) => f.position[0]),
  col('north', 'North', 'coordinate', (f) => f.position[1]),
  col('level', 'Pipe centreline level', 'level', (f) => f.position[2]),
  col('invert', 'Invert level', 'level', (f, c) => setOut(f, c).invert),
  col('ground', 'Ground level', 'level', (f) => f.groundLevel),
  col('blockEast', 'Block centre east', 'coordinate', (f, c) => setOut(f, c).block?.east ?? null),
  col('blockNorth', 'Block centre north', 'coordinate', (f, c) => setOut(f, c).block?.north ?? null),
  col('blockTop', 'Block top below ground', 'topDepth', (f, c) => {
    const b = setOut(f, c).block;
    return b ? blockTopShown(b, c.units) : null;
  }),
  col('blockBase', 'Depth to block base', 'baseDepth', (f, c) => setOut(f, c).block?.baseDepth ?? null),
  col('pressure', 'Design pressure', 'pressure', (f) => f.designPressure),
  col('case', 'Governing case', 'text', (f, c) => caseName(c, f.governingCase)),
  col('thrust', 'Thrust', 'force', (f) => norm(f.thrust)),
  col('horizontal', 'Horizontal thrust', 'force', (f) => f.horizontalThrust),
  col('upward', 'Upward thrust', 'force', (f, c) =>
    readsZero(f.upwardThrust, 'force', c.units) ? null : f.upwardThrust,
  ),
  col('downward', 'Downward thrust', 'force', (f, c) =>
    readsZero(f.downwardThrust, 'force', c.units) ? null : f.downwardThrust,
  ),
  col('profile', 'Crest or sag', 'text', (f) => f.profile),
  col('bears', 'Block bears toward', 'text', (f) => (f.restraint.block ? bearingText(f.bearingDirection) : null)),
  col('soil', 'Soil', 'text', (f, c) => soilName(c, f.soil)),
  col('area', 'Bearing area required', 'area', (f) => f.restraint.block?.bearingArea ?? null),
  col('faceWidth', 'Face width', 'built', (f) => f.restraint.block?.faceWidth ?? null),
  col('faceHeight', 'Face height', 'built', (f) => f.restraint.block?.faceHeight ?? null),
  col('blockGoverns', 'Block face set by', 'text', (f) =>
    f.restraint.block ? BLOCK_GOVERNS[f.restraint.block.governs] : null,
  ),
  col('thickness', 'Block thickness', 'built', (f) => f.restraint.block?.depth ?? null),
  col('blockConcrete', 'Block concrete', 'volume', (f, c) =>
    f.restraint.block ? blockConcrete(f.restraint.block, c.units) : null,
  ),
  col('oppositeWidth', 'Opposite face width', 'built', (f) => f.restraint.reverseBlock?.faceWidth ?? null),
  col('oppositeHeight', 'Opposite face height', 'built', (f) => f.restraint.reverseBlock?.faceHeight ?? null),
  col('oppositeConcrete', 'Opposite block concrete', 'volume', (f, c) =>
    f.restraint.reverseBlock ? blockConcrete(f.restraint.reverseBlock, c.units) : null,
  ),
  col('anchorSide', 'Anchor side', 'built', (f) => f.restraint.anchor?.side ?? null),
  col('anchorLength', 'Anchor length', 'built', (f, c) => setOut(f, c).anchor?.length ?? null),
  col('anchorWidth', 'Anchor width', 'built', (f, c) => setOut(f, c).anchor?.width ?? null),
  col('anchorHeight', 'Anchor height', 'built', (f, c) => setOut(f, c).anchor?.height ?? null),
  col('anchorBase', 'Depth to anchor base', 'baseDepth', (f, c) => setOut(f, c).anchor?.baseDepth ?? null),
  col('anchorConcrete', 'Anchor concrete', 'volume', (f, c) =>
    f.restraint.anchor ? anchorConcrete(f.restraint.anchor, c.units) : null,
  ),
  col('padArea', 'Trench-bottom area', 'area', (f) => f.restraint.trenchBottom?.bearingArea ?? null),
  col('padLength', 'Trench-bottom pad length', 'built', (f) => f.restraint.trenchBottom?.length ?? null),
  col('padWidth', 'Trench-bottom pad width', 'built', (f) => f.restraint.trenchBottom?.width ?? null),
  col('padThickness', 'Trench-bottom pad thickness', 'built', (f, c) => setOut(f, c).pad?.thickness ?? null),
  col('restrained', 'Restrained length', 'restrained', (f) => f.restraint.restrainedLength),
  col('restrainedLegs', 'Restrained legs', 'text', (f, c) => restrainedText(f, c.units) || null),
  col('restraint', 'Restraint', 'text', (f, c) => restraintSummary(f, c.units, c.project.design.dimensionStep)),
  col('concrete', 'Concrete', 'volume', (f, c) => {
    const v = shownConcrete(f.restraint, c.units, c.project.design.dimensionStep);
    return v > 0 ? v : null;
  }),
  col('notes', 'Notes', 'text', (f, c) => c.notes(f) || null),
  col('warnings', 'Warnings', 'text', (f, c) => f.diagnostics.map(c.words).join(' | ') || null),
];

/** The columns of the compact outputs, by id. */
export const TABLE_COLUMNS = [
  'mark',
  'chainage',
  'fitting',
  'pressure',
  'case',
  'horizontal',
  'upward',
  'downward',
  'restraint',
  'notes',
];
export const APP_COLUMNS = [
  'mark',
  'chainage',
  'fitting',
  'od',
  'pressure',
  'case',
  'horizontal',
  'upward',
  'downward',
  'restraint',
  'concrete',
  'notes',
];
