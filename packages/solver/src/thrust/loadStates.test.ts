import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { route } from '../../test/projectBuilder.js';
import { expectClose } from '../../test/tolerance.js';

const area = (d: number) => (Math.PI / 4) * d * d;

describe('valves and thrusts that change direction between load states', () => {
  it('sizes a valve at a 90° bend for the open bend thrust when that is the larger (CV-9: 118.04 kN)', () => {
    const p = route({
      pressure: 1e6,
      nodes: [
        { id: 'a', x: -30, y: 0, end: 'tie-in' },
        { id: 'v', x: 0, y: 0, valve: true },
        { id: 'b', x: 0, y: 30, end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 'v', od: 0.326 },
        { from: 'v', to: 'b', od: 0.326 },
      ],
    });
    const f = analyse(p).byNode.get('v')!;
    expect(f.geometry.kind).toBe('valve');
    expectClose(Math.hypot(...f.envelope.governing.total), 118_040, 1e-4);
    expect(f.envelope.governing.closedAgainst).toBeNull();
  });

  it('gives a closed valve between unequal pipes a block each way: p·A of either side (§1.3)', () => {
    const p = route({
      pressure: 1e6,
      nodes: [
        { id: 'a', x: -30, y: 0, end: 'tie-in' },
        { id: 'v', x: 0, y: 0, valve: true },
        { id: 'b', x: 30, y: 0, end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 'v', od: 0.326 },
        { from: 'v', to: 'b', od: 0.222 },
      ],
    });
    const f = analyse(p).byNode.get('v')!;
    // pressure from the DN300 side pushes +x with p·A(0.326); from the DN200 side −x with p·A(0.222)
    expectClose(f.envelope.horizontal.force, 1e6 * area(0.326), 1e-9);
    expectClose(f.envelope.reverse!.force, 1e6 * area(0.222), 1e-9);
    expect(f.envelope.horizontal.direction[0]).toBeCloseTo(1, 12);
    expect(f.envelope.reverse!.direction[0]).toBeCloseTo(-1, 12);
    expect(f.restraint.block!.direction[0]).toBeCloseTo(1, 12);
    expect(f.restraint.reverseBlock!.direction[0]).toBeCloseTo(-1, 12);
    // A = SF·T/σ + A_p for each block, σ = the test soil's 4,000 psf: each face has the other side's
    // pipe running through it (the block bearing +x is crossed by the DN200, the one bearing −x by the DN300)
    expectClose(
      (f.restraint.reverseBlock!.bearingArea - area(0.326)) / (f.restraint.block!.bearingArea - area(0.222)),
      (0.222 / 0.326) ** 2,
      1e-9,
    );
  });

  it('restrains both pipes of a closed valve on restrained joints, each for its own side (L = S_f·p·A/F_s)', () => {
    const p = route({
      pressure: 1e6,
      soils: [{ id: 's', bearing: 150e3, unitWeight: 18000, frictionAngle: 30, cohesion: 0 }],
      nodes: [
        { id: 'a', x: -200, y: 0, end: 'tie-in' },
        { id: 'v', x: 0, y: 0, valve: true, restraint: 'joints' },
        { id: 'b', x: 200, y: 0, end: 'tie-in' },
      ],
      pipes: [
        { id: 'big', from: 'a', to: 'v', od: 0.326 },
        { id: 'small', from: 'v', to: 'b', od: 0.222 },
      ],
    });
    const legs = analyse(p).byNode.get('v')!.restraint.restrainedLegs;
    expect(legs.map((l) => l.pipe).sort()).toEqual(['big', 'small']);
  });

  it('adds a block on the other side when a downsurge reverses a bend’s thrust', () => {
    // A high point 10 m above the datum: +150 kPa working gives +52 kPa there, −80 kPa downsurge gives −178 → held at the vapour pressure
    const p = route({
      cases: [
        { id: 'w', pressure: 150e3, datumElevation: 100, flowFactor: 0 },
        { id: 'down', pressure: 20e3, datumElevation: 100, flowFactor: 0 },
      ],
      nodes: [
        { id: 'a', x: -30, y: 0, z: 110, end: 'tie-in' },
        { id: 'h', x: 0, y: 0, z: 110 },
        { id: 'b', x: 0, y: 30, z: 110, end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 'h', od: 0.326 },
        { from: 'h', to: 'b', od: 0.326 },
      ],
    });
    const f = analyse(p).byNode.get('h')!;
    const wp = 150e3 - 998.2 * 9.80665 * 10;
    const dp = 20e3 - 998.2 * 9.80665 * 10;
    expect(wp).toBeGreaterThan(0);
    expect(dp).toBeLessThan(0);
    const big = Math.max(Math.abs(wp), Math.abs(dp)) * area(0.326) * Math.SQRT2;
    const small = Math.min(Math.abs(wp), Math.abs(dp)) * area(0.326) * Math.SQRT2;
    expectClose(f.envelope.horizontal.force, big, 1e-9);
    expectClose(f.envelope.reverse!.force, small, 1e-9);
    expect(f.restraint.reverseBlock).not.toBeNull();
    expect(f.diagnostics.find((d) => d.code === 'block.thrust-reverses')?.values.force).toBeCloseTo(small, 6);
  });
});
