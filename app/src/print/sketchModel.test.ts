import { describe, it, expect } from 'vitest';
import { analyse, formatDimension, scheduleCsv, scheduleOf, settingOut, type UnitSystem } from '@mainbrace/solver';
import { sketchOf } from './sketchModel.js';
import { csvRecords, demoProject } from '../testFixtures.js';
import { scheduleViewOf } from '../state/scheduleViewOf.js';

const parsed = { project: demoProject() };
const analysis = analyse(parsed.project);
const rows = scheduleOf(analysis).fittings;
const dims = (s: ReturnType<typeof sketchOf>) =>
  [...s.plan, ...s.section].flatMap((x) => (x.t === 'dim' ? [x.text] : []));

describe('restraint sketches are drawn from the schedule row', () => {
  it('dimensions every block with its face width, face height and thickness, as the schedule rounds them', () => {
    for (const f of rows.filter((r) => r.restraint.block)) {
      const b = f.restraint.block!;
      const d = dims(sketchOf(f, analysis, 'si'));
      for (const v of [b.faceWidth, b.faceHeight, b.depth]) expect(d, f.mark).toContain(formatDimension(v, 'si'));
    }
  });

  it('draws the plan to one scale: the block’s drawn face is its width times the plan scale', () => {
    const f = rows.find((r) => r.restraint.block && !r.restraint.reverseBlock && !r.restraint.trenchBottom)!;
    const s = sketchOf(f, analysis, 'si');
    const poly = s.plan.find((x) => x.t === 'poly' && x.role === 'block')!;
    if (poly.t !== 'poly') throw new Error('no block');
    const [a, b, c, d] = poly.points as [number, number][];
    const thickness = Math.hypot(b![0] - a![0], b![1] - a![1]);
    const width = Math.hypot(c![0] - b![0], c![1] - b![1]);
    // Drawn width / drawn thickness = face width / thickness (same scale both ways).
    expect(width / thickness).toBeCloseTo(f.restraint.block!.faceWidth / f.restraint.block!.depth, 9);
    expect(Math.hypot(d![0] - a![0], d![1] - a![1])).toBeCloseTo(width, 9);
  });

  it('gives an anchor its three dimensions and its depth to the base in words', () => {
    const f = rows.find((r) => r.restraint.anchor)!;
    const s = sketchOf(f, analysis, 'si');
    const a = settingOut(f, parsed.project.design.dimensionStep).anchor!;
    const line = s.lines.find((l) => l.startsWith('Anchor'))!;
    expect(line).toContain(`${formatDimension(a.height, 'si')} H`);
    expect(line).toContain(`${formatDimension(a.length, 'si')} L × ${formatDimension(a.width, 'si')} W`);
    expect(line).toContain('anchor straps to the fitting');
  });

  it('names each restrained leg by the mark it runs toward, with its joints', () => {
    const f = rows.find((r) => r.restraint.restrainedLegs.length > 0)!;
    const s = sketchOf(f, analysis, 'si');
    expect(s.jointsOnly).toBe(true);
    for (const l of f.restraint.restrainedLegs)
      expect(s.lines.join(' ')).toContain(`toward ${l.toward} (${l.joints} joints)`);
    // One tick per joint to restrain on the plan.
    const ticks = s.plan.filter((x) => x.t === 'line' && x.role === 'joint').length;
    expect(ticks).toBe(f.restraint.restrainedLegs.reduce((n, l) => n + l.joints, 0));
  });

  it('sends a reducing bend that only dips to the shoulder, and a bend in plan to its outside', () => {
    // A DN300 × DN200 reducer at a sag, straight in plan: the reducer's thrust p·(A₁ − A₂) runs along the
    // pipe (statics of a reducer), so its block stands at the shoulder, not on "the outside of the bend".
    const demo = demoProject();
    const plain = demo.nodes.find((n) => n.id === 'n2')!; // a node with the parser's defaults, no end
    const pipe = (nominal: string) => demo.pipes.find((p) => p.nominal === nominal)!;
    /** The words at node b of a DN300 pipe a → b and a smaller one b → c, nodes at [x, y, elevation]. */
    const wordsAtB = (smaller: string, ...at: [number, number, number][]) => {
      const [a, b, c] = at.map(([x, y, elevation], i) => ({ ...plain, id: 'abc'[i]!, x, y, elevation }));
      const project = {
        ...demo,
        nodes: [a!, b!, c!],
        pipes: [
          { ...pipe('DN300'), id: 'p1', from: 'a', to: 'b' },
          { ...pipe(smaller), id: 'p2', from: 'b', to: 'c' },
        ],
      };
      const analysed = analyse(project);
      const f = scheduleOf(analysed).fittings.find((x) => x.node === 'b')!;
      expect(f.kind).toBe('reducing-bend');
      expect(f.restraint.block).toBeTruthy();
      return sketchOf(f, analysed, 'si').lines.join(' ');
    };
    expect(wordsAtB('DN200', [0, 0, 104], [60, 0, 102.8], [120, 0, 103.9])).toContain(
      'against the shoulder, toward the smaller pipe',
    );
    // Turned 90° in plan, DN300 to DN150: the thrust p·(A₁·n₁ + A₂·n₂) lies near the large pipe's line,
    // across the small one, so the block is not "toward the smaller pipe".
    expect(wordsAtB('DN150', [0, 0, 103], [60, 0, 103], [60, 60, 103])).toContain('on the outside of the bend');
    for (const f of rows.filter((r) => r.kind === 'bend' && r.restraint.block && (r.horizontalDeflection ?? 0) > 10))
      expect(sketchOf(f, analysis, 'si').lines.join(' '), f.mark).toContain('on the outside of the bend');
  });

  it('draws an error-level restraint as outlines only, with the not-adequate line first', () => {
    const f = rows.find((r) => r.restraint.block)!;
    const failing = {
      ...f,
      diagnostics: [{ code: 'soil.no-bearing', severity: 'error', subject: {}, values: {} }],
    } as unknown as typeof f;
    const s = sketchOf(failing, analysis, 'si');
    expect(s.notAdequate).toBe(true);
    expect(s.lines[0]).toMatch(/^NOT ADEQUATE/);
    expect([...s.plan, ...s.section].some((x) => x.t === 'poly' && x.role === 'block')).toBe(false);
  });
});

describe('the crew sheet and the CSV give each depth below ground as the same text', () => {
  for (const units of ['si', 'us'] as UnitSystem[]) {
    it(`for every block and anchor of the demo in ${units.toUpperCase()}`, () => {
      const [header, ...records] = csvRecords(scheduleCsv(scheduleViewOf(analysis, units)));
      const at = (record: string[], start: string) => record[header!.findIndex((h) => h.startsWith(start))]!;
      // The CSV has the unit in its heading; the sheet writes it after the number in SI.
      const withUnit = (cell: string) => (units === 'si' ? `${cell} m` : cell);
      let checked = 0;
      for (const f of rows) {
        const record = records.find((r) => r[0] === f.mark)!;
        const words = sketchOf(f, analysis, units).lines.join(' ');
        const dimsText = dims(sketchOf(f, analysis, units));
        if (f.restraint.block) {
          const [top, base] = [
            withUnit(at(record, 'Block top below ground')),
            withUnit(at(record, 'Depth to block base')),
          ];
          expect(words, f.mark).toContain(`top ${top}, base ${base} below ground`);
          expect(dimsText, f.mark).toEqual(expect.arrayContaining([top, base]));
          checked++;
        }
        if (f.restraint.anchor) {
          const base = withUnit(at(record, 'Depth to anchor base'));
          expect(words, f.mark).toContain(`base ${base} below ground`);
          checked++;
        }
      }
      expect(checked).toBeGreaterThan(5);
    });
  }

  it('prints a block’s base into the ground and its top as that base less the printed height', () => {
    // By hand from the demo's A2 (settingOut): top 1.4130 m, base 1.9130 m = 75.31 in below ground, face
    // 0.500 m = 19.69 in high. Base away from the ground to the inch: 76 in = 6 ft 4 in; face up: 20 in;
    // top 76 − 20 = 56 in = 4 ft 8 in, so the three printed figures add up. In SI to the centimetre:
    // base 1.92 m, face 0.50 m, top 1.42 m.
    const f = rows.find((r) => r.mark === 'A2')!;
    const so = settingOut(f, parsed.project.design.dimensionStep).block!;
    expect(so.topDepth).toBeCloseTo(1.413, 3);
    expect(so.baseDepth).toBeCloseTo(1.913, 3);
    expect(so.faceHeight).toBeCloseTo(0.5, 3);
    expect(sketchOf(f, analysis, 'us').lines.join(' ')).toContain('top 4 ft 8 in, base 6 ft 4 in below ground');
    expect(sketchOf(f, analysis, 'si').lines.join(' ')).toContain('top 1.42 m, base 1.92 m below ground');
  });
});
