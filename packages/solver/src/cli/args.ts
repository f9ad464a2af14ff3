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
      else if (a === '--help' || a === '--pretty' || a === '--full') options.set(a.slice(2), 'true');
      else options.set(a.slice(2), argv[++i] ?? '');
    } else if (a === '-h') options.set('help', 'true');
    else positional.push(a);
  }
  return { command: positional.shift(), positional, options };
}
