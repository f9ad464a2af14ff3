import type { Vec3 } from '../../src/geometry/vector.js';
import { DIAGNOSTIC_CODES } from '../../src/diagnostics/codes.js';
import type { Diagnostic } from '../../src/diagnostics/diagnostic.js';
import type { Dimension } from '../../src/units/conversions.js';
import { ceilTo, roundTo } from '../../src/units/format.js';
import type { Schedule, ScheduleBlock, ScheduleFitting } from '../../src/schedule/scheduleRows.js';
import { JSON_DECIMALS, type ScheduleJsonOptions } from '../../src/schedule/scheduleJson.js';
import { CAUTIONS } from '../../src/schedule/cautions.js';

// The JSON schedule as it was written before the streaming writer (src/schedule/scheduleJson.ts): an
// object per fitting with every number rounded, then one JSON.stringify of the whole tree. Kept as the
// reference the writer's text is held to, byte for byte (test/scheduleJsonWriter.test.ts).

const r = (v: number, kind: keyof typeof JSON_DECIMALS) => roundTo(v, JSON_DECIMALS[kind]);
const up = (v: number, kind: keyof typeof JSON_DECIMALS) => ceilTo(v, JSON_DECIMALS[kind]);
const rn = (v: number | null, kind: keyof typeof JSON_DECIMALS) => (v === null ? null : r(v, kind));
const vec = (v: Vec3, kind: keyof typeof JSON_DECIMALS): Vec3 => [r(v[0], kind), r(v[1], kind), r(v[2], kind)];

function block(b: ScheduleBlock | null): ScheduleBlock | null {
  return (
    b && {
      bearingArea: r(b.bearingArea, 'area'),
      faceWidth: up(b.faceWidth, 'length'),
      faceHeight: up(b.faceHeight, 'length'),
      concreteVolume: up(b.concreteVolume, 'volume'),
      depth: up(b.depth, 'length'),
      direction: vec(b.direction, 'unit'),
      passiveResistance: r(b.passiveResistance, 'force'),
      passiveRatio: r(b.passiveRatio, 'ratio'),
      shapeFactor: r(b.shapeFactor, 'ratio'),
      governs: b.governs,
      thrust: r(b.thrust, 'force'),
      upwardThrust: r(b.upwardThrust, 'force'),
    }
  );
}

/** A diagnostic as JSON: each value with its kind of quantity, SI, at the stated precision. */
function diagnosticJson(d: Diagnostic) {
  const kinds = DIAGNOSTIC_CODES[d.code].values as Record<string, Dimension>;
  const values: Record<string, { value: number; kind: Dimension }> = {};
  for (const [name, v] of Object.entries(d.values)) {
    const kind = kinds[name] ?? 'ratio';
    values[name] = { value: r(v, kind), kind };
  }
  return { code: d.code, severity: d.severity, subject: d.subject, values };
}

/** A fitting at the stated precision; without `echo`, what the project file already says is left out. */
function fitting(f: ScheduleFitting, echo: boolean) {
  const x = f.restraint;
  const row = {
    ...f,
    deflection: rn(f.deflection, 'angle'),
    horizontalDeflection: rn(f.horizontalDeflection, 'angle'),
    verticalDeflection: rn(f.verticalDeflection, 'angle'),
    branchAngle: rn(f.branchAngle, 'angle'),
    chainage: r(f.chainage, 'length'),
    position: vec(f.position, 'length'),
    cover: r(f.cover, 'length'),
    groundLevel: r(f.groundLevel, 'elevation'),
    pipes: f.pipes.map((p) => ({
      ...p,
      outsideDiameter: r(p.outsideDiameter, 'diameter'),
      insideDiameter: r(p.insideDiameter, 'diameter'),
    })),
    cases: f.cases.map((c) => ({
      ...c,
      pressure: r(c.pressure, 'pressure'),
      static: vec(c.static, 'force'),
      dynamic: vec(c.dynamic, 'force'),
      total: vec(c.total, 'force'),
    })),
    designPressure: r(f.designPressure, 'pressure'),
    thrust: vec(f.thrust, 'force'),
    horizontalThrust: r(f.horizontalThrust, 'force'),
    upwardThrust: r(f.upwardThrust, 'force'),
    downwardThrust: r(f.downwardThrust, 'force'),
    bearingDirection: rn(f.bearingDirection, 'angle'),
    waterWeight: r(f.waterWeight, 'force'),
    restraint: {
      block: block(x.block),
      reverseBlock: block(x.reverseBlock),
      anchor: x.anchor && {
        concreteVolume: up(x.anchor.concreteVolume, 'volume'),
        length: up(x.anchor.length, 'length'),
        width: up(x.anchor.width, 'length'),
        height: up(x.anchor.height, 'length'),
        side: up(x.anchor.side, 'length'),
        submerged: x.anchor.submerged,
        upwardThrust: r(x.anchor.upwardThrust, 'force'),
        horizontalThrust: r(x.anchor.horizontalThrust, 'force'),
      },
      trenchBottom: x.trenchBottom && {
        bearingArea: r(x.trenchBottom.bearingArea, 'area'),
        width: up(x.trenchBottom.width, 'length'),
        length: up(x.trenchBottom.length, 'length'),
      },
      restrainedLength: x.restrainedLength === null ? null : up(x.restrainedLength, 'length'),
      restrainedLegs: x.restrainedLegs.map((l) => ({ ...l, length: up(l.length, 'length') })),
    },
    diagnostics: f.diagnostics.map(diagnosticJson),
  };
  if (echo) return row;
  const { position: _position, label: _label, soil: _soil, pipes, ...rest } = row;
  return { ...rest, pipes: pipes.map((p) => ({ id: p.id, toward: p.toward })) };
}

/**
 * The schedule as JSON text at the stated precision (no 0.7000000000000001), the same whatever the
 * display units: what the app exports and, without the echoed input, what `schedule --format json` prints.
 */
export function scheduleJsonOracle(s: Schedule, options: boolean | ScheduleJsonOptions = {}): string {
  const { pretty = false, echo = true } = typeof options === 'boolean' ? { pretty: options } : options;
  const out = {
    project: s.project,
    units: s.units,
    warnings: s.warnings,
    diagnostics: s.diagnostics.map(diagnosticJson),
    fittings: s.fittings.map((f) => fitting(f, echo)),
    cautions: CAUTIONS,
  };
  return JSON.stringify(out, null, pretty ? 2 : undefined) + '\n';
}
