import { describe, it, expect } from 'vitest';
import { expectClose } from '../../test/tolerance.js';
import { route } from '../../test/projectBuilder.js';
import { findSize } from '../catalog/catalog.js';
import { FOOT, INCH, PSI } from '../units/conversions.js';
import { REGISTER } from '../provenance/register.js';
import { joukowsky, pipeWaveSpeed, supportFactor, surgeEstimate, waveSpeed, PIPE_ELASTICITY } from './surge.js';

const FT_PER_S = FOOT;

describe('Joukowsky and Korteweg', () => {
  it('gives ΔP = ρ·a·Δv = 998 × 1,200 × 1 = 1.198 MPa (docs/check-values.md CV-23)', () => {
    expectClose(joukowsky(998, 1200, 1), 1.1976e6, 1e-12);
    expectClose(joukowsky(998, 1200, -1), 1.1976e6, 1e-12); // a drop or a rise of the same size
  });

  it('reproduces the ductile-iron wave speeds of Moser, Buried Pipe Design, Table 4.1 within 1 %', () => {
    // docs/check-values.md CV-32. Table 4.1 (read): 12-in ductile iron, thickness class 50 / 52 / 56:
    // 3,919 / 4,038 / 4,205 ft/s. The class walls 0.31 / 0.37 / 0.49 in are AWWA C151's thickness-class
    // table (from memory); OD 13.20 in; E = 24 × 10⁶ psi, water K = 2.19 GPa, ρ = 998.2, c₁ = 1.
    for (const [wall, table] of [
      [0.31, 3919],
      [0.37, 4038],
      [0.49, 4205],
    ] as const) {
      const a = waveSpeed({
        insideDiameter: (13.2 - 2 * wall) * INCH,
        wall: wall * INCH,
        modulus: 24e6 * PSI,
        density: 998.2,
      });
      expectClose(a / FT_PER_S, table, 0.01);
    }
  });

  it('reproduces the PVC and HDPE surge per 1 ft/s of the thermoplastic table within 2 % (from memory)', () => {
    // docs/check-values.md CV-33 (register: check.thermoplastic-surge-table, unverified): K = 300,000 psi,
    // D/e = DR − 2 (inside diameter over wall), c₁ = 1. The table's 4,660 ft/s for √(K/ρ) is 1.3 % below
    // √(K/ρ) at ρ = 998.2, hence the 2 % tolerance.
    const table = REGISTER['check.thermoplastic-surge-table'].value;
    for (const [key, modulusPsi, dr] of [
      ['pvc.dr18', 400_000, 18],
      ['pvc.dr25', 400_000, 25],
      ['hdpe.dr11', 115_000, 11],
      ['hdpe.dr17', 115_000, 17],
    ] as const) {
      const a = waveSpeed({
        insideDiameter: dr - 2,
        wall: 1,
        modulus: modulusPsi * PSI,
        density: 998.2,
        bulkModulus: 300_000 * PSI,
      });
      expectClose(joukowsky(998.2, a, FT_PER_S) / PSI, table[key], 0.02);
    }
  });

  it('is slower in a more flexible or thinner pipe, and never faster than sound in open water', () => {
    const base = { insideDiameter: 0.3, wall: 0.01, modulus: 165e9, density: 998.2 };
    const open = Math.sqrt(REGISTER['surge.water-bulk-modulus'].value / 998.2); // 1,481 m/s
    expect(waveSpeed(base)).toBeLessThan(open);
    expect(waveSpeed({ ...base, modulus: 3e9 })).toBeLessThan(waveSpeed(base));
    expect(waveSpeed({ ...base, wall: 0.005 })).toBeLessThan(waveSpeed(base));
    expectClose(waveSpeed({ ...base, modulus: 1e15 }), open, 1e-4);
  });

  it('anchors fused PE and welded steel throughout (c₁ = 1 − ν²) and lets gasketed pipe move (c₁ = 1)', () => {
    expect(supportFactor('ductile-iron', 0.28)).toBe(1);
    expect(supportFactor('pvc', 0.38)).toBe(1);
    expectClose(supportFactor('hdpe', 0.45), 1 - 0.45 ** 2, 1e-12);
    expect(PIPE_ELASTICITY.other).toBeUndefined();
  });
});

describe('the surge estimate of a route', () => {
  const di = findSize('di-en545', 'DN300')!;
  const pvc = findSize('pvc-c900-dr18', '8')!;
  const project = (flow: number) =>
    route({
      cases: [
        { id: 'w', kind: 'working', pressure: 600e3 },
        { id: 't', kind: 'test', pressure: 1e6, flowFactor: 0 },
      ],
      nodes: [
        { id: 'n1', x: 0, y: 0 },
        { id: 'n2', x: 100, y: 0 },
        { id: 'n3', x: 100, y: 100 },
        { id: 'n4', x: 200, y: 100 },
      ],
      pipes: [
        { from: 'n1', to: 'n2', od: di.outsideDiameter, id_: di.insideDiameter, flow },
        { from: 'n2', to: 'n3', od: pvc.outsideDiameter, id_: pvc.insideDiameter, flow: flow / 2, material: 'pvc' },
        { from: 'n3', to: 'n4', od: 0.2, id_: 0.18, flow: flow / 2, material: 'other' },
      ],
    });

  it('stops each pipe’s working flow and adds the largest rise to the working pressure', () => {
    const p = project(0.1);
    const e = surgeEstimate(p)!;
    // hand: DN300 ID = 326 − 2 × 4.6 = 316.8 mm, A = 0.078824 m², v = 0.1/0.078824 = 1.2686 m/s
    const v = 0.1 / ((Math.PI * 0.3168 ** 2) / 4);
    const first = e.pipes.find((x) => x.pipe === 'p1')!;
    expectClose(first.velocityChange, v, 1e-9);
    expectClose(first.rise, 998.2 * pipeWaveSpeed(p.pipes[0]!, 998.2)! * v, 1e-12);
    expect(e.pipes.map((x) => x.rise)).toEqual([...e.pipes.map((x) => x.rise)].sort((a, b) => b - a));
    expect(e.largest).toBe(e.pipes[0]);
    expectClose(e.suggestedPressure, 600e3 + e.largest.rise, 1e-12);
    expect(e.workingCase).toBe('w');
    expect(e.unknownMaterial).toEqual(['p3']);
  });

  it('takes a stated velocity change for every pipe instead, and the stiffer pipe then gives the larger rise', () => {
    const e = surgeEstimate(project(0.1), 0.6)!;
    expect(e.pipes.every((x) => x.velocityChange === 0.6)).toBe(true);
    expect(e.largest.pipe).toBe('p1'); // ductile iron, about 1,070 m/s (thin C40 wall) against about 400 m/s for PVC DR 18
    expect(e.largest.waveSpeed).toBeGreaterThan(1000);
    expect(e.pipes.find((x) => x.pipe === 'p2')!.waveSpeed).toBeLessThan(500);
  });

  it('suggests nothing when no pipe carries flow and no change is given', () => {
    expect(surgeEstimate(project(0))).toBeNull();
  });
});
