import { FOOT, PSF } from '../units/conversions.js';
import type { Soil } from '../model/projectSchema.js';

/** How a soil behaves, which is how the library groups its classes. */
export type SoilKind = 'cohesionless' | 'cohesive' | 'organic' | 'rock';

/** The table a library value was taken from. */
export type SoilTable = 'bearing-table' | 'common-practice' | 'ibc-1806';

/**
 * A built-in soil class the user can copy into a project: our own name, grouped by kind, with the
 * published (or common-practice) value it carries and the row of the table it was taken from.
 * Copying drops everything but the project's soil fields; a project stores values, never a library id.
 */
export interface LibrarySoil extends Soil {
  kind: SoilKind;
  table: SoilTable;
  /** the row as the source table names it, quoted in `source` */
  tableRow: string;
  /** the table in a few words, shown beside the class */
  sourceShort: string;
  source: string;
}

/** The kinds in the order the library lists them, each with a line saying what belongs to it. */
export const SOIL_KINDS: readonly { kind: SoilKind; name: string; note: string }[] = [
  { kind: 'cohesionless', name: 'Cohesionless', note: 'sands, gravels and silts that hold by friction' },
  { kind: 'cohesive', name: 'Cohesive', note: 'clays and clay-bound soils that hold by cohesion' },
  { kind: 'organic', name: 'Organic', note: 'muck and peat: no bearing; remove, or hold the thrust another way' },
  { kind: 'rock', name: 'Rock', note: 'bedrock, sedimentary rock and shale' },
];

/**
 * m, depth below grade of a block's centroid used only to order classes whose bearing grows with depth
 * among those with a fixed bearing: 1.2 m of cover plus about half a block (common practice).
 */
export const ORDERING_DEPTH = 1.5;

/** Pa, the bearing a class offers at ORDERING_DEPTH: its fixed value plus any gain with depth. */
export const orderingBearing = (s: Soil): number => s.bearing + (s.bearingPerDepth ?? 0) * ORDERING_DEPTH;

const psf = (v: number) => v * PSF;
const psfPerFoot = (v: number) => (v * PSF) / FOOT;
const kNm3 = (v: number) => v * 1000;
const kPa = (v: number) => v * 1000;

/** Unit weight, friction angle and cohesion of every class are typical values (common practice). */
const TYPICAL = 'γ, φ, c typical values (common practice): replace with site data';

/** The ductile-iron manual's table of horizontal bearing strengths for thrust blocks, used with SF 1.5. */
const BEARING_TABLE =
  'DIPRA, Thrust Restraint Design for Ductile Iron Pipe, table of horizontal bearing strengths (use with SF 1.5; ' +
  'values as reproduced in a University of Toledo CET-2030 course handout, not verified against the manual)';

/**
 * A "safe bearing load" list that circulates in PVC-pipe installation literature, for more than 2 ft of
 * cover. It is often attributed to AWWA M23, but M23 does not contain it (its Example 1 takes
 * 1,500 lb/ft², a value the list lacks): its values are common practice, not a published table.
 */
const COMMON =
  'Common practice: a "safe bearing load" list found in PVC-pipe installation literature, for more than ' +
  '2 ft (0.6 m) of cover; not a published table (AWWA M23 does not contain it)';

const IBC = 'IBC 2012 Table 1806.2, presumptive lateral bearing per foot of depth below natural grade';

type Row = Omit<LibrarySoil, 'table' | 'source' | 'sourceShort'>;

const cite = (table: string, row: string, value: string) => `${table}, row "${row}" (${value}); ${TYPICAL}`;
const lbft2 = (bearing: number) => `${Math.round(bearing / PSF).toLocaleString('en-US')} lb/ft²`;

function fromBearingTable(r: Row): LibrarySoil {
  return {
    ...r,
    table: 'bearing-table',
    sourceShort: 'DIPRA bearing table',
    source: cite(BEARING_TABLE, r.tableRow, lbft2(r.bearing)),
  };
}

function fromCommonPractice(r: Row): LibrarySoil {
  return {
    ...r,
    table: 'common-practice',
    minCover: 2 * FOOT,
    sourceShort: 'common practice',
    source: cite(COMMON, r.tableRow, lbft2(r.bearing)),
  };
}

function fromIbc(r: Omit<Row, 'bearing'> & { ibcClass: number; perFoot: number; vertical: number }): LibrarySoil {
  const { ibcClass, perFoot, vertical, ...rest } = r;
  return {
    ...rest,
    bearing: 0,
    bearingPerDepth: psfPerFoot(perFoot),
    verticalBearing: psf(vertical),
    table: 'ibc-1806',
    sourceShort: `IBC 1806.2 class ${ibcClass}`,
    source: cite(
      IBC,
      r.tableRow,
      `${perFoot} lb/ft² per ft of depth; vertical ${vertical.toLocaleString('en-US')} lb/ft²`,
    ),
  };
}

const CLASSES: LibrarySoil[] = [
  // Organic: no bearing in either list.
  fromBearingTable({
    id: 'muck',
    label: 'Muck',
    kind: 'organic',
    tableRow: 'Muck',
    bearing: 0,
    unitWeight: kNm3(14),
    frictionAngle: 0,
    cohesion: 0,
  }),
  fromCommonPractice({
    id: 'muck-peat',
    label: 'Muck or peat',
    kind: 'organic',
    tableRow: 'Muck, peat',
    bearing: 0,
    unitWeight: kNm3(14),
    frictionAngle: 0,
    cohesion: 0,
  }),
  // Cohesive.
  fromBearingTable({
    id: 'clay-soft',
    label: 'Clay, soft',
    kind: 'cohesive',
    tableRow: 'Soft clay',
    bearing: psf(1000),
    unitWeight: kNm3(17),
    frictionAngle: 0,
    cohesion: kPa(12),
  }),
  fromCommonPractice({
    id: 'clay-soft-cp',
    label: 'Clay, soft',
    kind: 'cohesive',
    tableRow: 'Soft clay',
    bearing: psf(1000),
    unitWeight: kNm3(17),
    frictionAngle: 0,
    cohesion: kPa(12),
  }),
  fromIbc({
    id: 'clay-silt-ibc5',
    label: 'Clay or silt, any plasticity (CL, ML, MH, CH)',
    kind: 'cohesive',
    tableRow: '5. Clay, sandy clay, silty clay, clayey silt, silt and sandy silt',
    ibcClass: 5,
    perFoot: 100,
    vertical: 1500,
    unitWeight: kNm3(18),
    frictionAngle: 0,
    cohesion: kPa(20),
  }),
  fromCommonPractice({
    id: 'sand-gravel-clay-bound',
    label: 'Sand and gravel, clay-bound',
    kind: 'cohesive',
    tableRow: 'Sand and gravel cemented with clay',
    bearing: psf(4000),
    unitWeight: kNm3(20),
    frictionAngle: 35,
    cohesion: kPa(10),
  }),
  fromBearingTable({
    id: 'clay-sandy',
    label: 'Clay, sandy',
    kind: 'cohesive',
    tableRow: 'Sandy clay',
    bearing: psf(6000),
    unitWeight: kNm3(19),
    frictionAngle: 20,
    cohesion: kPa(10),
  }),
  fromBearingTable({
    id: 'clay-hard',
    label: 'Clay, hard',
    kind: 'cohesive',
    tableRow: 'Hard clay',
    bearing: psf(9000),
    unitWeight: kNm3(20),
    frictionAngle: 0,
    cohesion: kPa(100),
  }),
  // Cohesionless.
  fromIbc({
    id: 'sand-ibc4',
    label: 'Sand, silty or clayey sand and gravel (SW, SP, SM, SC, GM, GC)',
    kind: 'cohesionless',
    tableRow: '4. Sand, silty sand, clayey sand, silty gravel and clayey gravel',
    ibcClass: 4,
    perFoot: 150,
    vertical: 2000,
    unitWeight: kNm3(19),
    frictionAngle: 32,
    cohesion: 0,
  }),
  fromIbc({
    id: 'gravel-ibc3',
    label: 'Gravel or sandy gravel (GW, GP)',
    kind: 'cohesionless',
    tableRow: '3. Sandy gravel and/or gravel',
    ibcClass: 3,
    perFoot: 200,
    vertical: 3000,
    unitWeight: kNm3(20),
    frictionAngle: 36,
    cohesion: 0,
  }),
  fromBearingTable({
    id: 'silt',
    label: 'Silt',
    kind: 'cohesionless',
    tableRow: 'Silt',
    bearing: psf(1500),
    unitWeight: kNm3(18),
    frictionAngle: 28,
    cohesion: 0,
  }),
  fromCommonPractice({
    id: 'sand-cp',
    label: 'Sand',
    kind: 'cohesionless',
    tableRow: 'Sand',
    bearing: psf(2000),
    unitWeight: kNm3(18.5),
    frictionAngle: 32,
    cohesion: 0,
  }),
  fromBearingTable({
    id: 'silt-sandy',
    label: 'Silt, sandy',
    kind: 'cohesionless',
    tableRow: 'Sandy silt',
    bearing: psf(3000),
    unitWeight: kNm3(18),
    frictionAngle: 30,
    cohesion: 0,
  }),
  fromCommonPractice({
    id: 'sand-gravel',
    label: 'Sand and gravel',
    kind: 'cohesionless',
    tableRow: 'Sand and gravel',
    bearing: psf(3000),
    unitWeight: kNm3(19.5),
    frictionAngle: 35,
    cohesion: 0,
  }),
  fromBearingTable({
    id: 'sand',
    label: 'Sand',
    kind: 'cohesionless',
    tableRow: 'Sand',
    bearing: psf(4000),
    unitWeight: kNm3(18.5),
    frictionAngle: 32,
    cohesion: 0,
  }),
  // Rock.
  fromIbc({
    id: 'rock-sedimentary-ibc2',
    label: 'Rock, sedimentary or foliated',
    kind: 'rock',
    tableRow: '2. Sedimentary and foliated rock',
    ibcClass: 2,
    perFoot: 400,
    vertical: 4000,
    unitWeight: kNm3(23),
    frictionAngle: 40,
    cohesion: 0,
  }),
  fromIbc({
    id: 'rock-crystalline-ibc1',
    label: 'Rock, crystalline bedrock',
    kind: 'rock',
    tableRow: '1. Crystalline bedrock',
    ibcClass: 1,
    perFoot: 1200,
    vertical: 12000,
    unitWeight: kNm3(24),
    frictionAngle: 45,
    cohesion: 0,
  }),
  fromCommonPractice({
    id: 'shale-hard',
    label: 'Shale, hard',
    kind: 'rock',
    tableRow: 'Hard shale',
    bearing: psf(10000),
    unitWeight: kNm3(22),
    frictionAngle: 40,
    cohesion: kPa(50),
  }),
];

const kindOrder = (k: SoilKind) => SOIL_KINDS.findIndex((x) => x.kind === k);

/** Every class, by kind (SOIL_KINDS order) and then by bearing, weakest first. */
export const SOIL_LIBRARY: readonly LibrarySoil[] = [...CLASSES].sort(
  (a, b) => kindOrder(a.kind) - kindOrder(b.kind) || orderingBearing(a) - orderingBearing(b),
);

export const findLibrarySoil = (id: string): LibrarySoil | undefined => SOIL_LIBRARY.find((s) => s.id === id);

/** A class as a project soil: the project's fields only, with the class's source kept beside the values. */
export function librarySoilToProject(s: LibrarySoil, id: string): Soil {
  const { kind: _kind, table: _table, tableRow: _row, sourceShort: _short, ...soil } = s;
  return { ...soil, id };
}
