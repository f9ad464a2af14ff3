import { parseArgs } from './args.js';
import { USAGE } from './usage.js';
import { explainText } from './explainText.js';
import { parseProjectText } from '../model/parseProject.js';
import { problemText } from '../model/problems.js';
import { projectJsonSchema } from '../model/jsonSchema.js';
import type { Project } from '../model/projectSchema.js';
import { analyse } from '../analysis/analyse.js';
import { legsByNode } from '../network/legs.js';
import { fittingGeometry, needsRestraint } from '../network/fittingKind.js';
import { scheduleOf } from '../schedule/scheduleRows.js';
import { scheduleJson } from '../schedule/scheduleJson.js';
import { scheduleView } from '../schedule/scheduleView.js';
import { scheduleCsv } from '../schedule/scheduleCsv.js';
import { scheduleTable } from '../schedule/scheduleTable.js';
import type { UnitSystem } from '../units/conversions.js';

/** What the command line needs from the outside world, so that it runs in tests without a process. */
export interface CliIo {
  /** true when the output goes to a terminal: JSON is then indented for reading */
  interactive?: boolean;
  /** the file's text, or throws an error with a `code` such as ENOENT */
  readFile: (path: string) => string;
  out: (text: string) => void;
  err: (text: string) => void;
}

class UsageError extends Error {}

function load(io: CliIo, path: string | undefined): Project | string[] {
  if (!path) throw new UsageError('missing FILE: give the path of a project file');
  let text: string;
  try {
    text = io.readFile(path);
  } catch (e) {
    const code = (e as { code?: string }).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : (e as Error).message;
    return [`${path}: cannot read the file (${why})`];
  }
  const result = parseProjectText(text);
  return result.ok ? result.project : result.problems.map(problemText);
}

function unitsOption(value: string | undefined, project: Project): UnitSystem {
  if (value === undefined) return project.units;
  if (value === 'us' || value === 'si') return value;
  throw new UsageError(`--units: expected "us" or "si", got "${value}"`);
}

/** Runs one command line; returns the exit status (0 done, 2 bad input). Never throws. */
export function runCli(argv: readonly string[], io: CliIo): number {
  try {
    const args = parseArgs(argv);
    if (args.options.has('help') || args.command === undefined || args.command === 'help') {
      io.out(USAGE);
      return args.command === undefined && !args.options.has('help') ? 2 : 0;
    }
    if (args.command === 'schema') {
      io.out(JSON.stringify(projectJsonSchema(), null, 2) + '\n');
      return 0;
    }
    if (!['schedule', 'validate', 'explain'].includes(args.command)) {
      throw new UsageError(`unknown command "${args.command}": expected schedule, explain, validate or schema`);
    }
    const loaded = load(io, args.positional[0]);
    if (Array.isArray(loaded)) {
      io.err(loaded.join('\n') + '\n');
      return 2;
    }
    const project = loaded;
    if (args.command === 'validate') {
      // Naming the fittings is enough here; sizing them is the schedule's work.
      const legs = legsByNode(project);
      const fittings = project.nodes.filter((n) =>
        needsRestraint(fittingGeometry(n, legs.get(n.id) ?? []).kind),
      ).length;
      io.out(
        `${args.positional[0]}: valid — ${project.nodes.length} nodes, ${project.pipes.length} pipes, ${fittings} fittings to restrain\n`,
      );
      return 0;
    }
    const analysis = analyse(project);
    const units = unitsOption(args.options.get('units'), project);
    if (args.command === 'explain') {
      const id = args.positional[1];
      if (!id) throw new UsageError('missing MARK: give the fitting’s mark (A4) or its node id');
      const fitting = analysis.fittings.find((f) => f.mark === id) ?? analysis.byNode.get(id);
      if (!fitting) {
        const known = project.nodes.some((n) => n.id === id) || [...analysis.marks.values()].includes(id);
        io.err(
          known
            ? `"${id}" needs no restraint (a straight joint, a tie-in or a free node)\n`
            : `no fitting marked "${id}" and no node "${id}" in ${args.positional[0]}\n`,
        );
        return 2;
      }
      io.out(explainText(analysis, fitting, units));
      return 0;
    }
    const format = args.options.get('format') ?? 'table';
    // Indented for a person at a terminal or with --pretty; compact into pipes and files.
    const pretty = io.interactive === true || args.options.has('pretty');
    if (format === 'json') io.out(scheduleJson(scheduleOf(analysis), pretty));
    else if (format === 'csv') io.out(scheduleCsv(scheduleView(analysis, units)));
    else if (format === 'table') io.out(scheduleTable(scheduleView(analysis, units), project.name));
    else throw new UsageError(`--format: expected json, csv or table, got "${format}"`);
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
