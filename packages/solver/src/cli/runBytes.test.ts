import { describe, it, expect } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { runCli } from './run.js';
import { readLimited } from './readLimited.js';
import { terminalSafe } from './terminalText.js';

const demoPath = fileURLToPath(new URL('../../../../public/demo/larkspur-rise.json', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'mainbrace-cli-bytes-'));

/** Runs the command line with a byte output beside the text one; what each received. */
async function cli(...argv: string[]) {
  let text = '';
  const decoder = new TextDecoder('utf-8', { fatal: true });
  let bytes = '';
  const status = await runCli(argv, {
    readFile: readLimited,
    out: (t) => (text += t),
    outBytes: (b) => (bytes += decoder.decode(b, { stream: true })),
    err: () => undefined,
  });
  return { status, text, bytes: bytes + decoder.decode() };
}

/** The same command with a text output only: the writer and guard every other command uses. */
async function textOnly(...argv: string[]) {
  let text = '';
  await runCli(argv, { readFile: readLimited, out: (t) => (text += t), err: () => undefined });
  return text;
}

describe('schedule --format json written as bytes', () => {
  it('is the text the string writer and the terminal guard give, compact and --full', async () => {
    const p = JSON.parse(readFileSync(demoPath, 'utf8'));
    p.name = 'Main\u001b[8m \u2028 "quoted" \\ \u{1F6B0}\u009b';
    p.nodes.find((n: { id: string }) => n.id === 'n4').label = 'Hydrant\r\nB4\u202e\u0085';
    const path = join(dir, 'hostile.json');
    writeFileSync(path, JSON.stringify(p));
    for (const extra of [[], ['--full']]) {
      const r = await cli('schedule', path, '--format', 'json', ...extra);
      expect(r.status).toBe(0);
      expect(r.text).toBe('');
      expect(r.bytes).toBe(await textOnly('schedule', path, '--format', 'json', ...extra));
      expect(r.bytes).toBe(terminalSafe(r.bytes));
      expect(r.bytes).toContain('\\u001b[8m \\u2028');
    }
  });

  it('leaves --pretty, the table and other commands to the text output', async () => {
    for (const argv of [
      ['schedule', demoPath, '--format', 'json', '--pretty'],
      ['schedule', demoPath],
      ['quantities', demoPath, '--format', 'json'],
    ]) {
      const r = await cli(...argv);
      expect(r.bytes).toBe('');
      expect(r.text).toBe(await textOnly(...argv));
    }
  });
});
