import { misfit, parseArgs, type Accepts, type Args } from './args.js';
import { USAGE } from './usage.js';
import { explainText } from './explainText.js';
import { problemText } from '../model/problems.js';
import { quickParse } from '../model/quickParse.js';
import type { Project } from '../model/projectSchema.js';
import { analyse } from '../analysis/analyse.js';
import { legsByNode } from '../network/legs.js';
import { fittingGeometry, needsRestraint } from '../network/fittingKind.js';
import { scheduleOf } from '../schedule/scheduleOf.js';
import { writeScheduleJson, writeScheduleJsonBytes } from '../schedule/scheduleJson.js';
import { scheduleView } from '../schedule/scheduleView.js';
import { WORDING } from '../diagnostics/codeMeanings.js';
import { scheduleCsv } from '../schedule/scheduleCsv.js';
import { CAUTIONS } from '../schedule/cautions.js';
import { scheduleTable } from '../schedule/scheduleTable.js';
import { takeOff, takeOffRows, type TakeOffRow } from '../schedule/quantities.js';
import { takeOffCsv, takeOffTable } from '../schedule/quantitiesText.js';
import { positionColumns } from '../schedule/stations.js';
import type { UnitSystem } from '../units/conversions.js';
import { DEFAULT_MAX_BYTES } from './readLimited.js';
import { escapeControls, terminalActsOn, terminalSafe } from './terminalText.js';
import { escapedView } from './escapedView.js';

/** What the command line needs from the outside world, so that it runs in tests without a process. */
export interface CliIo {
  /** true when the output goes to a terminal: JSON is then indented for reading */
  interactive?: boolean;
  /**
   * the file's bytes, at most `maxBytes` of them; throws an error with a `code` such as ENOENT, or
   * ETOOLARGE when the file is longer
   */
  readFile: (path: string, maxBytes: number) => Uint8Array;
  out: (text: string) => void;
  /**
   * bytes of UTF-8 to the same output, when the process can take them: the compact JSON schedule is
   * written as bytes (guarded as it is made), without strings in between
   */
  outBytes?: (bytes: Uint8Array) => void;
  err: (text: string) => void;
}

class UsageError extends Error {}

/** A take-off line with every text escaped (sizes and marks come from the file). */
const escapeRow = (r: TakeOffRow): TakeOffRow => ({
  ...r,
  item: escapeControls(r.item),
  size: escapeControls(r.size),
  marks: escapeControls(r.marks),
});

/** `--max-size 50` (megabytes, as the app counts them) → bytes; the app's 20 MB when not given. */
export function maxBytesOption(value: string | undefined): number {
  if (value === undefined) return DEFAULT_MAX_BYTES;
  const m = /^\s*(\d+(?:\.\d+)?)\s*(?:MB)?\s*$/i.exec(value);
  const mb = m ? Number(m[1]) : NaN;
  if (!(mb > 0))
    throw new UsageError(`--max-size: expected a size in megabytes such as 50, got "${escapeControls(value)}"`);
  return Math.floor(mb * 1024 * 1024);
}

const megabytes = (bytes: number) => `${(bytes / 1048576).toFixed(1)} MB`;

/** The file's text: UTF-8, with or without a byte-order mark (the app reads both). */
function decode(bytes: Uint8Array): string | null {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return null;
  }
}

async function load(io: CliIo, path: string | undefined, maxBytes: number): Promise<Project | string[]> {
  if (!path) throw new UsageError('missing FILE: give the path of a project file');
  const name = escapeControls(path);
  let bytes: Uint8Array;
  try {
    bytes = io.readFile(path, maxBytes);
  } catch (e) {
    const { code, size } = e as { code?: string; size?: number | null };
    if (code === 'ETOOLARGE') {
      const what = `the file is ${typeof size === 'number' ? megabytes(size) : `larger than ${megabytes(maxBytes)}`}`;
      return [
        `${name}: ${what}; project files over ${megabytes(maxBytes)} are refused (raise the limit with --max-size MB)`,
      ];
    }
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : (e as Error).message;
    return [`${name}: cannot read the file (${why})`];
  }
  const text = decode(bytes);
  if (text === null) return [`${name}: not UTF-8 text; save the project file as UTF-8`];
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    data = undefined;
  }
  // A valid file is checked by hand; the schema (and zod with it) loads only to word what is wrong.
  const quick = data === undefined ? null : quickParse(data);
  if (quick) return quick;
  const { parseProjectText } = await import('../model/parseProject.js');
  const result = parseProjectText(text);
  return result.ok ? result.project : result.problems.map((p) => escapeControls(problemText(p)));
}

/** The options and the number of arguments each command takes (usage.ts). */
const ACCEPTS: Record<string, Accepts> = {
  schedule: { options: ['format', 'units', 'pretty', 'full', 'max-size'], positional: 1, names: 'FILE' },
  quantities: { options: ['format', 'units', 'pretty', 'max-size'], positional: 1, names: 'FILE' },
  explain: { options: ['units', 'max-size'], positional: 2, names: 'FILE and MARK' },
  validate: { options: ['max-size'], positional: 1, names: 'FILE' },
  schema: { options: [], positional: 0, names: '' },
};

function checkArguments(command: string, args: Args): void {
  const wrong = misfit(command, ACCEPTS[command]!, args);
  if (wrong) throw new UsageError(wrong);
}

function unitsOption(value: string | undefined, project: Project): UnitSystem {
  if (value === undefined) return project.units;
  if (value === 'us' || value === 'si') return value;
  throw new UsageError(`--units: expected "us" or "si", got "${escapeControls(value)}"`);
}

/**
 * Runs one command line; resolves to the exit status (0 done, 2 bad input, 1 a fault of ours). Never
 * throws. Nothing from the file reaches the terminal as a control character.
 */
export async function runCli(argv: readonly string[], rawIo: CliIo): Promise<number> {
  const io: CliIo = {
    ...rawIo,
    out: (text) => rawIo.out(terminalSafe(text)),
    err: (text) => rawIo.err(terminalSafe(text)),
  };
  try {
    const args = parseArgs(argv);
    if (args.options.has('help') || args.command === undefined || args.command === 'help') {
      io.out(USAGE);
      return args.command === undefined && !args.options.has('help') ? 2 : 0;
    }
    if (args.command === 'schema') {
      checkArguments('schema', args);
      const { projectJsonSchema } = await import('../model/jsonSchema.js');
      io.out(JSON.stringify(projectJsonSchema(), null, 2) + '\n');
      return 0;
    }
    if (!['schedule', 'quantities', 'validate', 'explain'].includes(args.command)) {
      throw new UsageError(
        `unknown command "${escapeControls(args.command)}": expected schedule, quantities, explain, validate, schema, import or export`,
      );
    }
    checkArguments(args.command, args);
    const loaded = await load(io, args.positional[0], maxBytesOption(args.options.get('max-size')));
    if (Array.isArray(loaded)) {
      io.err(loaded.join('\n') + '\n');
      return 2;
    }
    const project = loaded;
    const file = escapeControls(args.positional[0]!);
    if (args.command === 'validate') {
      // Naming the fittings is enough here; sizing them is the schedule's work.
      const legs = legsByNode(project);
      const fittings = project.nodes.filter((n) =>
        needsRestraint(fittingGeometry(n, legs.get(n.id) ?? []).kind),
      ).length;
      io.out(
        `${file}: valid — ${project.nodes.length} nodes, ${project.pipes.length} pipes, ${fittings} fittings to restrain\n`,
      );
      return 0;
    }
    const analysis = analyse(project);
    const units = unitsOption(args.options.get('units'), project);
    if (args.command === 'explain') {
      const id = args.positional[1];
      if (!id) throw new UsageError('missing MARK: give the fitting’s mark (A4) or its node id');
      // A mark as typed, or in the other case (a4 for A4): marks are letters and digits only.
      const byMark =
        analysis.fittings.find((f) => f.mark === id) ??
        analysis.fittings.find((f) => f.mark.toUpperCase() === id.toUpperCase());
      const byNode = analysis.byNode.get(id);
      if (byMark && byNode && byMark !== byNode) {
        // Node ids are free text, so "A2" may be one fitting's mark and another's node id.
        io.err(
          `"${escapeControls(id)}" is both the mark of one fitting (node "${escapeControls(byMark.node.id)}") and the id of another node (marked ${escapeControls(byNode.mark)}): rename that node so that no node id reads as a mark\n`,
        );
        return 2;
      }
      const fitting = byMark ?? byNode;
      if (!fitting) {
        const known = project.nodes.some((n) => n.id === id) || [...analysis.marks.values()].includes(id);
        io.err(
          known
            ? `"${escapeControls(id)}" needs no restraint (a straight joint, a tie-in or a free node)\n`
            : `no fitting marked "${escapeControls(id)}" and no node "${escapeControls(id)}" in ${file}\n`,
        );
        return 2;
      }
      io.out(explainText(analysis, fitting, units));
      return 0;
    }
    const format = args.options.get('format') ?? 'table';
    if (args.command === 'quantities') {
      const t = takeOff(scheduleOf(analysis).fittings, project, units);
      if (format === 'json')
        io.out(
          JSON.stringify(
            {
              project: project.name,
              // SI figures of what the sheet in `roundedAs` units lists, each piece rounded up there
              units: { values: 'SI: m, m³', roundedAs: units },
              ...t,
              cautions: CAUTIONS,
            },
            // 12 significant digits: what a figure converted back from yd³ or ft carries beyond it is noise
            (_, v: unknown) => (typeof v === 'number' ? Number(v.toPrecision(12)) : v),
            io.interactive || args.options.has('pretty') ? 2 : undefined,
          ) + '\n',
        );
      else if (format === 'csv') io.out(takeOffCsv(takeOffRows(t, units).map(escapeRow)));
      else if (format === 'table')
        io.out(takeOffTable(takeOffRows(t, units).map(escapeRow), escapeControls(project.name), t.waste));
      else throw new UsageError(`--format: expected json, csv or table, got "${escapeControls(format)}"`);
      return 0;
    }
    // Indented for a person at a terminal or with --pretty; compact into pipes and files.
    const pretty = io.interactive === true || args.options.has('pretty');
    // What the file already says (positions, labels, soils, pipe sizes) is left out unless --full.
    const full = args.options.has('full');
    if (format === 'json' && !pretty && rawIo.outBytes)
      // Bytes made in pieces (some 13 MB at 10,000 fittings), guarded character by character as they are
      // made: the same bytes as guarding the whole text, since only a string's characters can need it.
      writeScheduleJsonBytes(scheduleOf(analysis), rawIo.outBytes, { echo: full, escape: terminalActsOn });
    else if (format === 'json')
      // Streamed in pieces, each through the terminal guard: the same text as guarding the whole, since
      // JSON has no raw CR or other C0 control for a cut to split.
      writeScheduleJson(scheduleOf(analysis), io.out, { pretty, echo: full });
    else if (format === 'csv') io.out(scheduleCsv(escapedView(scheduleView(analysis, units, WORDING))));
    else if (format === 'table')
      io.out(
        scheduleTable(
          escapedView(scheduleView(analysis, units, WORDING)),
          escapeControls(project.name),
          positionColumns(project.sheet?.chainageStyle),
        ),
      );
    else throw new UsageError(`--format: expected json, csv or table, got "${escapeControls(format)}"`);
    return 0;
  } catch (e) {
    if (e instanceof UsageError) {
      io.err(`${e.message}\n\n${USAGE}`);
      return 2;
    }
    io.err(`internal error: ${(e as Error).message}\n`);
    return 1;
  }
}
