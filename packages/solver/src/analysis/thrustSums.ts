import type { Vec3 } from '../geometry/vector.js';
import type { Leg } from '../network/legs.js';
import type { LoadCase } from '../model/projectSchema.js';
import { pressureAt } from '../pressure/nodePressure.js';
import type { CaseThrust, Extreme, ThrustEnvelope } from '../thrust/fittingThrust.js';
import { cancelled } from '../thrust/momentumBalance.js';

/**
 * The momentum balance of every fitting, structure of arrays (thrust/momentumBalance.ts has the
 * formula): F = −p·Σ A_i·n_i − ρ·f²·Σ (Q_i²/a_i)·n_i. Neither sum depends on the load case, so each
 * fitting keeps them once — three numbers each — and a case costs a multiply-add per component: a
 * change of pressure rescales the sums, and only a change of the route recomputes them.
 */
export interface ThrustSums {
  count: number;
  /** m, pipe centreline elevation of each fitting */
  elevation: Float64Array;
  /** Σ −A_i·n_i, m², 3 per fitting */
  area: Float64Array;
  /** Σ −(Q_i²/a_i)·n_i at flow factor 1, m⁴/s², 3 per fitting */
  flux: Float64Array;
  /** a closed valve: −A_k·n_k of the side k (0, 1) that holds the pressure, 6 per fitting */
  closed: Float64Array;
  /** 1 where the fitting is a valve between two pipes: three load states per case */
  valve: Uint8Array;
}

export function thrustSums(count: number): ThrustSums {
  return {
    count,
    elevation: new Float64Array(count),
    area: new Float64Array(3 * count),
    flux: new Float64Array(3 * count),
    closed: new Float64Array(6 * count),
    valve: new Uint8Array(count),
  };
}

/** Writes fitting `f`'s sums from its legs. */
export function writeSums(s: ThrustSums, f: number, legs: readonly Leg[], elevation: number, valve: boolean): void {
  let ax = 0,
    ay = 0,
    az = 0,
    fx = 0,
    fy = 0,
    fz = 0,
    areas = 0,
    fluxes = 0;
  for (let i = 0; i < legs.length; i++) {
    const leg = legs[i]!;
    const n = leg.direction;
    const a = leg.thrustArea;
    const q = leg.outflow;
    const k = (q * q) / leg.flowArea;
    ax -= a * n[0];
    ay -= a * n[1];
    az -= a * n[2];
    fx -= k * n[0];
    fy -= k * n[1];
    fz -= k * n[2];
    areas += a;
    fluxes += k;
  }
  const j = 3 * f;
  s.elevation[f] = elevation;
  s.area[j] = cancelled(ax, areas);
  s.area[j + 1] = cancelled(ay, areas);
  s.area[j + 2] = cancelled(az, areas);
  s.flux[j] = cancelled(fx, fluxes);
  s.flux[j + 1] = cancelled(fy, fluxes);
  s.flux[j + 2] = cancelled(fz, fluxes);
  const closable = valve && legs.length === 2;
  s.valve[f] = closable ? 1 : 0;
  if (closable) {
    for (let side = 0; side < 2; side++) {
      const leg = legs[side]!;
      const c = 6 * f + 3 * side;
      s.closed[c] = -(leg.thrustArea * leg.direction[0]);
      s.closed[c + 1] = -(leg.thrustArea * leg.direction[1]);
      s.closed[c + 2] = -(leg.thrustArea * leg.direction[2]);
    }
  }
}

/** Copies fitting `from` of `src` into slot `to` of `dst` (an unchanged fitting of an edited route). */
export function copySums(src: ThrustSums, from: number, dst: ThrustSums, to: number): void {
  dst.elevation[to] = src.elevation[from]!;
  dst.area.set(src.area.subarray(3 * from, 3 * from + 3), 3 * to);
  dst.flux.set(src.flux.subarray(3 * from, 3 * from + 3), 3 * to);
  dst.closed.set(src.closed.subarray(6 * from, 6 * from + 6), 6 * to);
  dst.valve[to] = src.valve[from]!;
}

/**
 * One fitting's load states, reused between fittings (no garbage per fitting): per state the case,
 * the closed side (−1 open), the pressure and the static, dynamic and total thrust (3 each).
 */
export interface StateBuffer {
  count: number;
  caseIndex: Int32Array;
  side: Int8Array;
  pressure: Float64Array;
  statics: Float64Array;
  dynamic: Float64Array;
  total: Float64Array;
}

let buffer: StateBuffer = stateBuffer(16);

function stateBuffer(capacity: number): StateBuffer {
  return {
    count: 0,
    caseIndex: new Int32Array(capacity),
    side: new Int8Array(capacity),
    pressure: new Float64Array(capacity),
    statics: new Float64Array(3 * capacity),
    dynamic: new Float64Array(3 * capacity),
    total: new Float64Array(3 * capacity),
  };
}

/**
 * Fitting `f`'s load states in the shared buffer, in the order of thrust/fittingThrust.ts: per case the
 * open state, then for a valve the two closed ones (no flow, pressure on one side). Adding 0 turns a
 * −0 into +0, as the leg-by-leg sums of momentumBalance give.
 */
export function fillStates(s: ThrustSums, f: number, cases: readonly LoadCase[], density: number): StateBuffer {
  const per = s.valve[f] ? 3 : 1;
  if (buffer.caseIndex.length < per * cases.length) buffer = stateBuffer(per * cases.length * 2);
  const b = buffer;
  const j = 3 * f;
  const ax = s.area[j]!,
    ay = s.area[j + 1]!,
    az = s.area[j + 2]!;
  const fx = s.flux[j]!,
    fy = s.flux[j + 1]!,
    fz = s.flux[j + 2]!;
  const z = s.elevation[f]!;
  let k = 0;
  for (let c = 0; c < cases.length; c++) {
    const lc = cases[c]!;
    const p = pressureAt(lc, z, density);
    const m = density * lc.flowFactor * lc.flowFactor;
    const o = 3 * k;
    b.caseIndex[k] = c;
    b.side[k] = -1;
    b.pressure[k] = p;
    const sx = p * ax + 0,
      sy = p * ay + 0,
      sz = p * az + 0;
    const dx = m * fx + 0,
      dy = m * fy + 0,
      dz = m * fz + 0;
    b.statics[o] = sx;
    b.statics[o + 1] = sy;
    b.statics[o + 2] = sz;
    b.dynamic[o] = dx;
    b.dynamic[o + 1] = dy;
    b.dynamic[o + 2] = dz;
    b.total[o] = sx + dx;
    b.total[o + 1] = sy + dy;
    b.total[o + 2] = sz + dz;
    k++;
    if (per === 1) continue;
    for (let side = 0; side < 2; side++) {
      const q = 6 * f + 3 * side;
      const r = 3 * k;
      b.caseIndex[k] = c;
      b.side[k] = side;
      b.pressure[k] = p;
      for (let i = 0; i < 3; i++) {
        const v = p * s.closed[q + i]! + 0;
        b.statics[r + i] = v;
        b.dynamic[r + i] = 0;
        b.total[r + i] = v;
      }
      k++;
    }
  }
  b.count = k;
  return b;
}

const size = (t: Float64Array, k: number) => {
  const o = 3 * k;
  return Math.sqrt(t[o]! * t[o]! + t[o + 1]! * t[o + 1]! + t[o + 2]! * t[o + 2]!);
};
const planSize = (t: Float64Array, k: number) => Math.sqrt(t[3 * k]! * t[3 * k]! + t[3 * k + 1]! * t[3 * k + 1]!);
const vec = (a: Float64Array, k: number): Vec3 => [a[3 * k]!, a[3 * k + 1]!, a[3 * k + 2]!];
const NO_THRUST: Vec3 = Object.freeze([0, 0, 0] as const);
/** No state thrusts that way (up or down): one shared extreme, not one kept per fitting. */
const NO_EXTREME: Extreme = Object.freeze({ force: 0, caseId: null });

/** The case of state `k` of the buffer (−1: none). */
const caseOf = (b: StateBuffer, cases: readonly LoadCase[], k: number) => (k < 0 ? null : cases[b.caseIndex[k]!]!.id);

/** The envelope, and which states its governing and reverse state objects are (−1: none). */
export interface EnvelopeRead {
  envelope: ThrustEnvelope;
  governingState: number;
  reverseState: number;
}

/**
 * State k of the buffer as an object. No flow (a test case, a closed valve): the dynamic thrust is +0
 * (fillStates adds 0) and the total is the static thrust, number for number — one shared zero and the
 * same vector, not two more arrays kept per state. Cases with the same flow factor (a working and a
 * surge case) have the same dynamic thrust, number for number: `before` (the state before's vector)
 * then serves both.
 */
function stateAt(
  b: StateBuffer,
  k: number,
  cases: readonly LoadCase[],
  legs: readonly Leg[],
  before: Vec3,
): CaseThrust {
  const statics = vec(b.statics, k);
  const d = b.dynamic;
  const still = d[3 * k] === 0 && d[3 * k + 1] === 0 && d[3 * k + 2] === 0;
  const same = before[0] === d[3 * k] && before[1] === d[3 * k + 1] && before[2] === d[3 * k + 2];
  return {
    caseId: cases[b.caseIndex[k]!]!.id,
    pressure: b.pressure[k]!,
    static: statics,
    dynamic: still ? NO_THRUST : same ? before : vec(d, k),
    total: still ? statics : vec(b.total, k),
    // a closed valve holds the pressure of the pipe on its closed side
    closedAgainst: b.side[k]! < 0 ? null : legs[b.side[k]!]!.pipe.id,
  };
}

/**
 * The envelope of the states in the buffer, by the rules of thrust/fittingThrust.ts (thrustEnvelope):
 * the same comparisons in the same order over the same numbers. Only the governing and the reverse
 * state become objects; `readCases` makes the others when they are read.
 */
export function readEnvelope(b: StateBuffer, cases: readonly LoadCase[], legs: readonly Leg[]): EnvelopeRead {
  const t = b.total;
  let governing = 0;
  let largest = -1;
  let hForce = 0;
  let hState = -1;
  let upForce = 0;
  let upState = -1;
  let downForce = 0;
  let downState = -1;
  let pressure = -Infinity;
  for (let k = 0; k < b.count; k++) {
    const n = size(t, k);
    if (n > largest) {
      largest = n;
      governing = k;
    }
    const h = planSize(t, k);
    if (h > hForce) {
      hForce = h;
      hState = k;
    }
    const z = t[3 * k + 2]!;
    if (z > upForce) {
      upForce = z;
      upState = k;
    }
    if (-z > downForce) {
      downForce = -z;
      downState = k;
    }
    if (b.pressure[k]! > pressure) pressure = b.pressure[k]!;
  }
  const direction: Vec3 = hState < 0 ? [0, 0, 0] : [t[3 * hState]! / hForce, t[3 * hState + 1]! / hForce, 0];
  const horizontal: Extreme & { direction: Vec3 } = { force: hForce, caseId: caseOf(b, cases, hState), direction };
  let reverse: ThrustEnvelope['reverse'] = null;
  let rForce = 0;
  let rState = -1;
  for (let k = 0; k < b.count; k++) {
    const h = planSize(t, k);
    // Opposed by more than 90°, and more than floating-point noise of the main thrust.
    if (h > 1e-7 * hForce && t[3 * k]! * direction[0] + t[3 * k + 1]! * direction[1] < 0 && h > rForce) {
      rForce = h;
      rState = k;
    }
  }
  // no states (no load case): no governing state, as the states' list gives none
  const governingState =
    b.count > 0 ? stateAt(b, governing, cases, legs, NO_THRUST) : (undefined as unknown as CaseThrust);
  if (rState >= 0) {
    const s = rState === governing ? governingState : stateAt(b, rState, cases, legs, NO_THRUST);
    reverse = {
      force: rForce,
      caseId: s.caseId,
      direction: [t[3 * rState]! / rForce, t[3 * rState + 1]! / rForce, 0],
      state: s,
    };
  }
  return {
    envelope: {
      governing: governingState,
      horizontal,
      reverse,
      upward: upState < 0 ? NO_EXTREME : { force: upForce, caseId: caseOf(b, cases, upState) },
      downward: downState < 0 ? NO_EXTREME : { force: downForce, caseId: caseOf(b, cases, downState) },
      pressure,
    },
    governingState: governing,
    reverseState: rState,
  };
}

/**
 * The states in the buffer as objects and the worst per case, by the rules of thrust/fittingThrust.ts
 * (worstPerCase): the same comparisons in the same order over the same numbers. `known` (the envelope
 * read from the same buffer) gives the objects already made for its governing and reverse states,
 * which stay the same objects here.
 */
export function readCases(
  b: StateBuffer,
  cases: readonly LoadCase[],
  legs: readonly Leg[],
  known: EnvelopeRead,
): { states: CaseThrust[]; cases: CaseThrust[] } {
  const t = b.total;
  const states: CaseThrust[] = new Array<CaseThrust>(b.count);
  for (let k = 0; k < b.count; k++) {
    if (k === known.governingState) states[k] = known.envelope.governing;
    else if (k === known.reverseState) states[k] = known.envelope.reverse!.state;
    else states[k] = stateAt(b, k, cases, legs, k > 0 ? states[k - 1]!.dynamic : NO_THRUST);
  }
  let worst: CaseThrust[];
  if (b.count === cases.length) worst = states;
  else {
    worst = [];
    for (let k = 0; k < b.count; k++) {
      const c = b.caseIndex[k]!;
      let best = k;
      while (k + 1 < b.count && b.caseIndex[k + 1] === c) {
        k++;
        if (size(t, k) > size(t, best)) best = k;
      }
      worst.push(states[best]!);
    }
  }
  return { states, cases: worst };
}

/**
 * Each case's pressure at the node, as the worst state per case gives it (every state of a case has the
 * case's pressure at the node, so the first state of each case serves), without making the states.
 */
export function casePressures(b: StateBuffer, cases: readonly LoadCase[]): CasePressures {
  return (each) => {
    for (let k = 0; k < b.count; k++)
      if (k === 0 || b.caseIndex[k] !== b.caseIndex[k - 1]) each(cases[b.caseIndex[k]!]!.id, b.pressure[k]!);
  };
}

/** Calls `each` with every case's id and pressure, in case order. */
export type CasePressures = (each: (caseId: string, pressure: number) => void) => void;
