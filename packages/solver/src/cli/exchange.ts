import { misfit, parseArgs, type Accepts } from './args.js';
import { USAGE } from './usage.js';
import { maxBytesOption, type CliIo } from './run.js';
import { escapeControls, terminalSafe } from './terminalText.js';
import { parseProjectText } from '../model/parseProject.js';
import { problemText } from '../model/problems.js';

class UsageError extends Error {}

/** The options and arguments of import and export (usage.ts). */
const ACCEPTS: Record<'import' | 'export', Accepts> = {
  import: {
    options: [
      'format',
      'easting',
      'northing',
      'level',
      'run',
      'unit',
      'levels',
      'cover',
      'tolerance',
      'series',
      'size',
      'proj4',
      'name',
      'pretty',
      'verbose',
      'max-size',
    ],
    positional: 1,
    names: 'FILE',
  },
  export: { options: ['format', 'max-size'], positional: 1, names: 'FILE' },
};

/** Reads a file as UTF-8 text, or says why it cannot (the same limits as the other commands). */
function readText(io: CliIo, path: string | undefined, maxBytes: number): string {
  if (!path) throw new UsageError('missing FILE: give the path of the file');
  let bytes: Uint8Array;
  try {
    bytes = io.readFile(path, maxBytes);
  } catch (e) {
    const { code } = e as { code?: string };
    const why =
      code === 'ENOENT'
        ? 'no such file'
        : code === 'ETOOLARGE'
          ? `larger than ${(maxBytes / 1048576).toFixed(1)} MB; raise the limit with --max-size MB`
          : code === 'EISDIR'
            ? 'it is a folder'
            : (e as Error).message;
    throw new InputError(`${escapeControls(path)}: cannot read the file (${why})`);
  }
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes).replace(/^\uFEFF/, '');
  } catch {
    throw new InputError(`${escapeControls(path)}: not UTF-8 text`);
  }
}

class InputError extends Error {}

/** A number option in a length unit, converted to metres; `fallback` when absent. */
function lengthOption(options: Map<string, string>, name: string, scale: number): number | undefined {
  const v = options.get(name);
  if (v === undefined) return undefined;
  const n = Number(v);
  if (v.trim() === '' || !Number.isFinite(n) || n < 0)
    throw new UsageError(`--${name}: expected a length of 0 or more, got "${escapeControls(v)}"`);
  return n * scale;
}

function oneOf<T extends string>(options: Map<string, string>, name: string, allowed: readonly T[]): T | undefined {
  const v = options.get(name);
  if (v === undefined) return undefined;
  if (!(allowed as readonly string[]).includes(v))
    throw new UsageError(`--${name}: expected ${allowed.join(', ')}, got "${escapeControls(v)}"`);
  return v as T;
}

/** The file's stem as a project name: "Birch Street.geojson" → "Birch Street". */
const stem = (path: string) => path.replace(/^.*[\\/]/, '').replace(/\.[^.]*$/, '');

/**
 * `mainbrace import FILE [options]` (a project file on stdout) and `mainbrace export FILE` (GeoJSON on
 * stdout). The CSV and projection libraries are loaded only here, so the other commands start as fast.
 * Exit status as the other commands: 0 done, 2 bad input, 1 a fault of ours.
 */
export async function runExchange(argv: readonly string[], rawIo: CliIo): Promise<number> {
  // The same last guard as runCli: run and feature names reach stdout inside the JSON, where
  // JSON.stringify leaves C1 controls and bidi overrides raw.
  const io: CliIo = {
    ...rawIo,
    out: (text) => rawIo.out(terminalSafe(text)),
    err: (text) => rawIo.err(terminalSafe(text)),
  };
  try {
    const args = parseArgs(argv);
    const wrong = misfit(args.command!, ACCEPTS[args.command === 'export' ? 'export' : 'import'], args);
    if (wrong) throw new UsageError(wrong);
    const ex = await import('../exchange/index.js');
    const path = args.positional[0];
    const o = args.options;
    const pretty = io.interactive === true || o.has('pretty');
    let maxBytes: number;
    try {
      maxBytes = maxBytesOption(o.get('max-size'));
    } catch (e) {
      throw new UsageError((e as Error).message);
    }
    if (args.command === 'export') {
      const format = oneOf(o, 'format', ['geojson'] as const) ?? 'geojson';
      const parsed = parseProjectText(readText(io, path, maxBytes));
      if (!parsed.ok) {
        io.err(parsed.problems.map((p) => escapeControls(problemText(p))).join('\n') + '\n');
        return 2;
      }
      const e = format === 'geojson' ? ex.designGeoJson(parsed.project) : null;
      if (!e || !e.ok) {
        io.err(`${escapeControls(path!)}: ${e ? e.message : 'unknown format'}\n`);
        return 2;
      }
      io.out(e.text);
      return 0;
    }
    const text = readText(io, path, maxBytes);
    const byName = /\.csv$|\.txt$/i.test(path!) ? 'csv' : 'geojson';
    const format = oneOf(o, 'format', ['geojson', 'csv'] as const) ?? byName;
    const unit = oneOf(o, 'unit', ['m', 'ft', 'us-ft'] as const) ?? 'm';
    const scale = format === 'csv' ? ex.SURVEY_UNITS[unit] : 1;
    const seriesOpt = o.get('series');
    const sizeOpt = o.get('size');
    let pipe;
    if (seriesOpt !== undefined || sizeOpt !== undefined) {
      try {
        pipe = ex.defaultPipe(
          seriesOpt ?? (unit === 'm' ? ex.DEFAULT_SERIES : 'di-awwa-pc350'),
          sizeOpt ?? (unit === 'm' ? ex.DEFAULT_NOMINAL : '8'),
        );
      } catch (e) {
        throw new UsageError(`--series/--size: ${(e as Error).message}`);
      }
    }
    const options = {
      ...(lengthOption(o, 'tolerance', scale) !== undefined ? { tolerance: lengthOption(o, 'tolerance', scale)! } : {}),
      ...(lengthOption(o, 'cover', scale) !== undefined ? { cover: lengthOption(o, 'cover', scale)! } : {}),
      ...(oneOf(o, 'levels', ['ground', 'pipe'] as const) ? { levels: oneOf(o, 'levels', ['ground', 'pipe'])! } : {}),
      ...(pipe ? { pipe } : {}),
      name: o.get('name') ?? stem(path!),
    };
    let result;
    if (format === 'csv') {
      const table = ex.readCsvTable(text);
      if (!table.ok) result = table;
      else {
        const guess = ex.guessMapping(table.table.header);
        const easting = o.get('easting') ?? guess.easting;
        const northing = o.get('northing') ?? guess.northing;
        if (easting === undefined || northing === undefined)
          throw new UsageError(
            `give --easting COLUMN and --northing COLUMN: the header has ${table.table.header.map((h) => `"${escapeControls(h)}"`).join(', ')}`,
          );
        const level = o.get('level') ?? guess.level;
        const run = o.get('run');
        const proj4 = o.get('proj4');
        result = ex.importCsv(
          text,
          { easting, northing, ...(level ? { level } : {}), ...(run ? { run } : {}) },
          unit,
          options,
          undefined,
          proj4 ? { proj4 } : undefined,
        );
      }
    } else result = ex.importGeoJson(text, options);
    const lines = result.notes.filter((n) => n.level !== 'note' || o.has('verbose')).map((n) => ex.noteText(n));
    if (lines.length) io.err(lines.map(escapeControls).join('\n') + '\n');
    if (!result.ok) return 2;
    io.out(JSON.stringify(result.project, null, pretty ? 2 : undefined) + '\n');
    return 0;
  } catch (e) {
    if (e instanceof UsageError) {
      io.err(`${e.message}\n\n${USAGE}`);
      return 2;
    }
    if (e instanceof InputError) {
      io.err(`${e.message}\n`);
      return 2;
    }
    io.err(`internal error: ${(e as Error).message}\n`);
    return 1;
  }
}
