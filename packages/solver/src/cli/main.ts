import { resolve } from 'node:path';
import { runCli } from './run.js';
import { readLimited } from './readLimited.js';
import { runExchange } from './exchange.js';

// pnpm runs scripts from the package root; INIT_CWD is where the user typed the command.
const base = process.env.INIT_CWD ?? process.cwd();

const argv = process.argv.slice(2);
const io = {
  interactive: process.stdout.isTTY === true,
  readFile: (path: string, maxBytes: number) => readLimited(resolve(base, path), maxBytes),
  out: (text: string) => void process.stdout.write(text),
  err: (text: string) => void process.stderr.write(text),
};
// Import and export load the CSV and projection libraries, so they alone run asynchronously.
if ((argv[0] === 'import' || argv[0] === 'export') && !argv.includes('--help'))
  void runExchange(argv, io).then((status) => (process.exitCode = status));
else process.exitCode = runCli(argv, io);
