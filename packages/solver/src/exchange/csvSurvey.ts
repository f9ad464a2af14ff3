import Papa from 'papaparse';
import type { PipeChoice } from './pipeChoice.js';
import type { RouteLine, RoutePoint } from './routeNetwork.js';
import type { ImportNote } from './importNotes.js';
import { LIMITS } from '../model/limits.js';

/** Length units a survey may be in, with their size in metres. */
export const SURVEY_UNITS = {
  m: 1,
  /** the international foot, exactly 0.3048 m (1959 agreement) */
  ft: 0.3048,
  /** the US survey foot, exactly 1200/3937 m (as defined before 2023) */
  'us-ft': 1200 / 3937,
} as const;
export type SurveyUnit = keyof typeof SURVEY_UNITS;

/** Which header column holds what: names as the file writes them. */
export interface ColumnMapping {
  easting: string;
  northing: string;
  /** the level column, or absent for a survey without levels */
  level?: string;
  /** a column naming the run each point belongs to, or absent for one run in row order */
  run?: string;
}

export interface SurveyTable {
  header: string[];
  rows: string[][];
  /** the columns are split by semicolons: a comma in a number is its decimal mark */
  decimalComma?: boolean;
}

/** The header and rows of a CSV text, through papaparse (delimiter guessed: comma, semicolon, tab). */
export function readCsvTable(text: string): { ok: true; table: SurveyTable } | { ok: false; notes: ImportNote[] } {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: 'greedy' });
  const notes: ImportNote[] = parsed.errors
    .filter((e) => e.code !== 'UndetectableDelimiter')
    .map((e) => ({
      level: 'error' as const,
      where: e.row !== undefined ? `row ${e.row + 2}` : '',
      message: `not read as CSV: ${e.message}`,
    }));
  if (notes.length) return { ok: false, notes };
  const [header, ...rows] = parsed.data;
  if (!header || header.length < 2)
    return {
      ok: false,
      notes: [{ level: 'error', where: 'row 1', message: 'expected a header row naming at least two columns' }],
    };
  // Semicolons are how spreadsheets split a CSV where the comma is the decimal mark; a tab file copied
  // from an English-language sheet may hold thousands separators (512,345) instead.
  const decimalComma = parsed.meta.delimiter === ';';
  return { ok: true, table: { header: header.map((h) => h.trim()), rows, ...(decimalComma ? { decimalComma } : {}) } };
}

/** A mapping guessed from usual header names, for the dialog to start from and the CLI to fall back on. */
export function guessMapping(header: readonly string[]): Partial<ColumnMapping> {
  const find = (re: RegExp) => header.find((h) => re.test(h.trim()));
  const out: Partial<ColumnMapping> = {};
  const e = find(/^(e|x|east|easting|eastings|east_?m|y_?east)$/i) ?? find(/east/i);
  const n = find(/^(n|y|north|northing|northings|north_?m)$/i) ?? find(/north/i);
  const l =
    find(/^(z|h|rl|level|elev|elevation|height|gl|ground|ground_?level|il|invert)$/i) ??
    find(/level|elev|height|\brl\b|ground|invert/i);
  const r = find(/^(run|line|branch|route|string)$/i);
  if (e) out.easting = e;
  if (n) out.northing = n;
  if (l) out.level = l;
  if (r) out.run = r;
  return out;
}

/**
 * Survey points in row order as runs: one run, or one per value of the run column (in the order each
 * first appears). Every number is checked; a bad one is named by row and column.
 */
export function surveyLines(
  table: SurveyTable,
  mapping: ColumnMapping,
  unit: SurveyUnit,
  pipe: PipeChoice,
): { ok: true; lines: RouteLine[]; notes: ImportNote[] } | { ok: false; notes: ImportNote[] } {
  const notes: ImportNote[] = [];
  const col = (role: string, name: string | undefined): number | null => {
    if (name === undefined) return null;
    const i = table.header.indexOf(name);
    if (i < 0)
      notes.push({
        level: 'error',
        where: 'row 1',
        message: `no column "${name}" for the ${role} (the header has ${table.header.map((h) => `"${h}"`).join(', ')})`,
      });
    return i;
  };
  const ie = col('easting', mapping.easting);
  const inn = col('northing', mapping.northing);
  const il = col('level', mapping.level);
  const ir = col('run', mapping.run);
  if (notes.length) return { ok: false, notes };
  const scale = SURVEY_UNITS[unit];
  const runs = new Map<string, RoutePoint[]>();
  table.rows.forEach((row, r) => {
    const rowNo = r + 2;
    const num = (i: number | null, optional: boolean, limit: 'coordinate' | 'elevation'): number | null => {
      if (i === null) return null;
      const raw = (row[i] ?? '').trim();
      if (raw === '' && optional) return null;
      // 1000,5 in a file split by semicolons, as spreadsheets write it where the comma is the decimal mark
      const v = Number(table.decimalComma && /^[-+]?\d*,\d+$/.test(raw) ? raw.replace(',', '.') : raw);
      if (raw === '' || !Number.isFinite(v)) {
        notes.push({
          level: 'error',
          where: `row ${rowNo}, column "${table.header[i]}"`,
          message:
            raw === ''
              ? 'is empty; expected a number'
              : `expected a number, got "${raw.slice(0, 40)}"${
                  /\d,\d/.test(raw) && !table.decimalComma
                    ? ' (a decimal comma, or a thousands separator: write decimal points and no separators, or save the file split by semicolons with decimal commas)'
                    : ''
                }`,
        });
        return null;
      }
      // The project's own limits (limits.md), checked here so that the message names the row and
      // column, and so that no point lies so far off that joining the network cannot finish.
      const { hard, name } = LIMITS[limit];
      if (!(v * scale >= hard.min && v * scale <= hard.max)) {
        notes.push({
          level: 'error',
          where: `row ${rowNo}, column "${table.header[i]}"`,
          message: `${v * scale} m is outside the range of a ${name} (${hard.min} to ${hard.max} m): check the unit and the column`,
        });
        return null;
      }
      return v * scale;
    };
    const x = num(ie, false, 'coordinate');
    const y = num(inn, false, 'coordinate');
    const level = num(il, true, 'elevation');
    if (x === null || y === null) return;
    const run = ir === null ? '' : (row[ir] ?? '').trim();
    const where = `row ${rowNo} (${(x / scale).toString()}, ${(y / scale).toString()})`;
    // pushed, not copied: a copy per row made a long survey quadratic
    const list = runs.get(run);
    if (list) list.push({ x, y, level, where });
    else runs.set(run, [{ x, y, level, where }]);
  });
  if (notes.length) return { ok: false, notes };
  if (il !== null) {
    const missing = [...runs.values()].flat().find((p) => p.level === null);
    if (missing)
      notes.push({
        level: 'warning',
        where: missing.where,
        message: `has no level in column "${mapping.level}": its level is taken from the points around it where it lies on a run, else the default`,
      });
  }
  const lines: RouteLine[] = [...runs].map(([run, points]) => ({
    name: ir === null ? 'the survey' : `run "${run}"`,
    points: fillLevels(points),
    pipe,
  }));
  return { ok: true, lines, notes };
}

/** A point without a level between two with one takes the straight line between them (by distance). */
function fillLevels(points: RoutePoint[]): RoutePoint[] {
  const out = points.map((p) => ({ ...p }));
  const known = out.map((p, i) => (p.level !== null ? i : -1)).filter((i) => i >= 0);
  for (let k = 0; k + 1 < known.length; k++) {
    const a = known[k]!;
    const b = known[k + 1]!;
    if (b - a < 2) continue;
    let total = 0;
    const d: number[] = [0];
    for (let i = a + 1; i <= b; i++)
      d.push((total += Math.hypot(out[i]!.x - out[i - 1]!.x, out[i]!.y - out[i - 1]!.y)));
    for (let i = a + 1; i < b; i++) {
      const t = total > 0 ? d[i - a]! / total : 0;
      out[i]!.level = out[a]!.level! + t * (out[b]!.level! - out[a]!.level!);
    }
  }
  return out;
}
