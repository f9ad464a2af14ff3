import { resolve } from 'node:path';
import { runCli } from './run.js';
import { readLimited } from './readLimited.js';

// pnpm runs scripts from the package root; INIT_CWD is where the user typed the command.
const base = process.env.INIT_CWD ?? process.cwd();

const argv = process.argv.slice(2);
// A reader that closes early (`mainbrace schedule f | head -1`) makes writes fail with EPIPE: stop
// writing and end with the command's own status, without a stack trace.
let readerGone = false;
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code !== 'EPIPE') throw e;
  readerGone = true;
});
const io = {
  interactive: process.stdout.isTTY === true,
  readFile: (path: string, maxBytes: number) => readLimited(resolve(base, path), maxBytes),
  out: (text: string) => void (readerGone || process.stdout.write(text)),
  outBytes: (bytes: Uint8Array) => void (readerGone || process.stdout.write(bytes)),
  err: (text: string) => void process.stderr.write(text),
};
// Import and export (and the CSV, projection and schema libraries they read with) load only for those
// commands: every other command starts with the solver alone, and loads the schema only to word a refusal.
const run =
  (argv[0] === 'import' || argv[0] === 'export') && !argv.includes('--help')
    ? import('./exchange.js').then(({ runExchange }) => runExchange(argv, io))
    : runCli(argv, io);
void run.then((status) => {
  process.exitCode = status;
});
