import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseProjectText } from '../model/parseProject.js';
import { analyse } from '../analysis/analyse.js';
import { scheduleOf } from './scheduleOf.js';
import { takeOff, takeOffRows } from './quantities.js';
import { takeOffCsv } from './quantitiesText.js';
import { anchorBox, padThickness } from './settingOut.js';
import { ceilTo } from '../units/format.js';
import { scheduleConcrete, scheduleView } from './scheduleView.js';
import { WORDING } from '../diagnostics/codeMeanings.js';
import { routeInput, validProject } from '../../test/projectBuilder.js';
import { INCH } from '../units/conversions.js';

const demoText = readFileSync(new URL('../../../../public/demo/larkspur-rise.json', import.meta.url), 'utf8');
const parsed = parseProjectText(demoText);
if (!parsed.ok) throw new Error('demo does not parse');
const project = parsed.project;
const fittings = scheduleOf(analyse(project)).fittings;

describe('quantities take-off', () => {
  const t = takeOff(fittings, project, 'si');

  it('sums each element from the rows it comes from (invariant: the take-off adds what the schedule sizes)', () => {
    // each piece as a row prints it: m³ rounded up to 0.01
    const shown = (v: number) => ceilTo(v, 2);
    const blocks = fittings.reduce((v, f) => v + shown(f.restraint.block?.concreteVolume ?? 0), 0);
    expect(t.concrete.find((l) => l.element === 'block')!.volume).toBeCloseTo(blocks, 12);
    const anchors = fittings.reduce((v, f) => {
      if (!f.restraint.anchor) return v;
      const b = anchorBox(f.restraint.anchor);
      return v + shown(b.length * b.width * b.height);
    }, 0);
    expect(t.concrete.find((l) => l.element === 'anchor')?.volume ?? 0).toBeCloseTo(anchors, 12);
    const pads = fittings.reduce((v, f) => {
      const pad = f.restraint.trenchBottom;
      return pad ? v + shown(pad.width * pad.length * padThickness(0.05)) : v;
    }, 0);
    expect(t.concrete.find((l) => l.element === 'pad')?.volume ?? 0).toBeCloseTo(pads, 12);
    expect(t.concreteNet).toBeCloseTo(
      t.concrete.reduce((v, l) => v + l.volume, 0),
      12,
    );
  });

  it('prints lines that add up: the elements to the net, the net and the waste to the total (SI and US)', () => {
    for (const units of ['si', 'us'] as const) {
      const rows = takeOffRows(takeOff(fittings, project, units), units).filter((r) => r.section === 'Concrete');
      const q = (item: string) => Number(rows.find((r) => r.item.startsWith(item))!.quantity);
      const elements = rows.filter((r) => !/^(Net|Waste|Total)/.test(r.item)).map((r) => Number(r.quantity));
      expect(elements.length).toBeGreaterThan(1);
      expect(q('Net')).toBeCloseTo(
        elements.reduce((a, b) => a + b, 0),
        9,
      );
      expect(q('Total to order')).toBeCloseTo(q('Net') + q('Waste'), 9);
    }
  });

  it('agrees with the schedule: its concrete total is the take-off’s net concrete, pads included (SI and US)', () => {
    // Invariant: both add the pieces as printed. A fitting with a block and an opposite block (A10) rounded
    // as one row would print 0.01 more or less than its two pieces listed apart; a sag bend's trench-bottom
    // pad is concrete poured like any block, so its row counts it.
    const a = analyse(project);
    for (const units of ['si', 'us'] as const) {
      const t = takeOff(fittings, project, units);
      expect(scheduleView(a, units, WORDING).concrete).toBeCloseTo(t.concreteNet, 12);
      expect(scheduleConcrete(a, units)).toBe(scheduleView(a, units, WORDING).concrete);
    }
    // By hand from the take-off's lines (m³, each piece rounded up to 0.01): 3.17 + 0.60 + 3.69 + 0.18.
    expect(scheduleView(a, 'si', WORDING).concrete).toBeCloseTo(7.64, 12);
    // Each row's concrete is its own pieces: the sag bends' rows carry block and pad.
    const view = scheduleView(a, 'si', WORDING);
    const sags = view.rows.filter((r) => r.fitting.restraint.trenchBottom);
    expect(sags.length).toBeGreaterThan(0);
    for (const r of sags) {
      const b = r.fitting.restraint.block;
      const t = r.fitting.restraint.trenchBottom!;
      // pad thickness 0.15 m (register pad.thickness), each piece rounded up to 0.01 m³
      const byHand = (b ? ceilTo(b.concreteVolume, 2) : 0) + ceilTo(t.width * t.length * 0.15, 2);
      expect(r.values.concrete).toBeCloseTo(byHand, 12);
    }
  });

  it('adds the waste allowance: 10 % by default, the project’s own when it states one', () => {
    expect(t.waste).toBe(0.1);
    expect(t.concreteOrdered).toBeCloseTo(t.concreteNet * 1.1, 12);
    const five = takeOff(fittings, { ...project, design: { ...project.design, concreteWaste: 0.05 } }, 'si');
    expect(five.concreteOrdered).toBeCloseTo(t.concreteNet * 1.05, 12);
  });

  it('counts every fitting once, by kind, angle and size', () => {
    expect(t.fittings.reduce((n, l) => n + l.count, 0)).toBe(fittings.length);
    expect(new Set(t.fittings.flatMap((l) => l.marks)).size).toBe(fittings.length);
  });

  it('counts restrained joints by size: where no zones overlap (the demo), the sum of every leg’s joints', () => {
    // Zones that overlap count each joint once: restrainedStretches.test.ts.
    const legs = fittings.flatMap((f) => f.restraint.restrainedLegs);
    expect(t.joints.reduce((n, l) => n + l.joints, 0)).toBe(legs.reduce((n, l) => n + l.joints, 0));
    expect(legs.length).toBeGreaterThan(0);
    expect(t.joints[0]!.size).toMatch(/^DN\d+$/); // named by the project's nominal size
  });

  it('writes one CSV line per take-off line, the unit in its own column', () => {
    const rows = takeOffRows(t, 'si');
    const csv = takeOffCsv(rows).trimEnd().split('\r\n');
    expect(csv[0]).toBe('Section,Item,Size,Count,Quantity,Unit,Fittings');
    // the table, a blank record, then the cautions every result carries
    const blank = csv.indexOf('');
    expect(blank).toBe(rows.length + 1);
    const cautions = csv.slice(blank + 1).join('\n');
    expect(csv.slice(blank + 1).every((l) => /^"?Caution: /.test(l))).toBe(true);
    for (const needed of [
      /design aid/,
      /licensed/,
      /utility’s standards/,
      /undisturbed soil/,
      /cure before pressure testing/,
    ])
      expect(cautions).toMatch(needed);
    expect(rows.find((r) => r.item === 'Total to order')!.quantity).toBe(
      (Math.ceil(t.concreteOrdered * 100 - 1e-9) / 100).toFixed(2),
    );
  });
});

describe('take-off sizes of a US route', () => {
  it('names a bare nominal size in inches: a 12 × 8 reducer, as AWWA C151 sizes are named', () => {
    // 12-in and 8-in ductile iron (AWWA C151 ODs 13.20 and 9.05 in) meeting at a reducer, capped at both ends
    const project = validProject(
      routeInput({
        units: 'us',
        nodes: [
          { id: 'a', x: 0, y: 0 },
          { id: 'r', x: 30, y: 0 },
          { id: 'b', x: 60, y: 0 },
        ],
        pipes: [
          { from: 'a', to: 'r', od: 13.2 * INCH, nominal: '12' },
          { from: 'r', to: 'b', od: 9.05 * INCH, nominal: '8' },
        ],
      }),
    );
    const lines = takeOff(scheduleOf(analyse(project)).fittings, project, 'us').fittings;
    expect(lines.find((l) => l.fitting === 'Reducer')!.size).toBe('12 in × 8 in');
    expect(lines.every((l) => /^\d+ in( × \d+ in)?$/.test(l.size))).toBe(true);
  });
});
