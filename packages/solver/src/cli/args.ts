import { escapeControls } from './terminalText.js';

/** Parsed command line: the command, its positional arguments and its --name value options. */
export interface Args {
  command: string | undefined;
  positional: string[];
  options: Map<string, string>;
}

/** `schedule a.json --format csv` → { command: 'schedule', positional: ['a.json'], options: {format: 'csv'} } */
export function parseArgs(argv: readonly string[]): Args {
  const positional: string[] = [];
  const options = new Map<string, string>();
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (a.startsWith('--')) {
      const eq = a.indexOf('=');
      if (eq > 0) options.set(a.slice(2, eq), a.slice(eq + 1));
      else if (a === '--help' || a === '--pretty' || a === '--full' || a === '--verbose')
        options.set(a.slice(2), 'true');
      else options.set(a.slice(2), argv[++i] ?? '');
    } else if (a === '-h') options.set('help', 'true');
    else positional.push(a);
  }
  return { command: positional.shift(), positional, options };
}

/** The options a command takes and how many arguments (FILE, MARK) come after it. */
export interface Accepts {
  options: readonly string[];
  positional: number;
  /** what the arguments are, for the message: "FILE", "FILE and MARK" */
  names: string;
}

/**
 * Why the command line does not fit what the command takes, or null. An option a command does not
 * take, or an argument too many, is refused rather than ignored: a mistyped `--unit us` or `--cove 2`
 * would otherwise give a result on the default without a word.
 */
export function misfit(command: string, accepts: Accepts, args: Args): string | null {
  for (const name of args.options.keys())
    if (name !== 'help' && !accepts.options.includes(name))
      return `--${escapeControls(name)}: not an option of ${command} (${
        accepts.options.length ? `it takes ${accepts.options.map((o) => `--${o}`).join(', ')}` : 'it takes none'
      })`;
  if (args.positional.length > accepts.positional)
    return `unexpected argument "${escapeControls(args.positional[accepts.positional]!)}" after the ${command} command${
      accepts.positional ? `'s ${accepts.names}` : ''
    }`;
  return null;
}
