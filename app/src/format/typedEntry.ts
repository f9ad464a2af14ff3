import { FOOT, INCH, quantityText, type UnitSystem } from '@mainbrace/solver';
import { show } from './quantity.js';
import { parseTyped } from './typedQuantity.js';

/**
 * What the user may type while drawing to place the next node exactly:
 *
 *   12.5            a length along the pointer's direction (display units: m, or ft in a US project)
 *   12.5 L30        a length turning 30° left of the previous leg (R30: right)
 *   12.5 @45        a length at a bearing, degrees clockwise from north (also N45E, S30W quadrant bearings)
 *   E 120 N 340     a node at plan coordinates (easting, northing)
 *
 * Lengths may carry a unit: 12.5 m, 41 ft, 41' 6", 41 ft 6 in, 18 in. Angles are decimal degrees or
 * degrees and minutes (22°30'). Everything is returned in SI: metres and degrees.
 */
export type TypedDirection =
  | { kind: 'pointer' }
  /** degrees, positive to the left (counterclockwise on the plan) */
  | { kind: 'deflection'; degrees: number }
  /** degrees clockwise from north, 0 ≤ b < 360 */
  | { kind: 'bearing'; degrees: number };

export type TypedEntry =
  { kind: 'step'; length: number; direction: TypedDirection } | { kind: 'point'; x: number; y: number };

export type TypedResult = { ok: true; entry: TypedEntry } | { ok: false; message: string };

const NUM = String.raw`[-+]?(?:\d[\d,]*\.?\d*|\.\d+)`;
const ANGLE = String.raw`(\d+(?:\.\d+)?)\s*(?:°\s*(?:(\d+(?:\.\d+)?)\s*['′]?)?)?`;
const DEFLECTION = new RegExp(String.raw`^(.*?)\s*([LR])\s*${ANGLE}$`, 'i');
const BEARING = new RegExp(String.raw`^(.*?)\s*@\s*${ANGLE}$`, 'i');
const QUADRANT = new RegExp(String.raw`^(.*?)\s*@?\s*([NS])\s*${ANGLE}\s*([EW])$`, 'i');
const METRES = new RegExp(String.raw`^(${NUM})\s*m$`, 'i');
const FEET = new RegExp(String.raw`^(${NUM})\s*(?:'|′|ft)\s*(?:(\d+(?:\.\d+)?)\s*(?:"|″|in)?)?$`, 'i');
const INCHES = new RegExp(String.raw`^(${NUM})\s*(?:"|″|in)$`, 'i');
const EAST_NORTH = /^E\s*(.+?)\s*[,;]?\s*N\s*(.+)$/i;
const NORTH_EAST = /^N\s*(.+?)\s*[,;]?\s*E\s*(.+)$/i;

const degrees = (d: string, m: string | undefined) => Number(d) + (m === undefined ? 0 : Number(m) / 60);
/** A bare number as parseTyped reads it (thousands commas, a decimal comma where unambiguous). */
const numberOf = (s: string): number => {
  const r = parseTyped(s, 'length', 'si');
  return r.ok ? r.si : NaN;
};

/** A length with an optional unit (m, ft, ', in, "), or bare in display units; metres. */
export function parseLength(
  text: string,
  units: UnitSystem,
): { ok: true; metres: number } | { ok: false; message: string } {
  const t = text.trim();
  const m = METRES.exec(t);
  const f = FEET.exec(t);
  const i = INCHES.exec(t);
  let metres = NaN;
  if (m) metres = numberOf(m[1]!);
  else if (f) {
    const feet = numberOf(f[1]!);
    metres = (feet + (Math.sign(feet || 1) * Number(f[2] ?? 0)) / 12) * FOOT;
  } else if (i) metres = numberOf(i[1]!) * INCH;
  else {
    const r = parseTyped(t, 'length', units);
    if (r.ok) metres = r.si;
  }
  if (Number.isFinite(metres)) return { ok: true, metres };
  return {
    ok: false,
    message: `“${t}” is not a length: expected a number in ${units === 'us' ? 'ft (or 41\' 6")' : 'm'}, or with its unit (12.5 m, 41 ft)`,
  };
}

const HELP =
  'type a length (12.5), a length and turn (12.5 L30, 12.5 R15), a bearing (12.5 @45, 12.5 N45E) or coordinates (E 120 N 340)';

/** Parses one typed entry; never throws. The message says what was expected. */
export function parseEntry(text: string, units: UnitSystem): TypedResult {
  const t = text.trim().replace(/\s+/g, ' ');
  if (t === '') return { ok: false, message: HELP };
  const en = EAST_NORTH.exec(t) ?? NORTH_EAST.exec(t);
  if (en && !QUADRANT.test(t)) {
    const [first, second] = [en[1]!, en[2]!];
    const east = parseLength(EAST_NORTH.test(t) ? first : second, units);
    const north = parseLength(EAST_NORTH.test(t) ? second : first, units);
    if (!east.ok) return { ok: false, message: `easting: ${east.message}` };
    if (!north.ok) return { ok: false, message: `northing: ${north.message}` };
    return { ok: true, entry: { kind: 'point', x: east.metres, y: north.metres } };
  }
  let rest = t;
  let direction: TypedDirection = { kind: 'pointer' };
  const q = QUADRANT.exec(t);
  const b = q ? null : BEARING.exec(t);
  const d = q || b ? null : DEFLECTION.exec(t);
  if (q) {
    const angle = degrees(q[3]!, q[4]);
    if (angle > 90) return { ok: false, message: `a quadrant bearing is 0° to 90° from north or south (${t})` };
    const ns = q[2]!.toUpperCase();
    const ew = q[5]!.toUpperCase();
    const bearing = ns === 'N' ? (ew === 'E' ? angle : 360 - angle) : ew === 'E' ? 180 - angle : 180 + angle;
    direction = { kind: 'bearing', degrees: bearing % 360 };
    rest = q[1]!;
  } else if (b) {
    const angle = degrees(b[2]!, b[3]);
    if (angle >= 360) return { ok: false, message: `a bearing is 0° up to 360° clockwise from north (${t})` };
    direction = { kind: 'bearing', degrees: angle };
    rest = b[1]!;
  } else if (d) {
    const angle = degrees(d[3]!, d[4]);
    if (angle > 180) return { ok: false, message: `a turn is 0° to 180° left (L) or right (R) (${t})` };
    direction = { kind: 'deflection', degrees: d[2]!.toUpperCase() === 'L' ? angle : -angle };
    rest = d[1]!;
  }
  if (rest.trim() === '') return { ok: false, message: `give the length before the direction (12.5 ${t})` };
  const length = parseLength(rest, units);
  if (!length.ok) return { ok: false, message: `${length.message}; or ${HELP}` };
  if (!(length.metres > 0)) return { ok: false, message: 'the length must be more than 0' };
  return { ok: true, entry: { kind: 'step', length: length.metres, direction } };
}

const angleText = (deg: number) => `${Math.round(deg * 100) / 100}°`;

/** The entry in words, for the line under the entry box before Enter. */
export function describeEntry(entry: TypedEntry, units: UnitSystem): string {
  if (entry.kind === 'point')
    // as the schedule's coordinate columns give them (columnUnits.ts: to 0.01 m or 0.01 ft)
    return `node at E ${quantityText(entry.x, 'coordinate', units)}, N ${quantityText(entry.y, 'coordinate', units)}`;
  const length = show(entry.length, 'length', units, 5);
  switch (entry.direction.kind) {
    case 'pointer':
      return `${length} toward the pointer`;
    case 'deflection':
      return `${length}, turning ${angleText(Math.abs(entry.direction.degrees))} ${entry.direction.degrees >= 0 ? 'left' : 'right'}`;
    case 'bearing':
      return `${length} at bearing ${angleText(entry.direction.degrees)}`;
  }
}
