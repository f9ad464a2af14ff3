import { describe, it, expect, beforeAll } from 'vitest';
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../../', import.meta.url));
const bin = join(root, 'packages/solver/bin/mainbrace.mjs');
const demo = join(root, 'public/demo/larkspur-rise.json');
const run = (...args: string[]) => spawnSync(process.execPath, [bin, ...args], { encoding: 'utf8' });

beforeAll(() => {
  // The CLI runs compiled JavaScript: build it from the current sources first.
  execFileSync('corepack', ['pnpm', '--filter', '@mainbrace/solver', 'build'], { cwd: root, stdio: 'ignore' });
}, 60_000);

interface FileNode {
  id: string;
  x: number;
  y: number;
  elevation: number;
  valve?: boolean;
}
interface FilePipe {
  from: string;
  to: string;
  outsideDiameter: number;
  insideDiameter: number;
  flow?: number;
}

/**
 * An independent oracle written here from the momentum balance, sharing no code with the solver:
 * F = −Σ (p·A_i + ρ·Q_i²/a_i)·n_i at each node, p = p_case + ρ·g·(datum − z), A on the OD.
 */
function oracle(file: {
  nodes: FileNode[];
  pipes: FilePipe[];
  loadCases: { id: string; pressure: number; datumElevation?: number; flowFactor?: number }[];
  water?: { density: number };
}) {
  const rho = file.water?.density ?? 998.2;
  const at = new Map(file.nodes.map((n) => [n.id, n]));
  const out = new Map<string, Map<string, number[]>>();
  for (const n of file.nodes) {
    if (n.valve) continue;
    const perCase = new Map<string, number[]>();
    for (const c of file.loadCases) {
      const p = c.pressure + (c.datumElevation === undefined ? 0 : rho * 9.80665 * (c.datumElevation - n.elevation));
      const f = [0, 0, 0];
      for (const pipe of file.pipes) {
        if (pipe.from !== n.id && pipe.to !== n.id) continue;
        const far = at.get(pipe.from === n.id ? pipe.to : pipe.from)!;
        const d = [far.x - n.x, far.y - n.y, far.elevation - n.elevation];
        const len = Math.hypot(d[0]!, d[1]!, d[2]!);
        const q = (pipe.flow ?? 0) * (c.flowFactor ?? 1);
        const push =
          (p * Math.PI * pipe.outsideDiameter ** 2) / 4 + (rho * q * q) / ((Math.PI * pipe.insideDiameter ** 2) / 4);
        for (let k = 0; k < 3; k++) f[k]! -= (push * d[k]!) / len;
      }
      perCase.set(c.id, f);
    }
    out.set(n.id, perCase);
  }
  return out;
}

describe('the command line', () => {
  it('prints a JSON schedule of the demo whose every force matches an independent momentum balance', () => {
    const r = run('schedule', demo, '--format', 'json');
    expect(r.status).toBe(0);
    const schedule = JSON.parse(r.stdout);
    const expected = oracle(JSON.parse(readFileSync(demo, 'utf8')));
    expect(schedule.project).toMatch(/Larkspur Rise/);
    expect(schedule.fittings.length).toBeGreaterThanOrEqual(14);
    const kinds = new Set(schedule.fittings.map((f: { kind: string }) => f.kind));
    for (const k of ['bend', 'reducer', 'reducing-bend', 'tee', 'wye', 'cross', 'dead-end', 'valve'])
      expect(kinds).toContain(k);
    for (const f of schedule.fittings) {
      const mine = expected.get(f.node);
      if (!mine) continue; // the valve follows the closed-valve rule, checked in unit tests
      for (const c of f.cases) {
        mine.get(c.case)!.forEach((v, k) =>
          // JSON forces are stated to 0.1 N (docs/project-format.md): within half of that.
          expect(Math.abs(c.total[k] - v)).toBeLessThan(0.05 + 1e-9 * Math.hypot(...mine.get(c.case)!)),
        );
      }
      const r = f.restraint;
      expect(r.block !== null || r.anchor !== null || r.restrainedLength !== null).toBe(true);
    }
  });

  it('prints CSV with display units in the header, in SI or US customary', () => {
    const si = run('schedule', demo, '--format', 'csv');
    expect(si.status).toBe(0);
    expect(si.stdout.split('\r\n')[0]).toContain('Thrust (kN)');
    const us = run('schedule', demo, '--format', 'csv', '--units', 'us');
    expect(us.stdout.split('\r\n')[0]).toContain('Thrust (kip)');
    expect(us.stdout.split('\r\n')[0]).toContain('Block concrete (yd³)');
  });

  it('prints a readable table with the cautions, and explains one fitting', () => {
    const t = run('schedule', demo);
    expect(t.stdout).toMatch(/^A4 .*Bend 45°/m);
    expect(t.stdout).toMatch(/licensed professional engineer/);
    const e = run('explain', demo, 'A4');
    expect(e.status).toBe(0);
    expect(e.stdout).toContain('Required bearing area');
    expect(e.stdout).toContain('A = SF · T_h / σ_b');
    // The restraint elements are listed first, each named by the fitting's mark.
    expect(e.stdout).toMatch(
      /^Restraint\n {2}A4 block {2}1\.10 m w × 0\.90 m h × 0\.60 m t, 0\.60 m³; bears 0° N, 63\.1 kN and holds 0\.2 kN up$/m,
    );
    // a mark typed in lower case finds the same fitting
    expect(run('explain', demo, 'a4').stdout).toBe(e.stdout);
    const valve = run('explain', demo, 'A10');
    expect(valve.stdout).toMatch(/^ {2}A10 block {11}\S/m);
    expect(valve.stdout).toMatch(/^ {2}A10 opposite block {2}\S/m);
    expect(run('explain', demo, 'A6').stdout).toMatch(
      // the cube built: 1.25³ = 1.953 m³, printed rounded up
      /^ {2}A6 anchor {2}1\.25 m l × 1\.25 m w × 1\.25 m h, 1\.96 m³; holds 16\.5 kN up and 2\.5 kN sideways by base friction$/m,
    );
    // 6.2 m restrained at the demo's default 6 m laying length: joints at 0 and 6 m, two of them.
    expect(run('explain', demo, 'A13').stdout).toMatch(/^ {2}A13 joints {2}6\.2 m toward A12 \(2 joints\)$/m);
    expect(t.stdout).toMatch(/^A13 .*restrain 6\.2 m toward A12 \(2 joints\), 6\.2 m toward A14 \(2 joints\)/m);
  });
  it('marks crest and sag bends and gives each element its own force and way of bearing', () => {
    expect(run('explain', demo, 'A6').stdout).toMatch(/^A6 — Bend 16\.31° crest /m);
    // A sag: the block bears sideways toward the outside of the bend, the pad takes the downward part.
    const sag = run('explain', demo, 'A7').stdout;
    expect(sag).toMatch(/^ {2}A7 block {6}.*; bears 293° NW, 2\.6 kN$/m);
    expect(sag).toMatch(/^ {2}A7 bottom pad {2}.*; bears 17\.5 kN down$/m);
  });

  it('validates a good file and prints the JSON Schema', () => {
    expect(run('validate', demo).stdout).toMatch(/valid — 19 nodes, 18 pipes/);
    const s = run('schema');
    expect(JSON.parse(s.stdout).title).toMatch(/Mainbrace project file/);
  });

  it('refuses a bad file with exit 2 and one line per problem naming the field, never a stack trace', () => {
    const dir = mkdtempSync(join(tmpdir(), 'mainbrace-'));
    const bad = JSON.parse(readFileSync(demo, 'utf8'));
    bad.pipes[1].outsideDiameter = 0;
    bad.nodes[2].cover = 'deep';
    bad.loadCases[0].presure = 5;
    const file = join(dir, 'bad.json');
    writeFileSync(file, JSON.stringify(bad));
    const r = run('schedule', file);
    expect(r.status).toBe(2);
    const lines = r.stderr.trim().split('\n');
    expect(lines).toContain('pipes[1].outsideDiameter: must be at least 0.01 m');
    expect(lines).toContain('nodes[2].cover: expected a number, got the text "deep"');
    expect(lines).toContain('loadCases[0].presure: unknown field (not part of the project format)');
    expect(r.stderr).not.toMatch(/\n\s+at /);
  });

  it('names the line and column of broken JSON, and a missing file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'mainbrace-'));
    const file = join(dir, 'broken.json');
    writeFileSync(file, '{\n  "format": "mainbrace-project",\n  "version": 1\n  "name": "x"\n}');
    const r = run('validate', file);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/not valid JSON at line 4, column 3/);
    const m = run('validate', join(dir, 'nope.json'));
    expect(m.status).toBe(2);
    expect(m.stderr).toMatch(/cannot read the file \(no such file\)/);
  });

  it('stops reading /dev/zero at the size limit and exits 2 (the installed command, not only runCli)', () => {
    const r = spawnSync(process.execPath, [bin, 'validate', '/dev/zero'], { encoding: 'utf8', timeout: 20_000 });
    expect(r.signal).toBeNull();
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/larger than 20\.0 MB/);
  });

  it('refuses an unknown command or option value with exit 2', () => {
    expect(run('draw').status).toBe(2);
    expect(run('schedule', demo, '--format', 'pdf').stderr).toMatch(/--format: expected json, csv or table/);
  });

  it('ends quietly with its own status when the reader closes the pipe early (`| head -1`)', async () => {
    // POSIX write(2): writing to a pipe with no reader fails with EPIPE; that is the reader's choice,
    // not a fault of ours, so no stack trace and not exit 1.
    const { spawn } = await import('node:child_process');
    const child = spawn(process.execPath, [bin, 'schedule', demo, '--format', 'json', '--full', '--pretty']);
    child.stdout.destroy();
    let stderr = '';
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    const status = await new Promise<number | null>((done) => child.on('close', (code) => done(code)));
    expect(stderr).toBe('');
    expect(status).toBe(0);
  });
});
