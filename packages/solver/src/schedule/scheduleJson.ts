import type { Vec3 } from '../geometry/vector.js';
import { DIAGNOSTIC_CODES } from '../diagnostics/codes.js';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { Dimension } from '../units/conversions.js';
import { ceilTo, roundTo } from '../units/format.js';
import type { Schedule, ScheduleBlock, ScheduleFitting } from './scheduleRows.js';
import { JsonIndenter } from './jsonIndent.js';
import { decimalText } from './jsonNumber.js';

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
  /** characters gathered before each call of `write` (default 64 Ki) */
  chunk?: number;
}

// The number texts, as JSON.stringify writes a number: finite ones as String does (-0 as 0), others null.
const num = (v: number): string => (Number.isFinite(v) ? String(v) : 'null');

const D = JSON_DECIMALS;
const round = (v: number, decimals: number) => decimalText(roundTo(v, decimals), decimals);
/** built dimensions and volumes: up, never down */
const up = (v: number, decimals: number) => decimalText(ceilTo(v, decimals), decimals);
const roundOrNull = (v: number | null, decimals: number) => (v === null ? 'null' : round(v, decimals));
const vec = (v: Vec3, decimals: number) =>
  `[${round(v[0], decimals)},${round(v[1], decimals)},${round(v[2], decimals)}]`;

/** A string value as a JSON literal. */
const q = (text: string): string => JSON.stringify(text);

const orNull = (text: string | null) => (text === null ? 'null' : q(text));

function list(items: readonly string[]): string {
  let out = '';
  for (let i = 0; i < items.length; i++) out += (i ? ',' : '') + q(items[i]!);
  return `[${out}]`;
}

function block(b: ScheduleBlock | null): string {
  if (!b) return 'null';
  return (
    `{"bearingArea":${round(b.bearingArea, D.area)},"faceWidth":${up(b.faceWidth, D.length)}` +
    `,"faceHeight":${up(b.faceHeight, D.length)},"concreteVolume":${up(b.concreteVolume, D.volume)}` +
    `,"depth":${up(b.depth, D.length)},"direction":${vec(b.direction, D.unit)}` +
    `,"passiveResistance":${round(b.passiveResistance, D.force)},"passiveRatio":${round(b.passiveRatio, D.ratio)}` +
    `,"shapeFactor":${round(b.shapeFactor, D.ratio)},"governs":${q(b.governs)}` +
    `,"thrust":${round(b.thrust, D.force)},"upwardThrust":${round(b.upwardThrust, D.force)}}`
  );
}

/** What `diagnosticJson` gives, as text: the subject's fields in their order, each value with its kind. */
function diagnosticJsonText(d: Diagnostic): string {
  const kinds = DIAGNOSTIC_CODES[d.code].values as Record<string, Dimension>;
  let subject = '';
  const s = d.subject as Record<string, unknown>;
  for (const key of Object.keys(s)) {
    const v = s[key];
    if (v === undefined) continue; // as JSON.stringify leaves it out
    subject += `${subject ? ',' : ''}${q(key)}:${typeof v === 'string' ? q(v) : JSON.stringify(v)}`;
  }
  let values = '';
  for (const name of Object.keys(d.values)) {
    const kind = kinds[name] ?? 'ratio';
    values += `${values ? ',' : ''}${q(name)}:{"value":${round(d.values[name]!, D[kind])},"kind":${q(kind)}}`;
  }
  return `{"code":${q(d.code)},"severity":${q(d.severity)},"subject":{${subject}},"values":{${values}}}`;
}

function diagnosticList(list: readonly Diagnostic[]): string {
  let out = '';
  for (let i = 0; i < list.length; i++) out += (i ? ',' : '') + diagnosticJsonText(list[i]!);
  return `[${out}]`;
}

function restraintText(x: ScheduleFitting['restraint']): string {
  const a = x.anchor;
  const anchor = a
    ? `{"concreteVolume":${up(a.concreteVolume, D.volume)},"length":${up(a.length, D.length)}` +
      `,"width":${up(a.width, D.length)},"height":${up(a.height, D.length)},"side":${up(a.side, D.length)}` +
      `,"submerged":${a.submerged},"upwardThrust":${round(a.upwardThrust, D.force)}` +
      `,"horizontalThrust":${round(a.horizontalThrust, D.force)}}`
    : 'null';
  const t = x.trenchBottom;
  const trench = t
    ? `{"bearingArea":${round(t.bearingArea, D.area)},"width":${up(t.width, D.length)},"length":${up(t.length, D.length)}}`
    : 'null';
  let legs = '';
  for (let i = 0; i < x.restrainedLegs.length; i++) {
    const l = x.restrainedLegs[i]!;
    legs +=
      `${i ? ',' : ''}{"pipe":${q(l.pipe)},"length":${up(l.length, D.length)}` +
      `,"toward":${orNull(l.toward)},"joints":${num(l.joints)}}`;
  }
  return (
    `{"block":${block(x.block)},"reverseBlock":${block(x.reverseBlock)},"anchor":${anchor}` +
    `,"trenchBottom":${trench},"restrainedLength":${x.restrainedLength === null ? 'null' : up(x.restrainedLength, D.length)}` +
    `,"restrainedLegs":[${legs}]}`
  );
}

/**
 * One fitting at the stated precision, in the order of the schedule row's fields; without `echo`,
 * what the project file already says (position, label, soil, the pipes' sizes) is left out and the
 * pipes, as id and toward, come last.
 */
function fittingText(f: ScheduleFitting, echo: boolean): string {
  let pipes = '';
  for (let i = 0; i < f.pipes.length; i++) {
    const p = f.pipes[i]!;
    pipes += echo
      ? `${i ? ',' : ''}{"id":${q(p.id)},"outsideDiameter":${round(p.outsideDiameter, D.diameter)}` +
        `,"insideDiameter":${round(p.insideDiameter, D.diameter)},"material":${q(p.material)},"toward":${orNull(p.toward)}}`
      : `${i ? ',' : ''}{"id":${q(p.id)},"toward":${orNull(p.toward)}}`;
  }
  let cases = '';
  for (let i = 0; i < f.cases.length; i++) {
    const c = f.cases[i]!;
    cases +=
      `${i ? ',' : ''}{"case":${q(c.case)},"pressure":${round(c.pressure, D.pressure)}` +
      `,"static":${vec(c.static, D.force)},"dynamic":${vec(c.dynamic, D.force)},"total":${vec(c.total, D.force)}` +
      `,"closedAgainst":${orNull(c.closedAgainst)}}`;
  }
  return (
    `{"node":${q(f.node)},"mark":${q(f.mark)},"run":${q(f.run)}` +
    (echo ? `,"label":${orNull(f.label)}` : '') +
    `,"kind":${q(f.kind)},"deflection":${roundOrNull(f.deflection, D.angle)}` +
    `,"horizontalDeflection":${roundOrNull(f.horizontalDeflection, D.angle)}` +
    `,"verticalDeflection":${roundOrNull(f.verticalDeflection, D.angle)}` +
    `,"branchAngle":${roundOrNull(f.branchAngle, D.angle)},"chainage":${round(f.chainage, D.length)}` +
    (echo ? `,"position":${vec(f.position, D.length)}` : '') +
    `,"cover":${round(f.cover, D.length)},"groundLevel":${round(f.groundLevel, D.elevation)}` +
    (echo ? `,"pipes":[${pipes}],"soil":${q(f.soil)}` : '') +
    `,"cases":[${cases}],"governingCase":${q(f.governingCase)}` +
    `,"designPressure":${round(f.designPressure, D.pressure)},"thrust":${vec(f.thrust, D.force)}` +
    `,"horizontalThrust":${round(f.horizontalThrust, D.force)},"upwardThrust":${round(f.upwardThrust, D.force)}` +
    `,"downwardThrust":${round(f.downwardThrust, D.force)}` +
    `,"bearingDirection":${roundOrNull(f.bearingDirection, D.angle)},"profile":${orNull(f.profile)}` +
    `,"waterWeight":${round(f.waterWeight, D.force)},"restraint":${restraintText(f.restraint)}` +
    `,"warnings":${list(f.warnings)},"diagnostics":${diagnosticList(f.diagnostics)}` +
    `,"unverified":${list(f.unverified)}` +
    (echo ? '}' : `,"pipes":[${pipes}]}`)
  );
}

/**
 * Writes the schedule as JSON text at the stated precision (no 0.7000000000000001), the same whatever
 * the display units, in pieces of about `chunk` characters: each fitting's text is made from its row
 * and handed on, so no tree of rounded copies and no one string of the whole output is ever held (a
 * 10,000-fitting schedule is some 13 MB of text). The text is what `JSON.stringify` makes of the
 * schedule's fields in the row's order — held so, byte for byte, by a test against that serialiser.
 */
export function writeScheduleJson(s: Schedule, write: (text: string) => void, options: ScheduleJsonWriting = {}): void {
  const { pretty = false, echo = true, chunk = 1 << 16 } = options;
  const indent = pretty ? new JsonIndenter() : null;
  let pending = '';
  const put = (text: string) => {
    pending += text;
    if (pending.length >= chunk) {
      write(indent ? indent.feed(pending) : pending);
      pending = '';
    }
  };
  put(
    `{"project":${q(s.project)},"units":${q(s.units)},"warnings":${list(s.warnings)}` +
      `,"diagnostics":${diagnosticList(s.diagnostics)},"fittings":[`,
  );
  const fittings = s.fittings;
  for (let i = 0; i < fittings.length; i++) put((i ? ',' : '') + fittingText(fittings[i]!, echo));
  put(`],"cautions":${list(s.cautions)}}`);
  write((indent ? indent.feed(pending) : pending) + '\n');
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
