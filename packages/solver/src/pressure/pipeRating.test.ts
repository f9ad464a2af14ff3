import { describe, it, expect } from 'vitest';
import { route } from '../../test/projectBuilder.js';
import { analyse } from '../analysis/analyse.js';
import { findSize } from '../catalog/catalog.js';
import { PSI } from '../units/conversions.js';
import { STANDARD_GRAVITY } from '../units/quantities.js';
import { pipeRatingChecks } from './pipeRating.js';
import type { ProjectInput } from '../model/projectSchema.js';

const dr18 = findSize('pvc-c900-dr18', '8')!;

/** Two pipes of 8-in C900 DR 18 falling 20 m from n1 to n3, with the given cases. */
function pvcRoute(cases: ProjectInput['loadCases']) {
  return route({
    cases,
    nodes: [
      { id: 'n1', x: 0, y: 0, z: 120 },
      { id: 'n2', x: 50, y: 0, z: 110 },
      { id: 'n3', x: 50, y: 50, z: 100 },
    ],
    pipes: [
      {
        from: 'n1',
        to: 'n2',
        od: dr18.outsideDiameter,
        id_: dr18.insideDiameter,
        material: 'pvc',
        series: 'pvc-c900-dr18',
        nominal: '8',
      },
      {
        from: 'n2',
        to: 'n3',
        od: dr18.outsideDiameter,
        id_: dr18.insideDiameter,
        material: 'pvc',
        series: 'pvc-c900-dr18',
        nominal: '8',
      },
    ],
  });
}

describe('pipes checked against their pressure rating', () => {
  it('reports 3,500 kPa on C900 DR 18 as an error on every pipe, whatever the case kind', () => {
    // docs/check-values.md CV-27: DR 18 is PC 235 psi = 1,620 kPa working, 376 psi = 2,592 kPa with surge or test
    for (const kind of ['working', 'surge', 'test', 'other'] as const) {
      const found = pipeRatingChecks(pvcRoute([{ id: 'c', kind, pressure: 3.5e6 }]));
      expect(found.map((d) => d.subject.pipe)).toEqual(['p1', 'p2']);
      expect(found.every((d) => d.severity === 'error')).toBe(true);
      expect(found[0]!.code).toBe(
        kind === 'working'
          ? 'pipe.over-working-rating'
          : kind === 'test'
            ? 'pipe.over-test-rating'
            : 'pipe.over-surge-rating',
      );
    }
  });

  it('holds a working case to the class and a surge case to 1.6 × the class, at the pipe’s lowest end', () => {
    // 1,500 kPa at the 120 m datum; p2's low end is 20 m lower: 1,500 + 998.2·9.80665·20/1000 = 1,695.8 kPa,
    // above the 1,620.3 kPa class (235 psi), while p1's low end (1,597.9 kPa) is below it.
    const project = pvcRoute([
      { id: 'w', kind: 'working', pressure: 1.5e6, datumElevation: 120 },
      { id: 's', kind: 'surge', pressure: 1.5e6, datumElevation: 120 },
    ]);
    const found = pipeRatingChecks(project);
    expect(found).toHaveLength(1);
    expect(found[0]!.subject).toEqual({ pipe: 'p2', case: 'w' });
    const expected = 1.5e6 + 998.2 * STANDARD_GRAVITY * 20;
    expect(found[0]!.values.pressure).toBeCloseTo(expected, 3);
    expect(found[0]!.values.limit).toBeCloseTo(235 * PSI, 6);
  });

  it('passes a test at 1.5 × a 150 psi working pressure on DR 18 (225 psi ≤ 376 psi)', () => {
    expect(pipeRatingChecks(pvcRoute([{ id: 't', kind: 'test', pressure: 225 * PSI }]))).toEqual([]);
  });

  it('leaves custom diameters unchecked, having no rating', () => {
    const p = pvcRoute([{ id: 'c', kind: 'working', pressure: 3.5e6 }]);
    const custom = { ...p, pipes: p.pipes.map((x) => ({ ...x, series: undefined, nominal: undefined })) };
    expect(pipeRatingChecks(custom)).toEqual([]);
  });

  it('carries the finding into the analysis, so the schedule, the CLI and the app show it', () => {
    const a = analyse(pvcRoute([{ id: 'c', kind: 'working', pressure: 3.5e6 }]));
    expect(a.diagnostics.filter((d) => d.code === 'pipe.over-working-rating')).toHaveLength(2);
  });
});
