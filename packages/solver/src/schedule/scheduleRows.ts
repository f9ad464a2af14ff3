import { planBearing, type Vec3 } from '../geometry/vector.js';
import type { Analysis, FittingAnalysis } from '../analysis/analyse.js';
import type { FittingKind } from '../network/fittingKind.js';
import { nodeSoil } from '../restraint/sizeRestraint.js';
import { nodeCover, nodeGround } from '../model/groundLevel.js';
import type { BearingBlock } from '../restraint/bearingBlock.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { Wording } from '../diagnostics/wording.js';
import { legTarget, wordingContext } from '../diagnostics/context.js';
import type { ProvenanceId } from '../provenance/register.js';
import { unverified } from '../provenance/unverified.js';
import { restrainedJointCount } from './restrainedJoints.js';

/** A bearing block as the schedule reports it (all but an intermediate depth). SI units. */
export type ScheduleBlock = Omit<BearingBlock, 'bottomDepth'>;

/** One fitting of the schedule output (project-format.md, plus added fields). SI units. */
export interface ScheduleFitting {
  node: string;
  /** run letter and number along the run: A1, A2 … B1 */
  mark: string;
  run: string;
  label: string | null;
  kind: Exclude<FittingKind, 'straight' | 'tie-in' | 'none'>;
  deflection: number | null;
  horizontalDeflection: number | null;
  verticalDeflection: number | null;
  branchAngle: number | null;
  /** m along the run from its start */
  chainage: number;
  position: Vec3;
  /** m, ground surface to top of the largest pipe at the fitting */
  cover: number;
  /** m, ground level over the fitting: centreline + largest OD/2 + cover */
  groundLevel: number;
  pipes: { id: string; outsideDiameter: number; insideDiameter: number; material: string; toward: string | null }[];
  soil: string;
  cases: {
    case: string;
    pressure: number;
    static: Vec3;
    dynamic: Vec3;
    total: Vec3;
    closedAgainst: string | null;
  }[];
  governingCase: string;
  designPressure: number;
  thrust: Vec3;
  horizontalThrust: number;
  upwardThrust: number;
  downwardThrust: number;
  /** degrees clockwise from north of the horizontal thrust, or null */
  bearingDirection: number | null;
  /**
   * a bend with a vertical part: a crest (the grade turns down, a high point; its thrust lifts unless
   * under a vacuum) or a sag (the grade turns up); null for a plan bend or any other fitting
   */
  profile: 'crest' | 'sag' | null;
  waterWeight: number;
  restraint: {
    block: ScheduleBlock | null;
    /** a second block on the opposite side, where the thrust reverses between load states */
    reverseBlock: ScheduleBlock | null;
    /**
     * built as length × width × height (a cube: all three equal `side`); it holds the upward thrust by
     * its weight and, where no block is built, the horizontal thrust by base friction
     */
    anchor: {
      concreteVolume: number;
      length: number;
      width: number;
      height: number;
      side: number;
      submerged: boolean;
      upwardThrust: number;
      horizontalThrust: number;
    } | null;
    trenchBottom: { bearingArea: number; width: number; length: number } | null;
    restrainedLength: number | null;
    /**
     * per restrained pipe: its length, the mark of the next fitting it runs toward, and the joints to
     * restrain at the project's laying length (the first at the fitting)
     */
    restrainedLegs: { pipe: string; length: number; toward: string | null; joints: number }[];
  };
  /** the diagnostics worded in SI, for readers of the first schedule format */
  warnings: string[];
  diagnostics: Diagnostic[];
  /** register entries the results rely on that were not read in their source */
  unverified: ProvenanceId[];
}

export interface Schedule {
  project: string;
  units: 'SI';
  /** findings about the project's inputs as a whole (unusual values), worded in SI and as data */
  warnings: string[];
  diagnostics: Diagnostic[];
  /** by run (main first) and chainage along it: the order a crew walks the line */
  fittings: ScheduleFitting[];
}

/**
 * A change of grade smaller than this is taken up along the line, not a vertical bend a crew marks,
 * degrees (Mainbrace rule: the smallest standard fitting bend is 11.25°; joints deflect a few degrees).
 */
const VERTICAL_BEND = 1;

/**
 * Crest or sag of a bend with a vertical part, by the way its grade turns (the long section's rule): the
 * name tells a crew where the high and low points of the line are. Its thrust usually points the same
 * way (up at a crest), but not under a vacuum, where the bend's own findings say so.
 */
export function fittingProfile(f: FittingAnalysis): ScheduleFitting['profile'] {
  const g = f.geometry;
  if (g.kind !== 'bend' && g.kind !== 'reducing-bend') return null;
  if (g.verticalDeflection === null || Math.abs(g.verticalDeflection) < VERTICAL_BEND) return null;
  return g.verticalDeflection < 0 ? 'crest' : 'sag';
}

/**
 * The schedule keeps every block field but the depth of the face bottom, an intermediate value (field
 * by field, in the block's order: a rest pattern copies through a slow path, once per row).
 */
function scheduled(b: BearingBlock | null): ScheduleBlock | null {
  return (
    b && {
      bearingArea: b.bearingArea,
      faceWidth: b.faceWidth,
      faceHeight: b.faceHeight,
      concreteVolume: b.concreteVolume,
      depth: b.depth,
      direction: b.direction,
      passiveResistance: b.passiveResistance,
      shapeFactor: b.shapeFactor,
      passiveRatio: b.passiveRatio,
      thrust: b.thrust,
      upwardThrust: b.upwardThrust,
      governs: b.governs,
    }
  );
}

/** What a row's parts are built from, and each part once it has been read (or set by a caller). */
type RowSource = { a: Analysis; f: FittingAnalysis; words: (d: Diagnostic) => string } & {
  [K in LazyKey]: ScheduleFitting[K] | undefined;
};

type LazyKey = 'pipes' | 'cases' | 'restraint' | 'unverified' | 'warnings';

/**
 * A row's part built when first read and kept: the table reads the rows in view, the print and the
 * exports read every part, and a pressure change reads none. One getter and setter per field, shared by
 * every row (a function made per row would put each row in dictionary mode), and the field stays an
 * accessor once read: turning it into a data property would too, which a reader of every row (the
 * command line's JSON) pays for.
 */
function lazyField<K extends LazyKey>(key: K, make: (s: RowSource) => ScheduleFitting[K]): PropertyDescriptor {
  return {
    get(this: ScheduleFitting) {
      const s = ScheduleRow.source(this);
      return (s[key] ??= make(s) as RowSource[K]);
    },
    set(this: ScheduleFitting, value: ScheduleFitting[K]) {
      ScheduleRow.source(this)[key] = value as RowSource[K];
    },
    enumerable: true,
    configurable: true,
  };
}

const PIPES = lazyField('pipes', ({ a, f }) =>
  f.legs.map((l) => ({
    id: l.pipe.id,
    outsideDiameter: l.pipe.outsideDiameter,
    insideDiameter: l.pipe.insideDiameter,
    material: l.pipe.material,
    toward: legTarget(a, f.node.id, l.pipe.id),
  })),
);

const CASES = lazyField('cases', ({ f }) =>
  f.cases.map((c) => ({
    case: c.caseId,
    pressure: c.pressure,
    static: c.static,
    dynamic: c.dynamic,
    total: c.total,
    closedAgainst: c.closedAgainst,
  })),
);

const RESTRAINT = lazyField('restraint', ({ a, f }) => {
  const r = f.restraint;
  return {
    block: scheduled(r.block),
    reverseBlock: scheduled(r.reverseBlock),
    anchor: r.anchor && {
      concreteVolume: r.anchor.concreteVolume,
      length: r.anchor.length,
      width: r.anchor.width,
      height: r.anchor.height,
      side: r.anchor.side,
      submerged: r.anchor.submerged,
      upwardThrust: r.anchor.upwardThrust,
      horizontalThrust: r.anchor.horizontalThrust,
    },
    trenchBottom: r.trenchBottom,
    restrainedLength: r.restrainedLength,
    restrainedLegs: r.restrainedLegs.map((l) => ({
      pipe: l.pipe,
      length: l.length,
      toward: legTarget(a, f.node.id, l.pipe),
      joints: restrainedJointCount(l.length, a.project.design.layingLength),
    })),
  };
});

const UNVERIFIED = lazyField('unverified', ({ f }) => unverified(f.basis));

/** The diagnostics worded in SI, kept once read. */
const WARNINGS = lazyField('warnings', ({ f, words }) => (f.diagnostics.length ? f.diagnostics.map(words) : []));

// The class's fields are the row's (declaration merging: the class adds none of its own but its source).
// eslint-disable-next-line @typescript-eslint/no-unsafe-declaration-merging, @typescript-eslint/no-empty-object-type
interface ScheduleRow extends ScheduleFitting {}

/**
 * One schedule row: its numbers copied from the analysis, its lists and nested parts (pipes, cases,
 * restraint, words, unverified entries) built when first read. The fields keep their order (JSON and
 * the table read them in it), each set in the constructor so that every field has room in the object
 * itself. The row holds its source in a private field, which no reader of its fields sees (JSON,
 * spreads, structuredClone and Object.keys read own enumerable fields only), where a WeakMap entry per
 * row had cost more than the rest of the row.
 */
// eslint-disable-next-line @typescript-eslint/no-unsafe-declaration-merging
class ScheduleRow {
  readonly #source: RowSource;
  constructor(a: Analysis, f: FittingAnalysis, words: (d: Diagnostic) => string) {
    this.#source = {
      a,
      f,
      words,
      pipes: undefined,
      cases: undefined,
      restraint: undefined,
      unverified: undefined,
      warnings: undefined,
    };
    const { envelope: e, geometry: g, node } = f;
    let od = 0;
    for (const l of f.legs) od = Math.max(od, l.pipe.outsideDiameter);
    this.node = node.id;
    this.mark = f.mark;
    this.run = f.run;
    this.label = node.label ?? null;
    this.kind = g.kind as ScheduleFitting['kind'];
    this.deflection = g.deflection;
    this.horizontalDeflection = g.horizontalDeflection;
    this.verticalDeflection = g.verticalDeflection;
    this.branchAngle = g.branchAngle;
    this.chainage = f.chainage;
    this.position = [node.x, node.y, node.elevation] as const;
    // a surveyed ground level governs the cover, as it does in the sizing (project-format.md)
    this.cover = nodeCover(node, od);
    this.groundLevel = nodeGround(node, od);
    Object.defineProperty(this, 'pipes', PIPES);
    this.soil = nodeSoil(a.project, node).id;
    Object.defineProperty(this, 'cases', CASES);
    this.governingCase = e.governing.caseId;
    this.designPressure = e.pressure;
    this.thrust = e.governing.total;
    this.horizontalThrust = e.horizontal.force;
    this.upwardThrust = e.upward.force;
    this.downwardThrust = e.downward.force;
    this.bearingDirection = e.horizontal.force > 0 ? planBearing(e.horizontal.direction) : null;
    this.profile = fittingProfile(f);
    this.waterWeight = f.waterWeight;
    Object.defineProperty(this, 'restraint', RESTRAINT);
    Object.defineProperty(this, 'warnings', WARNINGS);
    this.diagnostics = f.diagnostics;
    Object.defineProperty(this, 'unverified', UNVERIFIED);
  }

  static source(row: object): RowSource {
    return (row as ScheduleRow).#source;
  }
}

const rowLists = new WeakMap<Analysis, ScheduleFitting[]>();

const wordings = new WeakMap<Analysis, (d: Diagnostic) => string>();

/** The SI wording of an analysis's findings, as the schedule's rows carry them. */
export function siWords(a: Analysis, text: Wording['text']): (d: Diagnostic) => string {
  let words = wordings.get(a);
  if (!words) {
    const context = wordingContext(a, 'si');
    wordings.set(a, (words = (d: Diagnostic) => text(d, context)));
  }
  return words;
}

/**
 * The schedule row of `a.fittings[i]`, built when first asked for and kept: a reader of a few rows
 * (a table showing those in view) never pays for the others. `text` words its findings (wording.ts),
 * passed in so that a first screen can load the words apart.
 */
export function scheduleRowAt(a: Analysis, i: number, text: Wording['text']): ScheduleFitting {
  let list = rowLists.get(a);
  if (!list) rowLists.set(a, (list = new Array<ScheduleFitting>(a.fittings.length)));
  return (list[i] ??= new ScheduleRow(a, a.fittings[i]!, siWords(a, text)));
}
