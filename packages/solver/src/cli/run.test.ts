import { describe, it, expect } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { runCli } from './run.js';
import { readLimited } from './readLimited.js';
import { routeInput } from '../../test/projectBuilder.js';

const demoPath = fileURLToPath(new URL('../../../../public/demo/larkspur-rise.json', import.meta.url));
const demo = () => JSON.parse(readFileSync(demoPath, 'utf8'));
const dir = mkdtempSync(join(tmpdir(), 'mainbrace-cli-'));

/** Runs the command line in this process against real files, collecting what it writes. */
async function cli(...argv: string[]) {
  let stdout = '';
  let stderr = '';
  const status = await runCli(argv, {
    readFile: readLimited,
    out: (t) => (stdout += t),
    err: (t) => (stderr += t),
  });
  return { status, stdout, stderr };
}

function fileOf(name: string, content: string | Uint8Array): string {
  const path = join(dir, name);
  writeFileSync(path, content);
  return path;
}

/** Anything a terminal acts on: every C0 control but the line feed, DEL, C1 controls. */
// eslint-disable-next-line no-control-regex
const TERMINAL_CONTROL = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f]/;

describe('the command line reads files with limits', () => {
  it('refuses /dev/zero at the 20 MB limit instead of reading it forever', async () => {
    const r = await cli('validate', '/dev/zero');
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^\/dev\/zero: the file is larger than 20\.0 MB; project files over 20\.0 MB are refused/);
  });

  it('applies the size limit to every command that reads a file, and --max-size changes it', async () => {
    const path = fileOf('demo.json', readFileSync(demoPath));
    for (const argv of [['validate'], ['schedule'], ['quantities', '--format', 'json'], ['explain']]) {
      const [command, ...rest] = argv;
      const r = await cli(command!, path, ...(command === 'explain' ? ['n4'] : rest), '--max-size', '0.001');
      expect(r.status).toBe(2);
      expect(r.stderr).toMatch(/demo\.json: the file is 0\.0 MB; project files over 0\.0 MB are refused/);
    }
    expect((await cli('validate', path, '--max-size', '1')).status).toBe(0);
    expect((await cli('validate', path, '--max-size', 'lots')).stderr).toMatch(
      /--max-size: expected a size in megabytes/,
    );
  });

  it('reads a file that starts with a UTF-8 byte-order mark, as the app does', async () => {
    const bom = new Uint8Array([0xef, 0xbb, 0xbf, ...readFileSync(demoPath)]);
    const r = await cli('validate', fileOf('bom.json', bom));
    expect(r.stderr).toBe('');
    expect(r.stdout).toMatch(/valid — 19 nodes, 18 pipes/);
    expect(r.status).toBe(0);
  });

  it('refuses bytes that are not UTF-8 with a message, not a garbled parse', async () => {
    const r = await cli('validate', fileOf('latin1.json', new Uint8Array([0x7b, 0xe9, 0x7d])));
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/latin1\.json: not UTF-8 text/);
  });
});

describe('the command line on numbers too small to be real', () => {
  const cases: [string, (p: ReturnType<typeof demo>) => void, string][] = [
    [
      'a pressure of 1e-100 Pa',
      (p) => (p.loadCases = [{ id: 'w', kind: 'working', pressure: 1e-100 }]),
      'loadCases[0].pressure',
    ],
    ['a water density of 1e-300', (p) => (p.water = { density: 1e-300 }), 'water.density'],
    ['a cohesion of 4.8e-305', (p) => (p.soils[1].cohesion = 4.8e-305), 'soils[1].cohesion'],
  ];
  for (const [what, change, field] of cases) {
    it(`refuses ${what} with exit 2 naming ${field}, in the table and in explain`, async () => {
      const p = demo();
      change(p);
      const path = fileOf('tiny.json', JSON.stringify(p));
      for (const argv of [
        ['schedule', path],
        ['schedule', path, '--format', 'table'],
        ['explain', path, 'n13'],
      ]) {
        const r = await cli(...argv);
        expect(r.status).toBe(2);
        expect(r.stderr).toMatch(
          // Below its hard range (water density) or a nonzero number too small to be real (the others).
          new RegExp(`^${field.replace(/[[\].]/g, '\\$&')}: (.* is too small to be a real value|must be at least)`),
        );
        expect(r.stderr).not.toMatch(/internal error/);
      }
    });
  }
});

describe('the command line never writes control characters from a file to the terminal', () => {
  const hostile = () => {
    const p = demo();
    p.name = 'Main\u001b[8m';
    p.soils[1].label = 'Soft clay\r\u001b[1A\u001b[2K';
    p.soils[1].bearing = 0; // so the soil's label appears in a warning
    p.loadCases[2].label = 'Test\u009b31m';
    p.nodes.find((n: { id: string }) => n.id === 'n4').label = 'Hydrant\nB4: all clear';
    return p;
  };

  it('escapes names, labels and warnings in the table', async () => {
    const r = await cli('schedule', fileOf('hostile.json', JSON.stringify(hostile())));
    expect(r.status).toBe(0);
    expect(r.stdout).not.toMatch(TERMINAL_CONTROL);
    expect(r.stdout).toContain('Fitting schedule — Main\\u001b[8m');
    expect(r.stdout).toContain('No bearing: Soft clay\\u000d\\u001b[1A\\u001b[2K has no allowable bearing');
    expect(r.stdout).toContain('Test\\u009b31m');
  });

  it('escapes the calculation record of explain', async () => {
    const r = await cli('explain', fileOf('hostile.json', JSON.stringify(hostile())), 'n7');
    expect(r.status).toBe(0);
    expect(r.stdout).not.toMatch(TERMINAL_CONTROL);
    expect(r.stdout).toContain('Soft clay\\u000d\\u001b[1A');
  });

  it('keeps CSV record ends but escapes a label that would add a line', async () => {
    const r = await cli('schedule', fileOf('hostile.json', JSON.stringify(hostile())), '--format', 'csv');
    expect(r.status).toBe(0);
    const records = r.stdout.split('\r\n');
    expect(records.every((line) => !TERMINAL_CONTROL.test(line) && !line.includes('\n'))).toBe(true);
    expect(r.stdout).toContain('Hydrant\\u000aB4: all clear');
  });

  it('writes JSON whose strings mean exactly what the file said, with nothing a terminal acts on', async () => {
    const r = await cli('schedule', fileOf('hostile.json', JSON.stringify(hostile())), '--format', 'json');
    expect(r.status).toBe(0);
    expect(r.stdout).not.toMatch(TERMINAL_CONTROL);
    expect(JSON.parse(r.stdout).project).toContain('Main\u001b[8m');
  });

  it('escapes ids, field names and file names in error messages', async () => {
    const p = demo();
    p['evil\u001b[2Jkey'] = 1;
    const bad = await cli('validate', fileOf('bad\u001b]0;x\u0007.json', JSON.stringify(p)));
    expect(bad.status).toBe(2);
    expect(bad.stderr).not.toMatch(TERMINAL_CONTROL);
    expect(bad.stderr).toContain('evil\\u001b[2Jkey');
    const missing = await cli('explain', fileOf('ok.json', JSON.stringify(demo())), 'n99\u001b[1A');
    expect(missing.status).toBe(2);
    expect(missing.stderr).toContain('no node "n99\\u001b[1A"');
  });
});

describe('the JSON schedule of the command line', () => {
  it('leaves out what the file already says, unless --full, and keeps every result', async () => {
    const path = fileOf('demo.json', JSON.stringify(demo()));
    const compact = JSON.parse((await cli('schedule', path, '--format', 'json')).stdout);
    const full = JSON.parse((await cli('schedule', path, '--format', 'json', '--full')).stdout);
    expect(compact.fittings.length).toBe(full.fittings.length);
    compact.fittings.forEach((f: Record<string, unknown>, i: number) => {
      const { position, label, soil, pipes, ...results } = full.fittings[i];
      expect([position, soil]).not.toContain(undefined); // the full form does echo them
      expect(label === undefined).toBe(false);
      expect(f.position ?? f.label ?? f.soil).toBeUndefined();
      expect(f.pipes).toEqual(
        pipes.map((p: { id: string; toward: string | null }) => ({ id: p.id, toward: p.toward })),
      );
      expect({ ...f, pipes: undefined }).toEqual({ ...results, pipes: undefined });
    });
  });
});

describe('the command line quantities and stations', () => {
  it('prints the take-off as CSV whose total to order is the net concrete plus the waste allowance', async () => {
    const r = await cli('quantities', demoPath, '--format', 'csv');
    expect(r.status).toBe(0);
    const lines = r.stdout.trimEnd().split('\r\n');
    const value = (item: RegExp) => Number(lines.find((l) => item.test(l.split(',')[1]!))!.split(',')[4]);
    // Rounded up to 0.01 m³ each, so within a hundredth of the hand sum net × 1.10.
    expect(Math.abs(value(/^Total to order$/) - value(/^Net$/) * 1.1)).toBeLessThan(0.011 * 2);
  });

  it('says in the JSON take-off which units its figures are in and which sheet rounded them', async () => {
    for (const units of ['us', 'si'] as const) {
      const r = await cli('quantities', demoPath, '--format', 'json', '--units', units);
      expect(r.status).toBe(0);
      const t = JSON.parse(r.stdout) as { project: string; units: unknown; concreteNet: number };
      expect(t.project).toBe(demo().name);
      expect(t.units).toEqual({ values: 'SI: m, m³', roundedAs: units });
      // no float noise past 12 significant digits (0.1 + 0.2 style tails)
      expect(r.stdout).not.toMatch(/\d\.\d*(0000000|9999999)\d/);
    }
  });

  it('writes stations in the table when the project asks for them', async () => {
    const path = fileOf(
      'stations.json',
      JSON.stringify({ ...demo(), units: 'us', sheet: { chainageStyle: 'stations' } }),
    );
    const r = await cli('schedule', path);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/Station/);
    expect(r.stdout).not.toMatch(/Chainage \(ft\)/);
    // A2 lies 393.7 ft along the main (the schedule's chainage): station 3+93.7.
    expect(r.stdout).toMatch(/A2\s+3\+93\.7/);
  });

  it('refuses an option the command does not take, or an argument too many, with exit 2', async () => {
    // usage.ts lists each command's options: a mistyped `--unit us` must not give SI figures silently.
    const path = fileOf('demo.json', readFileSync(demoPath));
    for (const argv of [
      ['schedule', path, '--unit', 'us'],
      ['quantities', path, '--full'],
      ['explain', path, 'n4', '--format', 'json'],
      ['validate', path, '--units', 'si'],
      ['schedule', path, 'other.json'],
      ['explain', path, 'n4', 'n5'],
      ['schema', '--pretty'],
      ['schema', path],
    ]) {
      const r = await cli(...argv);
      expect(r.status).toBe(2);
      expect(r.stdout).toBe('');
      expect(r.stderr).toMatch(/^(--\S+: not an option of \w+|unexpected argument ")/);
    }
    expect((await cli('schedule', path, '--units', 'us', '--format', 'json', '--full', '--pretty')).status).toBe(0);
  });

  it('refuses to explain an id that is one fitting’s mark and another’s node id', async () => {
    // Invariant: explain never shows a fitting other than the one named without saying so. Node ids
    // are free text; marks run A1, A2, ... along the run, so node "A1" here is marked A2.
    const p = routeInput({
      nodes: [
        { id: 'start', x: 0, y: 0 },
        { id: 'A1', x: 30, y: 0 },
        { id: 'end', x: 30, y: 30 },
      ],
      pipes: [
        { from: 'start', to: 'A1', od: 0.326 },
        { from: 'A1', to: 'end', od: 0.326 },
      ],
    });
    const path = fileOf('marks.json', JSON.stringify(p));
    const r = await cli('explain', path, 'A1');
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(
      /"A1" is both the mark of one fitting \(node "start"\) and the id of another node \(marked A2\)/,
    );
    expect((await cli('explain', path, 'A2')).stdout).toMatch(/^A2 — Bend 90° \(node A1, run A\)/);
  });
});
