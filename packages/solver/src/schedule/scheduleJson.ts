import type { Vec3 } from '../geometry/vector.js';
import { DIAGNOSTIC_CODES } from '../diagnostics/codes.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { Dimension } from '../units/conversions.js';
import { roundTo } from '../units/format.js';
import type { Schedule, ScheduleBlock, ScheduleFitting } from './scheduleRows.js';
import { JsonIndenter } from './jsonIndent.js';
import { JsonBytes } from './jsonBytes.js';

/**
 * Decimals kept in the JSON schedule per kind of quantity, SI (docs/project-format.md): millimetres,
 * a hundredth of a millimetre for diameters, a tenth of a newton, a pascal, a ten-thousandth of a
 * degree, of a square and of a cubic metre. Built dimensions and volumes round up, never down.
 */
export const JSON_DECIMALS: Record<Dimension | 'unit', number> = {
  length: 3,
  elevation: 3,
  diameter: 5,
  area: 4,
  volume: 4,
  force: 1,
  pressure: 0,
  stress: 0,
  unitWeight: 0,
  flow: 6,
  density: 2,
  angle: 4,
  velocity: 3,
  forcePerLength: 1,
  stressGradient: 0,
  ratio: 3,
  unit: 6,
};

const r = (v: number, kind: keyof typeof JSON_DECIMALS) => roundTo(v, JSON_DECIMALS[kind]);

/** A diagnostic as JSON: each value with its kind of quantity, SI, at the stated precision. */
export function diagnosticJson(d: Diagnostic) {
  const kinds = DIAGNOSTIC_CODES[d.code].values as Record<string, Dimension>;
  const values: Record<string, { value: number; kind: Dimension }> = {};
  for (const [name, v] of Object.entries(d.values)) {
    const kind = kinds[name] ?? 'ratio';
    values[name] = { value: r(v, kind), kind };
  }
  return { code: d.code, severity: d.severity, subject: d.subject, values };
}

export interface ScheduleJsonOptions {
  /** indent for reading (default false) */
  pretty?: boolean;
  /**
   * repeat what the project file says — each fitting's position, label and soil, its pipes' diameters
   * and material — beside the results (default true); the command line leaves it out unless --full
   */
  echo?: boolean;
}

export interface ScheduleJsonWriting extends ScheduleJsonOptions {
  /** bytes of UTF-8 gathered before each call of `write` (default 64 Ki) */
  chunk?: number;
}

const D = JSON_DECIMALS;

function vec(o: JsonBytes, v: Vec3, decimals: number): void {
  o.raw('[');
  o.round(v[0], decimals);
  o.raw(',');
  o.round(v[1], decimals);
  o.raw(',');
  o.round(v[2], decimals);
  o.raw(']');
}

function strOrNull(o: JsonBytes, text: string | null): void {
  if (text === null) o.raw('null');
  else o.str(text);
}

function list(o: JsonBytes, items: readonly string[]): void {
  o.raw('[');
  for (let i = 0; i < items.length; i++) {
    if (i) o.raw(',');
    o.str(items[i]!);
  }
  o.raw(']');
}

function block(o: JsonBytes, b: ScheduleBlock | null): void {
  if (!b) return o.raw('null');
  o.raw('{"bearingArea":');
  o.round(b.bearingArea, D.area);
  o.raw(',"faceWidth":');
  o.up(b.faceWidth, D.length);
  o.raw(',"faceHeight":');
  o.up(b.faceHeight, D.length);
  o.raw(',"concreteVolume":');
  o.up(b.concreteVolume, D.volume);
  o.raw(',"depth":');
  o.up(b.depth, D.length);
  o.raw(',"direction":');
  vec(o, b.direction, D.unit);
  o.raw(',"passiveResistance":');
  o.round(b.passiveResistance, D.force);
  o.raw(',"passiveRatio":');
  o.round(b.passiveRatio, D.ratio);
  o.raw(',"shapeFactor":');
  o.round(b.shapeFactor, D.ratio);
  o.raw(',"governs":');
  o.str(b.governs);
  o.raw(',"thrust":');
  o.round(b.thrust, D.force);
  o.raw(',"upwardThrust":');
  o.round(b.upwardThrust, D.force);
  o.raw('}');
}

/** What `diagnosticJson` gives, as text: the subject's fields in their order, each value with its kind. */
function diagnosticText(o: JsonBytes, d: Diagnostic): void {
  const kinds = DIAGNOSTIC_CODES[d.code].values as Record<string, Dimension>;
  o.raw('{"code":');
  o.str(d.code);
  o.raw(',"severity":');
  o.str(d.severity);
  o.raw(',"subject":{');
  const s = d.subject as Record<string, unknown>;
  let first = true;
  for (const key of Object.keys(s)) {
    const v = s[key];
    if (v === undefined) continue; // as JSON.stringify leaves it out
    if (!first) o.raw(',');
    first = false;
    o.str(key);
    o.raw(':');
    if (typeof v === 'string') o.str(v);
    else o.json(JSON.stringify(v));
  }
  o.raw('},"values":{');
  first = true;
  for (const name of Object.keys(d.values)) {
    const kind = kinds[name] ?? 'ratio';
    if (!first) o.raw(',');
    first = false;
    o.str(name);
    o.raw(':{"value":');
    o.round(d.values[name]!, D[kind]);
    o.raw(',"kind":');
    o.str(kind);
    o.raw('}');
  }
  o.raw('}}');
}

function diagnosticList(o: JsonBytes, list: readonly Diagnostic[]): void {
  o.raw('[');
  for (let i = 0; i < list.length; i++) {
    if (i) o.raw(',');
    diagnosticText(o, list[i]!);
  }
  o.raw(']');
}

function restraintText(o: JsonBytes, x: ScheduleFitting['restraint']): void {
  o.raw('{"block":');
  block(o, x.block);
  o.raw(',"reverseBlock":');
  block(o, x.reverseBlock);
  o.raw(',"anchor":');
  const a = x.anchor;
  if (a) {
    o.raw('{"concreteVolume":');
    o.up(a.concreteVolume, D.volume);
    o.raw(',"length":');
    o.up(a.length, D.length);
    o.raw(',"width":');
    o.up(a.width, D.length);
    o.raw(',"height":');
    o.up(a.height, D.length);
    o.raw(',"side":');
    o.up(a.side, D.length);
    o.raw(a.submerged ? ',"submerged":true' : ',"submerged":false');
    o.raw(',"upwardThrust":');
    o.round(a.upwardThrust, D.force);
    o.raw(',"horizontalThrust":');
    o.round(a.horizontalThrust, D.force);
    o.raw('}');
  } else o.raw('null');
  o.raw(',"trenchBottom":');
  const t = x.trenchBottom;
  if (t) {
    o.raw('{"bearingArea":');
    o.round(t.bearingArea, D.area);
    o.raw(',"width":');
    o.up(t.width, D.length);
    o.raw(',"length":');
    o.up(t.length, D.length);
    o.raw('}');
  } else o.raw('null');
  o.raw(',"restrainedLength":');
  if (x.restrainedLength === null) o.raw('null');
  else o.up(x.restrainedLength, D.length);
  o.raw(',"restrainedLegs":[');
  const legs = x.restrainedLegs;
  for (let i = 0; i < legs.length; i++) {
    const l = legs[i]!;
    o.raw(i ? ',{"pipe":' : '{"pipe":');
    o.str(l.pipe);
    o.raw(',"length":');
    o.up(l.length, D.length);
    o.raw(',"toward":');
    strOrNull(o, l.toward);
    o.raw(',"joints":');
    o.num(l.joints);
    o.raw('}');
  }
  o.raw(']}');
}

function pipesText(o: JsonBytes, pipes: ScheduleFitting['pipes'], echo: boolean): void {
  o.raw('[');
  for (let i = 0; i < pipes.length; i++) {
    const p = pipes[i]!;
    o.raw(i ? ',{"id":' : '{"id":');
    o.str(p.id);
    if (echo) {
      o.raw(',"outsideDiameter":');
      o.round(p.outsideDiameter, D.diameter);
      o.raw(',"insideDiameter":');
      o.round(p.insideDiameter, D.diameter);
      o.raw(',"material":');
      o.str(p.material);
    }
    o.raw(',"toward":');
    strOrNull(o, p.toward);
    o.raw('}');
  }
  o.raw(']');
}

/**
 * One fitting at the stated precision, in the order of the schedule row's fields; without `echo`,
 * what the project file already says (position, label, soil, the pipes' sizes) is left out and the
 * pipes, as id and toward, come last.
 */
function fittingText(o: JsonBytes, f: ScheduleFitting, echo: boolean): void {
  o.raw('{"node":');
  o.str(f.node);
  o.raw(',"mark":');
  o.str(f.mark);
  o.raw(',"run":');
  o.str(f.run);
  if (echo) {
    o.raw(',"label":');
    strOrNull(o, f.label);
  }
  o.raw(',"kind":');
  o.str(f.kind);
  o.raw(',"deflection":');
  o.roundOrNull(f.deflection, D.angle);
  o.raw(',"horizontalDeflection":');
  o.roundOrNull(f.horizontalDeflection, D.angle);
  o.raw(',"verticalDeflection":');
  o.roundOrNull(f.verticalDeflection, D.angle);
  o.raw(',"branchAngle":');
  o.roundOrNull(f.branchAngle, D.angle);
  o.raw(',"chainage":');
  o.round(f.chainage, D.length);
  if (echo) {
    o.raw(',"position":');
    vec(o, f.position, D.length);
  }
  o.raw(',"cover":');
  o.round(f.cover, D.length);
  o.raw(',"groundLevel":');
  o.round(f.groundLevel, D.elevation);
  if (echo) {
    o.raw(',"pipes":');
    pipesText(o, f.pipes, true);
    o.raw(',"soil":');
    o.str(f.soil);
  }
  o.raw(',"cases":[');
  // A row's parts are behind getters (built when first read): each is read once.
  const cases = f.cases;
  for (let i = 0; i < cases.length; i++) {
    const c = cases[i]!;
    o.raw(i ? ',{"case":' : '{"case":');
    o.str(c.case);
    o.raw(',"pressure":');
    o.round(c.pressure, D.pressure);
    o.raw(',"static":');
    vec(o, c.static, D.force);
    o.raw(',"dynamic":');
    vec(o, c.dynamic, D.force);
    o.raw(',"total":');
    vec(o, c.total, D.force);
    o.raw(',"closedAgainst":');
    strOrNull(o, c.closedAgainst);
    o.raw('}');
  }
  o.raw('],"governingCase":');
  o.str(f.governingCase);
  o.raw(',"designPressure":');
  o.round(f.designPressure, D.pressure);
  o.raw(',"thrust":');
  vec(o, f.thrust, D.force);
  o.raw(',"horizontalThrust":');
  o.round(f.horizontalThrust, D.force);
  o.raw(',"upwardThrust":');
  o.round(f.upwardThrust, D.force);
  o.raw(',"downwardThrust":');
  o.round(f.downwardThrust, D.force);
  o.raw(',"bearingDirection":');
  o.roundOrNull(f.bearingDirection, D.angle);
  o.raw(',"profile":');
  strOrNull(o, f.profile);
  o.raw(',"waterWeight":');
  o.round(f.waterWeight, D.force);
  o.raw(',"restraint":');
  restraintText(o, f.restraint);
  o.raw(',"warnings":');
  list(o, f.warnings);
  o.raw(',"diagnostics":');
  diagnosticList(o, f.diagnostics);
  o.raw(',"unverified":');
  list(o, f.unverified);
  if (!echo) {
    o.raw(',"pipes":');
    pipesText(o, f.pipes, false);
  }
  o.raw('}');
}

export interface ScheduleJsonBytes {
  /** repeat what the project file says (as ScheduleJsonOptions.echo; default true) */
  echo?: boolean;
  /** bytes gathered before each call of `write` (default 64 Ki) */
  chunk?: number;
  /** characters beyond ASCII to write as \uXXXX as well (see JsonBytes): the terminal guard */
  escape?: (code: number) => boolean;
}

/**
 * Writes the schedule as compact JSON in UTF-8 at the stated precision (no 0.7000000000000001), the
 * same whatever the display units, in pieces of about `chunk` bytes: each fitting's text is made from
 * its row into a byte buffer and handed on, so no tree of rounded copies, no string per number and no
 * one string of the whole output is ever made (a 10,000-fitting schedule is some 13 MB of text). The
 * text is what `JSON.stringify` makes of the schedule's fields in the row's order — held so, byte for
 * byte, by a test against that serialiser. Each piece is a new array: the receiver may keep it.
 */
export function writeScheduleJsonBytes(
  s: Schedule,
  write: (bytes: Uint8Array) => void,
  options: ScheduleJsonBytes = {},
): void {
  const { echo = true, chunk = 1 << 16, escape = null } = options;
  const o = new JsonBytes(write, chunk, escape);
  o.raw('{"project":');
  o.str(s.project);
  o.raw(',"units":');
  o.str(s.units);
  o.raw(',"warnings":');
  list(o, s.warnings);
  o.raw(',"diagnostics":');
  diagnosticList(o, s.diagnostics);
  o.raw(',"fittings":[');
  const fittings = s.fittings;
  for (let i = 0; i < fittings.length; i++) {
    if (i) o.raw(',');
    fittingText(o, fittings[i]!, echo);
  }
  o.raw('],"cautions":');
  list(o, s.cautions);
  o.raw('}\n');
  o.flush();
}

/**
 * The same text as strings, in pieces of about `chunk` bytes' worth, indented as
 * `JSON.stringify(v, null, 2)` lays it out when `pretty` (the indenter passes the last line end as it is).
 */
export function writeScheduleJson(s: Schedule, write: (text: string) => void, options: ScheduleJsonWriting = {}): void {
  const { pretty = false, echo = true, chunk = 1 << 16 } = options;
  const indent = pretty ? new JsonIndenter() : null;
  const decoder = new TextDecoder();
  const put = (text: string) => {
    if (text) write(indent ? indent.feed(text) : text);
  };
  writeScheduleJsonBytes(s, (bytes) => put(decoder.decode(bytes, { stream: true })), { echo, chunk });
  put(decoder.decode());
}
/**
 * The schedule as JSON text at the stated precision, the same whatever the display units: what the app
 * exports and, without the echoed input, what `schedule --format json` prints (there streamed).
 */
export function scheduleJson(s: Schedule, options: boolean | ScheduleJsonOptions = {}): string {
  const parts: string[] = [];
  writeScheduleJson(s, (text) => parts.push(text), typeof options === 'boolean' ? { pretty: options } : options);
  return parts.join('');
}
