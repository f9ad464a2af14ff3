import type { Vec3 } from '../geometry/vector.js';
import { DIAGNOSTIC_CODES } from '../diagnostics/codes.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { Dimension } from '../units/conversions.js';
import { roundTo } from '../units/format.js';
import type { Schedule, ScheduleBlock, ScheduleFitting } from './scheduleRows.js';
import { JsonIndenter } from './jsonIndent.js';
import { ascii, JsonBytes } from './jsonBytes.js';
import { CAUTIONS } from './cautions.js';

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

/** Character codes of the JSON punctuation written on its own. */
const COMMA = 44;
const COLON = 58;
const OPEN_BRACKET = 91;
const CLOSE_BRACKET = 93;
const CLOSE_BRACE = 125;

/**
 * The schedule's keys with the punctuation around them, and its other fixed texts, as bytes made once:
 * the writer copies each into its buffer (at 10,000 fittings, some 1.5 million of them).
 */
const K = {
  null: ascii('null'),
  openBearingArea: ascii('{"bearingArea":'),
  faceWidth: ascii(',"faceWidth":'),
  faceHeight: ascii(',"faceHeight":'),
  concreteVolume: ascii(',"concreteVolume":'),
  depth: ascii(',"depth":'),
  direction: ascii(',"direction":'),
  passiveResistance: ascii(',"passiveResistance":'),
  passiveRatio: ascii(',"passiveRatio":'),
  shapeFactor: ascii(',"shapeFactor":'),
  governs: ascii(',"governs":'),
  thrust: ascii(',"thrust":'),
  upwardThrust: ascii(',"upwardThrust":'),
  openCode: ascii('{"code":'),
  severity: ascii(',"severity":'),
  subjectOpen: ascii(',"subject":{'),
  valuesOpen: ascii('},"values":{'),
  valueOpen: ascii(':{"value":'),
  kind: ascii(',"kind":'),
  closeTwo: ascii('}}'),
  openBlock: ascii('{"block":'),
  reverseBlock: ascii(',"reverseBlock":'),
  anchor: ascii(',"anchor":'),
  openConcreteVolume: ascii('{"concreteVolume":'),
  length: ascii(',"length":'),
  width: ascii(',"width":'),
  height: ascii(',"height":'),
  side: ascii(',"side":'),
  horizontalThrust: ascii(',"horizontalThrust":'),
  trenchBottom: ascii(',"trenchBottom":'),
  restrainedLength: ascii(',"restrainedLength":'),
  restrainedLegsOpen: ascii(',"restrainedLegs":['),
  toward: ascii(',"toward":'),
  joints: ascii(',"joints":'),
  closeListObject: ascii(']}'),
  outsideDiameter: ascii(',"outsideDiameter":'),
  insideDiameter: ascii(',"insideDiameter":'),
  material: ascii(',"material":'),
  openNode: ascii('{"node":'),
  mark: ascii(',"mark":'),
  run: ascii(',"run":'),
  label: ascii(',"label":'),
  deflection: ascii(',"deflection":'),
  horizontalDeflection: ascii(',"horizontalDeflection":'),
  verticalDeflection: ascii(',"verticalDeflection":'),
  branchAngle: ascii(',"branchAngle":'),
  chainage: ascii(',"chainage":'),
  position: ascii(',"position":'),
  cover: ascii(',"cover":'),
  groundLevel: ascii(',"groundLevel":'),
  pipes: ascii(',"pipes":'),
  soil: ascii(',"soil":'),
  casesOpen: ascii(',"cases":['),
  pressure: ascii(',"pressure":'),
  static: ascii(',"static":'),
  dynamic: ascii(',"dynamic":'),
  total: ascii(',"total":'),
  closedAgainst: ascii(',"closedAgainst":'),
  governingCaseAfterList: ascii('],"governingCase":'),
  designPressure: ascii(',"designPressure":'),
  downwardThrust: ascii(',"downwardThrust":'),
  bearingDirection: ascii(',"bearingDirection":'),
  profile: ascii(',"profile":'),
  waterWeight: ascii(',"waterWeight":'),
  restraint: ascii(',"restraint":'),
  warnings: ascii(',"warnings":'),
  diagnostics: ascii(',"diagnostics":'),
  unverified: ascii(',"unverified":'),
  openProject: ascii('{"project":'),
  units: ascii(',"units":'),
  fittingsOpen: ascii(',"fittings":['),
  cautionsAfterList: ascii('],"cautions":'),
  end: ascii('}\n'),
  submergedTrue: ascii(',"submerged":true'),
  submergedFalse: ascii(',"submerged":false'),
  openPipe: ascii('{"pipe":'),
  openId: ascii('{"id":'),
  openCase: ascii('{"case":'),
};

function vec(o: JsonBytes, v: Vec3, decimals: number): void {
  o.byte(OPEN_BRACKET);
  o.round(v[0], decimals);
  o.byte(COMMA);
  o.round(v[1], decimals);
  o.byte(COMMA);
  o.round(v[2], decimals);
  o.byte(CLOSE_BRACKET);
}

function strOrNull(o: JsonBytes, text: string | null): void {
  if (text === null) o.bytes(K.null);
  else o.str(text);
}

function list(o: JsonBytes, items: readonly string[]): void {
  o.byte(OPEN_BRACKET);
  for (let i = 0; i < items.length; i++) {
    if (i) o.byte(COMMA);
    o.str(items[i]!);
  }
  o.byte(CLOSE_BRACKET);
}

function block(o: JsonBytes, b: ScheduleBlock | null): void {
  if (!b) return o.bytes(K.null);
  o.bytes(K.openBearingArea);
  o.round(b.bearingArea, D.area);
  o.bytes(K.faceWidth);
  o.up(b.faceWidth, D.length);
  o.bytes(K.faceHeight);
  o.up(b.faceHeight, D.length);
  o.bytes(K.concreteVolume);
  o.up(b.concreteVolume, D.volume);
  o.bytes(K.depth);
  o.up(b.depth, D.length);
  o.bytes(K.direction);
  vec(o, b.direction, D.unit);
  o.bytes(K.passiveResistance);
  o.round(b.passiveResistance, D.force);
  o.bytes(K.passiveRatio);
  o.round(b.passiveRatio, D.ratio);
  o.bytes(K.shapeFactor);
  o.round(b.shapeFactor, D.ratio);
  o.bytes(K.governs);
  o.str(b.governs);
  o.bytes(K.thrust);
  o.round(b.thrust, D.force);
  o.bytes(K.upwardThrust);
  o.round(b.upwardThrust, D.force);
  o.byte(CLOSE_BRACE);
}

/** What `diagnosticJson` gives, as text: the subject's fields in their order, each value with its kind. */
function diagnosticText(o: JsonBytes, d: Diagnostic): void {
  const kinds = DIAGNOSTIC_CODES[d.code].values as Record<string, Dimension>;
  o.bytes(K.openCode);
  o.str(d.code);
  o.bytes(K.severity);
  o.str(d.severity);
  o.bytes(K.subjectOpen);
  const s = d.subject as Record<string, unknown>;
  let first = true;
  for (const key of Object.keys(s)) {
    const v = s[key];
    if (v === undefined) continue; // as JSON.stringify leaves it out
    if (!first) o.byte(COMMA);
    first = false;
    o.str(key);
    o.byte(COLON);
    if (typeof v === 'string') o.str(v);
    else o.json(JSON.stringify(v));
  }
  o.bytes(K.valuesOpen);
  first = true;
  for (const name of Object.keys(d.values)) {
    const kind = kinds[name] ?? 'ratio';
    if (!first) o.byte(COMMA);
    first = false;
    o.str(name);
    o.bytes(K.valueOpen);
    o.round(d.values[name]!, D[kind]);
    o.bytes(K.kind);
    o.str(kind);
    o.byte(CLOSE_BRACE);
  }
  o.bytes(K.closeTwo);
}

function diagnosticList(o: JsonBytes, list: readonly Diagnostic[]): void {
  o.byte(OPEN_BRACKET);
  for (let i = 0; i < list.length; i++) {
    if (i) o.byte(COMMA);
    diagnosticText(o, list[i]!);
  }
  o.byte(CLOSE_BRACKET);
}

function restraintText(o: JsonBytes, x: ScheduleFitting['restraint']): void {
  o.bytes(K.openBlock);
  block(o, x.block);
  o.bytes(K.reverseBlock);
  block(o, x.reverseBlock);
  o.bytes(K.anchor);
  const a = x.anchor;
  if (a) {
    o.bytes(K.openConcreteVolume);
    o.up(a.concreteVolume, D.volume);
    o.bytes(K.length);
    o.up(a.length, D.length);
    o.bytes(K.width);
    o.up(a.width, D.length);
    o.bytes(K.height);
    o.up(a.height, D.length);
    o.bytes(K.side);
    o.up(a.side, D.length);
    o.bytes(a.submerged ? K.submergedTrue : K.submergedFalse);
    o.bytes(K.upwardThrust);
    o.round(a.upwardThrust, D.force);
    o.bytes(K.horizontalThrust);
    o.round(a.horizontalThrust, D.force);
    o.byte(CLOSE_BRACE);
  } else o.bytes(K.null);
  o.bytes(K.trenchBottom);
  const t = x.trenchBottom;
  if (t) {
    o.bytes(K.openBearingArea);
    o.round(t.bearingArea, D.area);
    o.bytes(K.width);
    o.up(t.width, D.length);
    o.bytes(K.length);
    o.up(t.length, D.length);
    o.byte(CLOSE_BRACE);
  } else o.bytes(K.null);
  o.bytes(K.restrainedLength);
  if (x.restrainedLength === null) o.bytes(K.null);
  else o.up(x.restrainedLength, D.length);
  o.bytes(K.restrainedLegsOpen);
  const legs = x.restrainedLegs;
  for (let i = 0; i < legs.length; i++) {
    const l = legs[i]!;
    if (i) o.byte(COMMA);
    o.bytes(K.openPipe);
    o.str(l.pipe);
    o.bytes(K.length);
    o.up(l.length, D.length);
    o.bytes(K.toward);
    strOrNull(o, l.toward);
    o.bytes(K.joints);
    o.num(l.joints);
    o.byte(CLOSE_BRACE);
  }
  o.bytes(K.closeListObject);
}

function pipesText(o: JsonBytes, pipes: ScheduleFitting['pipes'], echo: boolean): void {
  o.byte(OPEN_BRACKET);
  for (let i = 0; i < pipes.length; i++) {
    const p = pipes[i]!;
    if (i) o.byte(COMMA);
    o.bytes(K.openId);
    o.str(p.id);
    if (echo) {
      o.bytes(K.outsideDiameter);
      o.round(p.outsideDiameter, D.diameter);
      o.bytes(K.insideDiameter);
      o.round(p.insideDiameter, D.diameter);
      o.bytes(K.material);
      o.str(p.material);
    }
    o.bytes(K.toward);
    strOrNull(o, p.toward);
    o.byte(CLOSE_BRACE);
  }
  o.byte(CLOSE_BRACKET);
}

/**
 * One fitting at the stated precision, in the order of the schedule row's fields; without `echo`,
 * what the project file already says (position, label, soil, the pipes' sizes) is left out and the
 * pipes, as id and toward, come last.
 */
function fittingText(o: JsonBytes, f: ScheduleFitting, echo: boolean): void {
  o.bytes(K.openNode);
  o.str(f.node);
  o.bytes(K.mark);
  o.str(f.mark);
  o.bytes(K.run);
  o.str(f.run);
  if (echo) {
    o.bytes(K.label);
    strOrNull(o, f.label);
  }
  o.bytes(K.kind);
  o.str(f.kind);
  o.bytes(K.deflection);
  o.roundOrNull(f.deflection, D.angle);
  o.bytes(K.horizontalDeflection);
  o.roundOrNull(f.horizontalDeflection, D.angle);
  o.bytes(K.verticalDeflection);
  o.roundOrNull(f.verticalDeflection, D.angle);
  o.bytes(K.branchAngle);
  o.roundOrNull(f.branchAngle, D.angle);
  o.bytes(K.chainage);
  o.round(f.chainage, D.length);
  if (echo) {
    o.bytes(K.position);
    vec(o, f.position, D.length);
  }
  o.bytes(K.cover);
  o.round(f.cover, D.length);
  o.bytes(K.groundLevel);
  o.round(f.groundLevel, D.elevation);
  if (echo) {
    o.bytes(K.pipes);
    pipesText(o, f.pipes, true);
    o.bytes(K.soil);
    o.str(f.soil);
  }
  o.bytes(K.casesOpen);
  // A row's parts are behind getters (built when first read): each is read once.
  const cases = f.cases;
  for (let i = 0; i < cases.length; i++) {
    const c = cases[i]!;
    if (i) o.byte(COMMA);
    o.bytes(K.openCase);
    o.str(c.case);
    o.bytes(K.pressure);
    o.round(c.pressure, D.pressure);
    o.bytes(K.static);
    vec(o, c.static, D.force);
    o.bytes(K.dynamic);
    vec(o, c.dynamic, D.force);
    o.bytes(K.total);
    vec(o, c.total, D.force);
    o.bytes(K.closedAgainst);
    strOrNull(o, c.closedAgainst);
    o.byte(CLOSE_BRACE);
  }
  o.bytes(K.governingCaseAfterList);
  o.str(f.governingCase);
  o.bytes(K.designPressure);
  o.round(f.designPressure, D.pressure);
  o.bytes(K.thrust);
  vec(o, f.thrust, D.force);
  o.bytes(K.horizontalThrust);
  o.round(f.horizontalThrust, D.force);
  o.bytes(K.upwardThrust);
  o.round(f.upwardThrust, D.force);
  o.bytes(K.downwardThrust);
  o.round(f.downwardThrust, D.force);
  o.bytes(K.bearingDirection);
  o.roundOrNull(f.bearingDirection, D.angle);
  o.bytes(K.profile);
  strOrNull(o, f.profile);
  o.bytes(K.waterWeight);
  o.round(f.waterWeight, D.force);
  o.bytes(K.restraint);
  restraintText(o, f.restraint);
  o.bytes(K.warnings);
  list(o, f.warnings);
  o.bytes(K.diagnostics);
  diagnosticList(o, f.diagnostics);
  o.bytes(K.unverified);
  list(o, f.unverified);
  if (!echo) {
    o.bytes(K.pipes);
    pipesText(o, f.pipes, false);
  }
  o.byte(CLOSE_BRACE);
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
  o.bytes(K.openProject);
  o.str(s.project);
  o.bytes(K.units);
  o.str(s.units);
  o.bytes(K.warnings);
  list(o, s.warnings);
  o.bytes(K.diagnostics);
  diagnosticList(o, s.diagnostics);
  o.bytes(K.fittingsOpen);
  const fittings = s.fittings;
  for (let i = 0; i < fittings.length; i++) {
    if (i) o.byte(COMMA);
    fittingText(o, fittings[i]!, echo);
  }
  o.bytes(K.cautionsAfterList);
  list(o, CAUTIONS);
  o.bytes(K.end);
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
