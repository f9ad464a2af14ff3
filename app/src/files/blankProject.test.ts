import { describe, expect, it } from 'vitest';
import { analyse, findSize, FOOT, INCH, parseProject, PSI } from '@mainbrace/solver';
import { blankProject } from './blankProject.js';
import { defaultPipe, pipeForUnits } from '../state/defaultPipe.js';

// 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 psi = 4.4482216152605 N / 0.00064516 m² (NIST SP 811, appendix B).
describe('a new project in US units', () => {
  it('has its defaults as round US figures: 85 / 130 / 145 psi at 330 ft, 2 ft block depth, 2 in step, 20 ft lengths', () => {
    const p = blankProject('us');
    expect(p.units).toBe('us');
    expect(p.loadCases.map((c) => c.pressure / PSI)).toEqual([85, 130, 145].map((x) => expect.closeTo(x, 9)));
    expect(p.loadCases.every((c) => Math.abs(c.datumElevation! / FOOT - 330) < 1e-9)).toBe(true);
    expect(p.design.blockDepth / FOOT).toBeCloseTo(2, 12);
    expect(p.design.dimensionStep / INCH).toBeCloseTo(2, 12);
    expect(p.design.layingLength / FOOT).toBeCloseTo(20, 12);
    expect(parseProject(p).ok).toBe(true);
    expect(analyse(p).fittings).toHaveLength(0);
  });

  it('keeps the SI defaults in SI', () => {
    const p = blankProject('si');
    expect(p.loadCases.map((c) => c.pressure)).toEqual([600e3, 900e3, 1000e3]);
    expect(p.design).toMatchObject({ blockDepth: 0.6, dimensionStep: 0.05, layingLength: 6 });
  });
});

describe('the pipe new runs are drawn with', () => {
  it('is 8-in AWWA C151 class 350 in US units (OD 9.05 in) and DN 200 EN 545 in SI (OD 222 mm)', () => {
    expect(defaultPipe('us').outsideDiameter / INCH).toBeCloseTo(9.05, 9);
    expect(defaultPipe('si').outsideDiameter).toBeCloseTo(0.222, 9);
  });

  it('follows a switch of units while it is the other system’s default, and stays when the user picked it', () => {
    expect(pipeForUnits(defaultPipe('si'), 'us')).toEqual(defaultPipe('us'));
    expect(pipeForUnits(defaultPipe('us'), 'si')).toEqual(defaultPipe('si'));
    const picked = findSize('di-en545', 'DN300')!;
    const own = {
      outsideDiameter: picked.outsideDiameter,
      insideDiameter: picked.insideDiameter,
      material: 'ductile-iron' as const,
      series: 'di-en545',
      nominal: 'DN300',
    };
    expect(pipeForUnits(own, 'us')).toBe(own);
  });
});
