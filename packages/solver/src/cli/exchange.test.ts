import { describe, it, expect } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Geodesic } from 'geographiclib-geodesic';
import { runExchange } from './exchange.js';
import { readLimited } from './readLimited.js';
import { parseProjectText } from '../model/parseProject.js';
import { analyse } from '../analysis/analyse.js';

const fixture = fileURLToPath(new URL('../../../../e2e/fixtures/quarry-hill-road.geojson', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'mainbrace-exchange-'));

async function cli(...argv: string[]) {
  let stdout = '';
  let stderr = '';
  const status = await runExchange(argv, {
    readFile: readLimited,
    out: (t) => (stdout += t),
    err: (t) => (stderr += t),
  });
  return { status, stdout, stderr };
}

describe('mainbrace import and export', () => {
  it('imports a GeoJSON route into a valid project whose bends are the geodesic bends (0.1°)', async () => {
    const r = await cli('import', fixture);
    expect(r.status).toBe(0);
    const parsed = parseProjectText(r.stdout);
    if (!parsed.ok) throw new Error('not a valid project');
    expect(parsed.project.name).toBe('quarry-hill-road');
    // The fixture's second vertex: GeographicLib (Karney 2013) azimuths arriving and leaving.
    const arrive = Geodesic.WGS84.Inverse(47.4, 8.5, 47.4012, 8.5031).azi2!;
    const leave = Geodesic.WGS84.Inverse(47.4012, 8.5031, 47.4015, 8.5072).azi1!;
    const bend = analyse(parsed.project).byNode.get('n2')!;
    expect(Math.abs(bend.geometry.horizontalDeflection! - Math.abs(leave - arrive))).toBeLessThan(0.1);
    expect(parsed.project.pipes[0]).toMatchObject({ series: 'di-en545', nominal: 'DN250' });
  });

  it('imports a CSV survey with the columns named on the command line, in feet', async () => {
    const csv = join(dir, 'survey.csv');
    writeFileSync(csv, 'Station,Eastings,Northings,Grade\nA,0,0,200\nB,300,0,198\nC,300,200,197\n');
    const r = await cli(
      'import',
      csv,
      '--easting',
      'Eastings',
      '--northing',
      'Northings',
      '--level',
      'Grade',
      '--unit',
      'ft',
      '--cover',
      '4',
    );
    expect(r.status).toBe(0);
    const parsed = parseProjectText(r.stdout);
    if (!parsed.ok) throw new Error('not a valid project');
    // 200 ft = 60.96 m ground; 4 ft = 1.2192 m cover; AWWA 8 in OD 9.05 in = 0.22987 m (default US pipe).
    const n1 = parsed.project.nodes[0]!;
    expect(n1.groundLevel).toBeCloseTo(60.96, 9);
    expect(n1.elevation).toBeCloseTo(60.96 - 1.2192 - 0.22987 / 2, 6);
  });

  it('names the feature and the coordinate of a bad file, with exit status 2', async () => {
    const bad = join(dir, 'bad.geojson');
    writeFileSync(
      bad,
      JSON.stringify({
        type: 'Feature',
        properties: { name: 'Elm Lane' },
        geometry: {
          type: 'LineString',
          coordinates: [
            [8.5, 47.4],
            [8.5, 'north'],
          ],
        },
      }),
    );
    const r = await cli('import', bad);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain(
      'error: the feature "Elm Lane", coordinates[1] [8.5, "north"]: latitude must be a number',
    );
  });

  it('exports an imported project as GeoJSON, and refuses one without a georeference', async () => {
    const imported = await cli('import', fixture);
    const file = join(dir, 'qh.json');
    writeFileSync(file, imported.stdout);
    const r = await cli('export', file);
    expect(r.status).toBe(0);
    const fc = JSON.parse(r.stdout) as { features: { properties: { layer: string } }[] };
    const layers = new Set(fc.features.map((f) => f.properties.layer));
    expect([...layers].sort()).toEqual(['fitting', 'pipe', 'thrust-block']);
    const plain = JSON.parse(imported.stdout) as Record<string, unknown>;
    delete plain.georeference;
    writeFileSync(file, JSON.stringify(plain));
    const e = await cli('export', file);
    expect(e.status).toBe(2);
    expect(e.stderr).toMatch(/no georeference/);
  });

  it('writes no bidi override or terminal control from a run name, raw, to stdout or stderr', async () => {
    // terminalText.ts's set (Unicode Standard Annex #9 §2, ECMA-48 C1): the same guard as the other commands.
    const csv = join(dir, 'runs.csv');
    writeFileSync(
      csv,
      'E,N,RL,run\n0,0,100,\u202eB\u009b2K\n40,0,100,\u202eB\u009b2K\n0,90,100,\u001b[8mC\n40,90,100,\u001b[8mC\n',
    );
    const r = await cli('import', csv, '--run', 'run');
    expect(r.status).toBe(0);
    // eslint-disable-next-line no-control-regex -- looking for control characters is the point
    const raw = /[\u001b\u009b\u202e]/;
    expect(raw.test(r.stdout)).toBe(false);
    expect(raw.test(r.stderr)).toBe(false);
    // still the same project: JSON reads `\u202e` back as the character
    const parsed = parseProjectText(r.stdout);
    if (!parsed.ok) throw new Error('not a valid project');
    expect(parsed.project.pipes[0]!.label).toBe('run "\u202eB\u009b2K"');
  });

  it('takes --max-size as the other commands do, for import and export alike', async () => {
    // usage.ts: "Options for every command reading FILE: --max-size MB".
    const csv = join(dir, 'small.csv');
    writeFileSync(csv, 'E,N\n0,0\n40,0\n40,30\n');
    const tight = await cli('import', csv, '--max-size', '0.00001');
    expect(tight.status).toBe(2);
    expect(tight.stderr).toMatch(/larger than 0\.0 MB; raise the limit with --max-size/);
    expect((await cli('export', csv, '--max-size', '0.00001')).status).toBe(2);
    const bad = await cli('import', csv, '--max-size', 'lots');
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/^--max-size: expected a size in megabytes/);
    expect((await cli('import', csv, '--max-size', '1')).status).toBe(0);
  });

  it('refuses an option import or export does not take, or a second file, rather than ignore it', async () => {
    // usage.ts lists import's options: a mistyped `--cove 2.5` must not import on the 1.2 m default cover.
    const csv = join(dir, 'options.csv');
    writeFileSync(csv, 'E,N,Level\n0,0,100\n40,0,100\n40,30,99\n');
    for (const argv of [
      ['import', csv, '--cove', '2.5'],
      ['import', csv, '--units', 'ft'],
      ['import', csv, 'other.csv'],
      ['export', csv, '--pretty'],
    ]) {
      const r = await cli(...argv);
      expect(r.status).toBe(2);
      expect(r.stdout).toBe('');
      expect(r.stderr).toMatch(/^(--\S+: not an option of (import|export)|unexpected argument "other\.csv")/);
    }
    // --verbose takes no value: the file after it is still the file.
    const ok = await cli('import', '--verbose', csv, '--cover', '2.5');
    expect(ok.status).toBe(0);
    const parsed = parseProjectText(ok.stdout);
    if (!parsed.ok) throw new Error('not a valid project');
    // ground 100 m less 2.5 m cover less half the default pipe's OD (di-en545 DN200: 222 mm, EN 545 table)
    expect(parsed.project.nodes[0]!.elevation).toBeCloseTo(100 - 2.5 - 0.222 / 2, 6);
  });
});
