import type { LoadCase, ProjectNode } from '../model/projectSchema.js';
import type { Leg } from '../network/legs.js';
import type { FittingGeometry } from '../network/fittingKind.js';
import type { CaseThrust, ThrustEnvelope } from '../thrust/fittingThrust.js';
import type { Restraint } from '../restraint/sizeRestraint.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { ProvenanceId } from '../provenance/register.js';
import type { FittingAnalysis } from './analyse.js';
import { fillStates, readCases, type EnvelopeRead, type ThrustSums } from './thrustSums.js';

/** Where a fitting's load states are read from: the analysis's sums (never changed once made) and the cases. */
export interface StateSource {
  sums: ThrustSums;
  /** the fitting's index in `sums` */
  index: number;
  loadCases: readonly LoadCase[];
  density: number;
}

/**
 * A fitting's results, its load states (`states`, `cases`) made from the analysis's typed sums when first
 * read: at 10,000 fittings the three states per fitting and their vectors were most of what an analysis
 * kept alive, and the collector's work grows with what is kept (docs/performance.md). The envelope, which
 * the restraint is sized from, is made at once. `states` and `cases` are own, enumerable accessors, set
 * in the place the fields had, so that a spread, `JSON.stringify`, `structuredClone`, `Object.keys` and
 * a test's deep comparison see the same fields in the same order as before; the source is private.
 */
export class SolvedFitting implements FittingAnalysis {
  declare node: ProjectNode;
  declare mark: string;
  declare run: string;
  declare chainage: number;
  declare legs: Leg[];
  declare geometry: FittingGeometry;
  declare cases: CaseThrust[];
  declare states: CaseThrust[];
  declare envelope: ThrustEnvelope;
  declare waterWeight: number;
  declare restraint: Restraint;
  declare diagnostics: Diagnostic[];
  declare basis: ProvenanceId[];
  #source: StateSource;
  #governingState: number;
  #reverseState: number;
  #states: CaseThrust[] | undefined = undefined;
  #cases: CaseThrust[] | undefined = undefined;

  /**
   * The accessors of every fitting: one shared pair each, so that every fitting keeps one shape. Two
   * `defineProperty` calls cost half of one `defineProperties` call with both (about 0.2 µs each).
   */
  static #casesField: PropertyDescriptor = {
    get(this: SolvedFitting) {
      return this.#cases ?? this.#read().cases;
    },
    set(this: SolvedFitting, v: CaseThrust[]) {
      if (!this.#states) this.#read();
      this.#cases = v;
    },
    enumerable: true,
    configurable: true,
  };
  static #statesField: PropertyDescriptor = {
    get(this: SolvedFitting) {
      return this.#states ?? this.#read().states;
    },
    set(this: SolvedFitting, v: CaseThrust[]) {
      if (!this.#cases) this.#read();
      this.#states = v;
    },
    enumerable: true,
    configurable: true,
  };

  constructor(
    node: ProjectNode,
    mark: string,
    run: string,
    chainage: number,
    legs: Leg[],
    geometry: FittingGeometry,
    source: StateSource,
    known: EnvelopeRead,
    waterWeight: number,
    restraint: Restraint,
    diagnostics: Diagnostic[],
  ) {
    this.#source = source;
    this.#governingState = known.governingState;
    this.#reverseState = known.reverseState;
    // field by field, in the order the fields have always had
    this.node = node;
    this.mark = mark;
    this.run = run;
    this.chainage = chainage;
    this.legs = legs;
    this.geometry = geometry;
    Object.defineProperty(this, 'cases', SolvedFitting.#casesField);
    Object.defineProperty(this, 'states', SolvedFitting.#statesField);
    this.envelope = known.envelope;
    this.waterWeight = waterWeight;
    this.restraint = restraint;
    this.diagnostics = diagnostics;
    this.basis = restraint.basis;
  }

  /** The same fitting at another place (mark, run, chainage) or with other findings. */
  placed(mark: string, run: string, chainage: number, diagnostics: Diagnostic[]): SolvedFitting {
    const moved = new SolvedFitting(
      this.node,
      mark,
      run,
      chainage,
      this.legs,
      this.geometry,
      this.#source,
      { envelope: this.envelope, governingState: this.#governingState, reverseState: this.#reverseState },
      this.waterWeight,
      this.restraint,
      diagnostics,
    );
    moved.#states = this.#states;
    moved.#cases = this.#cases;
    return moved;
  }

  /** The states, made again from the sums as the analysis made them (the same numbers, bit for bit). */
  #read(): { states: CaseThrust[]; cases: CaseThrust[] } {
    const s = this.#source;
    const b = fillStates(s.sums, s.index, s.loadCases, s.density);
    const known = { envelope: this.envelope, governingState: this.#governingState, reverseState: this.#reverseState };
    const read = readCases(b, s.loadCases, this.legs, known);
    this.#states ??= read.states;
    this.#cases ??= read.cases;
    return { states: this.#states, cases: this.#cases };
  }
}
