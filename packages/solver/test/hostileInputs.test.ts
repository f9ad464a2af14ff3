import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { parseProject } from '../src/model/parseProject.js';
import { problemText } from '../src/model/problems.js';
import { analyseProject } from '../src/analysis/analyse.js';
import { scheduleOf } from '../src/schedule/scheduleOf.js';
import { scheduleJson } from '../src/schedule/scheduleJson.js';
import { LIMITS } from '../src/model/limits.js';

/** A small valid file: a 90° bend between two caps. */
function file(): Record<string, unknown> & { nodes: Record<string, unknown>[]; pipes: Record<string, unknown>[] } {
  return {
    format: 'mainbrace-project',
    version: 1,
    loadCases: [{ id: 'test', pressure: 1.0e6 }],
    soils: [{ id: 'sand', bearing: 150e3 }],
    nodes: [
      { id: 'a', x: 0, y: 0, elevation: 100 },
      { id: 'b', x: 30, y: 0, elevation: 100 },
      { id: 'c', x: 30, y: 30, elevation: 100 },
    ],
    pipes: [
      { id: 'p1', from: 'a', to: 'b', outsideDiameter: 0.326, insideDiameter: 0.3 },
      { id: 'p2', from: 'b', to: 'c', outsideDiameter: 0.326, insideDiameter: 0.3 },
    ],
  };
}

const refusal = (f: unknown) => {
  const r = parseProject(f);
  return r.ok ? [] : r.problems.map(problemText);
};

describe('unit slips and impossible values are refused naming the field, or warned of', () => {
  it('warns of a case pressure of 950 Pa (kPa typed as Pa) instead of sizing a small block silently', () => {
    const f = file();
    f.loadCases = [{ id: 'test', pressure: 950 }];
    const r = parseProject(f);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const s = scheduleOf(analyseProject(r.project));
    const d = s.diagnostics.find((x) => x.code === 'input.pressure-unusual');
    expect(d?.subject.field).toBe('loadCases[0].pressure');
    expect(d?.values.value).toBe(950);
    expect(s.warnings.join(' ')).toMatch(/unit/);
  });

  it.each([
    ['cover of 1,500 m (mm typed as m)', (f: ReturnType<typeof file>) => (f.nodes[1]!.cover = 1500), 'nodes[1].cover'],
    [
      'block thickness of 1e-9 m',
      (f: ReturnType<typeof file>) => (f.design = { blockDepth: 1e-9 }),
      'design.blockDepth',
    ],
    ['water at 2,400 kg/m³', (f: ReturnType<typeof file>) => (f.water = { density: 2400 }), 'water.density'],
    [
      'concrete at 10 kN/m³',
      (f: ReturnType<typeof file>) => (f.design = { concreteUnitWeight: 10e3 }),
      'design.concreteUnitWeight',
    ],
    [
      'a case at 11 MPa',
      (f: ReturnType<typeof file>) => (f.loadCases = [{ id: 't', pressure: 11e6 }]),
      'loadCases[0].pressure',
    ],
    [
      'an OD of 1e307 m',
      (f: ReturnType<typeof file>) => (f.pipes[0]!.outsideDiameter = 1e307),
      'pipes[0].outsideDiameter',
    ],
    [
      'a bore of 1e-150 m',
      (f: ReturnType<typeof file>) => (f.pipes[0]!.insideDiameter = 1e-150),
      'pipes[0].insideDiameter',
    ],
    [
      'a datum at 1e308 m',
      (f: ReturnType<typeof file>) => (f.loadCases = [{ id: 't', pressure: 1e6, datumElevation: 1e308 }]),
      'loadCases[0].datumElevation',
    ],
    [
      'a flow factor of 1e200',
      (f: ReturnType<typeof file>) => (f.loadCases = [{ id: 't', pressure: 1e6, flowFactor: 1e200 }]),
      'loadCases[0].flowFactor',
    ],
    ['a node at x = 1e200 m', (f: ReturnType<typeof file>) => (f.nodes[2]!.x = 1e200), 'nodes[2].x'],
  ])('refuses %s', (_what, change, path) => {
    const f = file();
    change(f);
    expect(refusal(f).some((line) => line.startsWith(`${path}:`))).toBe(true);
  });
});

describe('groundwater far above the ground', () => {
  // Hand figures: file() puts every pipe at 100 m with the default 1.2 m cover on a 0.326 m OD, so the
  // ground stands at 100 + 0.163 + 1.2 = 101.363 m at every node.
  const withGroundwater = (gw: number) => {
    const f = file();
    f.design = { groundwaterElevation: gw };
    const r = parseProject(f);
    if (!r.ok) throw new Error('refused');
    return scheduleOf(analyseProject(r.project));
  };
  it('warns, naming the field, of groundwater 9,900 m above the whole route (a level in another unit)', () => {
    const s = withGroundwater(10000);
    const d = s.diagnostics.find((x) => x.code === 'input.groundwater-above-ground');
    expect(d?.subject.field).toBe('design.groundwaterElevation');
    expect(d?.values.highestGround).toBeCloseTo(101.363, 9);
    expect(s.warnings.join(' ')).toMatch(/groundwater level 10,?000(\.0+)? m is above the ground/);
  });
  it('says nothing of groundwater at or below the highest ground', () => {
    for (const gw of [101.363, 100.5, 90])
      expect(withGroundwater(gw).diagnostics.some((x) => x.code === 'input.groundwater-above-ground')).toBe(false);
  });
  it('warns of groundwater above the ground at some nodes only, counting them (fittings there are sized submerged)', () => {
    // The first node 5 m lower: ground 95 + 0.163 + 1.2 = 96.363 m there, 101.363 m elsewhere.
    const f = file();
    f.nodes[0] = { ...f.nodes[0]!, elevation: 95 };
    f.design = { groundwaterElevation: 98 };
    const r = parseProject(f);
    if (!r.ok) throw new Error('refused');
    const s = scheduleOf(analyseProject(r.project));
    const d = s.diagnostics.find((x) => x.code === 'input.groundwater-above-some-ground');
    expect(d?.values.flooded).toBe(1);
    expect(d?.values.lowestGround).toBeCloseTo(96.363, 9);
    expect(s.warnings.join(' ')).toContain(
      'the groundwater level 98.00 m is above the ground at one node (the lowest ground is 96.36 m)',
    );
    expect(s.diagnostics.some((x) => x.code === 'input.groundwater-above-ground')).toBe(false);
  });
});

describe('degenerate geometry is refused rather than given results that depend on file order', () => {
  it('refuses a pipe folded back over the one before it', () => {
    const f = file();
    f.nodes[2] = { id: 'c', x: 10, y: 0, elevation: 100 }; // a → b → back toward a
    expect(refusal(f).join('\n')).toMatch(/^pipes\[1\]: leaves node "b" along the same line as pipes\[0\]/m);
  });

  it('refuses a second pipe between the same two nodes', () => {
    const f = file();
    f.pipes.push({ id: 'p3', from: 'b', to: 'a', outsideDiameter: 0.326, insideDiameter: 0.3 });
    expect(refusal(f).join('\n')).toMatch(/^pipes\[2\]: joins the same two nodes as pipes\[0\]/m);
  });

  it('refuses two nodes at one point that are not joined', () => {
    const f = file();
    f.nodes.push({ id: 'd', x: 30, y: 30.0004, elevation: 100 });
    expect(refusal(f).join('\n')).toMatch(/^nodes\[3\]: stands at the same point as nodes\[2\]/m);
  });
});

describe('within the hard limits every result is a finite number (fast-check, fixed seed)', () => {
  it('gives finite, non-negative sizes and finite thrusts at the extremes of every range', () => {
    const extreme = (l: { hard: { min: number; max: number } }) =>
      fc.constantFrom(l.hard.min, l.hard.max, (l.hard.min + l.hard.max) / 2);
    fc.assert(
      fc.property(
        extreme(LIMITS.pressure),
        fc.constantFrom(0.02, 1, 5),
        extreme(LIMITS.coordinate),
        extreme(LIMITS.elevation),
        extreme(LIMITS.flowFactor),
        extreme(LIMITS.cover),
        (pressure, od, x0, z0, flowFactor, cover) => {
          const f = file();
          f.loadCases = [{ id: 't', pressure, datumElevation: z0, flowFactor }];
          const at: Record<string, [number, number]> = { a: [0, 0], b: [30, 0], c: [30, 30] };
          f.nodes = f.nodes.map((n) => {
            const [dx, dy] = at[n.id as string]!;
            return { ...n, x: x0 + dx, y: dy, elevation: z0, cover };
          });
          f.pipes = f.pipes.map((p) => ({ ...p, outsideDiameter: od, insideDiameter: od * 0.9, flow: 50 }));
          const r = parseProject(f);
          if (!r.ok) return; // a combination outside a cross-field rule: refused, which is fine
          const json = scheduleJson(scheduleOf(analyseProject(r.project)));
          expect(json).not.toMatch(/NaN|Infinity|null,null,null/);
          for (const fit of JSON.parse(json).fittings) {
            for (const v of [...fit.thrust, fit.horizontalThrust, fit.upwardThrust, fit.downwardThrust])
              expect(Number.isFinite(v)).toBe(true);
            const b = fit.restraint.block;
            if (b) for (const v of [b.faceWidth, b.faceHeight, b.concreteVolume]) expect(v).toBeGreaterThan(0);
            const a = fit.restraint.anchor;
            if (a) expect(a.concreteVolume).toBeGreaterThan(0);
          }
        },
      ),
      { seed: 20261204, numRuns: 200 },
    );
  });
});

describe('file-sized lists never overflow the call stack', () => {
  it('schedules a file with 150,000 load cases (about 6 MB, under the 20 MB limit)', () => {
    // Invariant: a valid file gives a schedule or a diagnostic, never an exception. Spreading a
    // list this long into one call (Math.max(...list)) throws RangeError in V8.
    const f = file();
    f.loadCases = Array.from({ length: 150_000 }, (_, i) => ({ id: `c${i}`, pressure: 1e6, flowFactor: 1 }));
    const r = parseProject(f);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const s = scheduleOf(analyseProject(r.project));
    expect(s.fittings).toHaveLength(3);
  }, 60_000);
});
