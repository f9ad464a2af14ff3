import { columnNumber } from '../src/schedule/columnUnits.js';
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { analyseProject } from '../src/analysis/analyse.js';
import { parseProject } from '../src/model/parseProject.js';
import type { Project } from '../src/model/projectSchema.js';
import { scheduleOf } from '../src/schedule/scheduleOf.js';
import { scheduleJson } from '../src/schedule/scheduleJson.js';
import { scheduleView } from '../src/schedule/scheduleView.js';
import { scheduleCsv } from '../src/schedule/scheduleCsv.js';
import { scheduleTable } from '../src/schedule/scheduleTable.js';
import { TABLE_COLUMNS } from '../src/schedule/scheduleColumns.js';
import { formatDimension } from '../src/units/format.js';
import { FOOT, INCH, type UnitSystem } from '../src/units/conversions.js';
import { PSF } from '../src/units/conversions.js';
import { route } from './projectBuilder.js';
import { randomRoute } from './randomRoutes.js';
import { WORDING } from '../src/diagnostics/codeMeanings.js';

const SEED = 20261203;
const demoPath = fileURLToPath(new URL('../../../public/demo/larkspur-rise.json', import.meta.url));
const demo = (): Project => {
  const r = parseProject(JSON.parse(readFileSync(demoPath, 'utf8')));
  if (!r.ok) throw new Error('demo does not parse');
  return r.project;
};

/** A printed built dimension back to metres: "0.75 m", "2 ft 4 in", "10 in", "3 ft". */
function metres(text: string): number {
  const si = /^(\d+(?:\.\d+)?) m$/.exec(text);
  if (si) return Number(si[1]);
  const us = /^(?:(\d+) ft)? ?(?:(\d+) in)?$/.exec(text);
  if (!us || (!us[1] && !us[2])) throw new Error(`not a built dimension: "${text}"`);
  return Number(us[1] ?? 0) * FOOT + Number(us[2] ?? 0) * INCH;
}

/** Computed sizes may be a floating-point hair under a whole step; "at least" allows that hair only. */
const HAIR = 1e-9;

describe('results as data: a design that does not depend on the display units', () => {
  it('gives the same JSON schedule for a project in SI and in US units (the demo)', () => {
    const si = demo();
    const us: Project = { ...si, units: 'us' };
    expect(scheduleJson(scheduleOf(analyseProject(us)))).toBe(scheduleJson(scheduleOf(analyseProject(si))));
  });

  it('prints every block, pad and anchor dimension so that it gives at least the computed area and volume, in both unit systems (random routes)', () => {
    fc.assert(
      fc.property(
        randomRoute(),
        fc.constantFrom(1500, 2000, 3000, 9000),
        fc.double({ min: 0.3, max: 2.5, noNaN: true }),
        (r, bearingPsf, cover) => {
          const p = route({
            pressure: 1.2e6,
            soils: [{ id: 'sand', bearing: bearingPsf * PSF }],
            nodes: r.nodes.map((n) => ({ ...n, cover })),
            pipes: r.pipes,
          });
          for (const units of ['si', 'us'] as UnitSystem[]) {
            const shown = (m: number) => metres(formatDimension(m, units));
            for (const f of scheduleOf(analyseProject(p)).fittings) {
              const x = f.restraint;
              for (const b of [x.block, x.reverseBlock]) {
                if (!b) continue;
                expect(shown(b.faceWidth) * shown(b.faceHeight)).toBeGreaterThanOrEqual(b.bearingArea * (1 - HAIR));
                expect(shown(b.faceWidth)).toBeGreaterThanOrEqual(b.faceWidth * (1 - HAIR));
                expect(shown(b.faceHeight)).toBeGreaterThanOrEqual(b.faceHeight * (1 - HAIR));
                expect(shown(b.faceWidth) * shown(b.faceHeight) * shown(b.depth)).toBeGreaterThanOrEqual(
                  b.concreteVolume * (1 - HAIR),
                );
              }
              if (x.anchor)
                expect(shown(x.anchor.side) ** 3).toBeGreaterThanOrEqual(x.anchor.concreteVolume * (1 - HAIR));
              if (x.trenchBottom) {
                const t = x.trenchBottom;
                expect(shown(t.width) * shown(t.length)).toBeGreaterThanOrEqual(t.bearingArea * (1 - HAIR));
              }
            }
          }
        },
      ),
      { seed: SEED, numRuns: 60 },
    );
  });

  it('writes no float noise into the JSON schedule (no 0.7000000000000001)', () => {
    const text = scheduleJson(scheduleOf(analyseProject(demo())));
    expect(text).not.toMatch(/\d\.\d*0000000\d/);
    expect(text).not.toMatch(/\d\.\d*9999999\d/);
  });
});

describe('one schedule view: the CLI table and the CSV show the same cell texts, in both unit systems', () => {
  for (const units of ['si', 'us'] as UnitSystem[]) {
    it(`agrees cell for cell on the demo in ${units.toUpperCase()}`, () => {
      const a = analyseProject(demo());
      const view = scheduleView(a, units, WORDING);
      // CSV: every column, every row, in the view's order.
      const csvRows = scheduleCsv(view).trimEnd().split('\r\n');
      expect(csvRows[0]!.split(',')[1]).toBe(view.columns[1]!.heading);
      view.rows.forEach((r, i) => {
        const line = csvRows[i + 1]!;
        for (const c of view.columns) {
          const cell = r.cells[c.id]!;
          if (cell && !/[",\r\n]/.test(cell)) expect(line.split(',')).toContain(cell);
        }
      });
      // after the rows, a blank record and the cautions every result carries
      expect(csvRows[view.rows.length + 1]).toBe('');
      expect(csvRows.slice(view.rows.length + 2).join('\n')).toMatch(/licensed[\s\S]*undisturbed soil[\s\S]*cure/);
      // Table: each row carries the view's cells of the compact columns, in crew order.
      const table = scheduleTable(view, a.project.name).split('\n');
      view.rows.forEach((r) => {
        const line = table.find((l) => l.startsWith(`${r.cells.mark} `))!;
        for (const id of TABLE_COLUMNS) if (r.cells[id]) expect(line).toContain(r.cells[id]);
      });
      // Crew order: by run, then chainage along it.
      const order = view.rows.map((r) => [r.fitting.run, r.fitting.chainage] as const);
      for (let i = 1; i < order.length; i++) {
        const [ra, ca] = order[i - 1]!;
        const [rb, cb] = order[i]!;
        expect(ra < rb || (ra === rb && ca <= cb) || ra.length < rb.length).toBe(true);
      }
    });
  }
});

describe('the schedule view builds its rows when read', () => {
  it('gives the same rows read in any order, and a concrete total equal to the sum of the concrete column (demo, SI and US)', () => {
    for (const units of ['si', 'us'] as UnitSystem[]) {
      const fresh = () => scheduleView(analyseProject(demo()), units, WORDING);
      const forward = fresh().rows.map((r) => ({ fitting: r.fitting, cells: r.cells, values: r.values }));
      const backwardView = fresh();
      const backward = [...backwardView.rows]
        .reverse()
        .map((r) => ({ fitting: r.fitting, cells: r.cells, values: r.values }))
        .reverse();
      expect(backward).toEqual(forward);
      // the total prints as the sum of the column as it prints
      const sum = backwardView.rows.reduce((t, r) => t + Number(r.cells.concrete ?? 0), 0);
      expect(Number(columnNumber(backwardView.concrete, 'volume', units))).toBeCloseTo(sum, 9);
      expect(backwardView.concrete).toBeGreaterThan(0);
    }
  });
});
