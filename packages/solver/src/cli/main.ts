import { resolve } from 'node:path';
import { runCli } from './run.js';
import { readLimited } from './readLimited.js';

// pnpm runs scripts from the package root; INIT_CWD is where the user typed the command.
const base = process.env.INIT_CWD ?? process.cwd();

void runCli(process.argv.slice(2), {
  interactive: process.stdout.isTTY === true,
  readFile: (path, maxBytes) => readLimited(resolve(base, path), maxBytes),
  out: (text) => process.stdout.write(text),
  err: (text) => process.stderr.write(text),
}).then((status) => {
  process.exitCode = status;
});
