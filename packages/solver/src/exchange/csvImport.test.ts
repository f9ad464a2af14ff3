import { describe, it, expect } from 'vitest';
import { importCsv } from './routeProject.js';
import { guessMapping, readCsvTable } from './csvSurvey.js';
import { noteText } from './importNotes.js';
import { nodeCover } from '../model/groundLevel.js';
import { analyse } from '../analysis/analyse.js';

// An invented survey along "Tanner's Row": chainage points with ground levels (reduced levels, m).
const SURVEY = `Pt,East (m),North (m),RL ground
1,1000.000,5000.000,52.40
2,1060.000,5000.000,52.10
3,1060.000,5045.000,51.35
4,1110.000,5095.000,50.90
`;
const MAPPING = { easting: 'East (m)', northing: 'North (m)', level: 'RL ground' };

describe('a CSV survey', () => {
  it('gives nodes at the surveyed ground levels with the pipe at the stated cover', () => {
    const r = importCsv(SURVEY, MAPPING, 'm', { cover: 1.2 });
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    const grounds = [52.4, 52.1, 51.35, 50.9];
    // Default pipe DN200 EN 545, OD 0.222 m: centreline = ground − 1.2 − 0.111 (hand calculation).
    r.project.nodes.forEach((n, i) => {
      expect(n.groundLevel).toBe(grounds[i]);
      expect(n.elevation).toBeCloseTo(grounds[i]! - 1.311, 9);
      expect(nodeCover(n, 0.222)).toBeCloseTo(1.2, 9);
    });
    // The survey's own coordinates are kept: a right-angle bend at point 2, a 45° bend at point 3.
    expect(r.project.nodes[1]).toMatchObject({ x: 1060, y: 5000 });
    const a = analyse(r.project);
    expect(a.byNode.get('n2')!.geometry.horizontalDeflection).toBeCloseTo(90, 6);
    expect(a.byNode.get('n3')!.geometry.horizontalDeflection).toBeCloseTo(45, 6);
  });

  it('reads feet and pipe levels: 100 ft = 30.48 m exactly (international foot)', () => {
    const ft = 'E;N;IL\n0;0;100\n100;0;99\n';
    const r = importCsv(ft, { easting: 'E', northing: 'N', level: 'IL' }, 'ft', { levels: 'pipe' });
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    expect(r.project.nodes[0]).toMatchObject({ elevation: 30.48, cover: 1.2 });
    expect(r.project.nodes[1]!.x).toBeCloseTo(30.48, 9);
    expect(r.project.nodes[0]!.groundLevel).toBeUndefined();
    expect(r.project.units).toBe('us');
    // the cases' datum note speaks the project's units: the highest centreline 100 ft, not 30.480 m
    const datum = r.notes.map(noteText).find((t) => t.includes('highest pipe centreline'))!;
    expect(datum).toMatch(/100(\.0+)? ft/);
    expect(datum).not.toMatch(/ m:/);
  });

  it('warns that survey feet are shown as international feet, 2 parts per million apart', () => {
    // 1 sft = 1200/3937 m; 1 ft = 0.3048 m: 1,250,000 sft = 381,000.762 m = 1,250,002.50 ft (hand calculation)
    const r = importCsv('E,N\n1250000,650000\n1250100,650000\n', { easting: 'E', northing: 'N' }, 'us-ft');
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    expect(r.project.nodes[0]!.x / 0.3048).toBeCloseTo(1_250_002.5, 2);
    expect(r.notes.map(noteText).join('\n')).toMatch(/US survey feet.*international feet.*2 parts per million/);
  });

  it('guesses usual header names for the dialog to start from', () => {
    const t = readCsvTable(SURVEY);
    if (!t.ok) throw new Error('not read');
    expect(guessMapping(t.table.header)).toEqual({ easting: 'East (m)', northing: 'North (m)', level: 'RL ground' });
    expect(guessMapping(['x', 'y', 'z', 'line'])).toEqual({ easting: 'x', northing: 'y', level: 'z', run: 'line' });
  });

  it('splits runs by a run column and joins a run starting on another as a tee', () => {
    const csv = 'run,e,n\nmain,0,0\nmain,100,0\nmain,200,0\nspur,100,0\nspur,100,60\n';
    const r = importCsv(csv, { easting: 'e', northing: 'n', run: 'run' }, 'm');
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    expect(r.project.nodes).toHaveLength(4);
    expect(analyse(r.project).byNode.get('n2')!.geometry.kind).toBe('tee');
  });

  it('reads decimal commas in a file split by semicolons, and says why a comma file cannot have them', () => {
    // The same survey as a spreadsheet writes it where the comma is the decimal mark.
    const semicolons = SURVEY.replace(/,/g, ';').replace(/(\d)\.(\d)/g, '$1,$2');
    const r = importCsv(semicolons, MAPPING, 'm', { cover: 1.2 });
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    expect(r.project.nodes.map((n) => n.groundLevel)).toEqual([52.4, 52.1, 51.35, 50.9]);
    const commas = 'E,N\n"1000,5",5000\n1060,5000\n';
    const bad = importCsv(commas, { easting: 'E', northing: 'N' }, 'm', {});
    expect(bad.ok).toBe(false);
    // a tab file from an English-language sheet: 512,345 is a thousands separator, not 512.345
    const tabs = importCsv('E\tN\n"512,345"\t5000\n"512,400"\t5000\n', { easting: 'E', northing: 'N' }, 'm', {});
    expect(tabs.ok).toBe(false);
    expect(bad.notes.map(noteText).join('\n')).toMatch(
      /expected a number, got "1000,5" \(a decimal comma, or a thousands separator/,
    );
  });

  it('refuses a grid proj4 cannot use at import, not at the export after it', () => {
    const bad = importCsv(SURVEY, MAPPING, 'm', {}, undefined, { proj4: 'garbage' });
    expect(bad.ok).toBe(false);
    expect(bad.notes.map(noteText).join('\n')).toMatch(/the grid "garbage" is not a projection proj4 can use \(.+\)/);
    // an EPSG code proj4 does not hold, and a UTM grid without its zone, are refused with what to give
    const epsg = importCsv(SURVEY, MAPPING, 'm', {}, undefined, { proj4: 'EPSG:27700' });
    expect(epsg.notes.map(noteText).join('\n')).toMatch(/give its \+proj=… definition/);
    const zoneless = importCsv(SURVEY, MAPPING, 'm', {}, undefined, { proj4: '+proj=utm +datum=WGS84' });
    expect(zoneless.ok).toBe(false);
    // UTM zone 32N on WGS 84 (EPSG:32632) is one it can
    const utm = importCsv(SURVEY, MAPPING, 'm', {}, undefined, { proj4: '+proj=utm +zone=32 +datum=WGS84 +units=m' });
    expect(utm.ok).toBe(true);
  });

  it('names the row and the column of a bad number, and a column the header lacks', () => {
    const bad = SURVEY.replace('1060.000,5045.000', '1060.000,50x45');
    const r = importCsv(bad, MAPPING, 'm');
    expect(r.ok).toBe(false);
    expect(r.notes.map(noteText)).toContain('error: row 4, column "North (m)": expected a number, got "50x45"');
    const c = importCsv(SURVEY, { ...MAPPING, level: 'Height' }, 'm');
    expect(c.ok).toBe(false);
    expect(c.notes.map(noteText).join('\n')).toMatch(/no column "Height" for the level/);
  });

  it('refuses coordinates and levels outside the project limits, naming the row and the column', () => {
    // limits.md: a plan coordinate within ±20,000 km, an elevation within ±10,000 m. A survey value
    // past them is a slip (a column in millimetres, an exponent typo), refused where the file has it
    // rather than as a field of the project the import would have made.
    const far = SURVEY.replace('1060.000,5045.000,51.35', '30000000,5045.000,51.35');
    const r = importCsv(far, MAPPING, 'm');
    expect(r.ok).toBe(false);
    const text = r.notes.map(noteText).join('\n');
    expect(text).toMatch(/^error: row 4, column "East \(m\)": 30000000 m is outside .*plan coordinate/m);
    expect(text).not.toMatch(/nodes\[/);
    const high = SURVEY.replace('51.35', '1e308');
    const h = importCsv(high, MAPPING, 'm');
    expect(h.ok).toBe(false);
    const hText = h.notes.map(noteText).join('\n');
    expect(hText).toMatch(/^error: row 4, column "RL ground": 1e\+308 m is outside .*elevation/m);
    expect(hText).not.toMatch(/loadCases|Infinity/);
    // in feet the limit is on the metres: 70,000,000 ft = 21,336 km
    const ft = importCsv('E,N\n0,0\n70000000,0\n', { easting: 'E', northing: 'N' }, 'ft');
    expect(ft.ok).toBe(false);
  });

  it('joins a tee and reports a crossing in the middle of a 42 km diagonal leg', () => {
    // Hand geometry: run A goes (0,0) → (30000,30000), on the line y = x; run B starts at
    // (15000,15000), on that line, so it is a tee there; run C from (20000,20100) to (20100,20000)
    // lies on x + y = 40100 and crosses A at (20050,20050) without a point of its own.
    const csv = [
      'E,N,run',
      '0,0,A',
      '30000,30000,A',
      '30000,30100,A',
      '15000,15000,B',
      '15000,14900,B',
      '20000,20100,C',
      '20100,20000,C',
    ].join('\n');
    const r = importCsv(csv, { easting: 'E', northing: 'N', run: 'run' }, 'm');
    if (!r.ok) throw new Error(r.notes.map(noteText).join('\n'));
    const tee = r.project.nodes.find((n) => n.x === 15000 && n.y === 15000)!;
    expect(r.project.pipes.filter((p) => p.from === tee.id || p.to === tee.id)).toHaveLength(3);
    expect(r.notes.map(noteText).join('\n')).toMatch(/cross at \(20050(\.0+)?, 20050(\.0+)?\)/);
  });
});
