import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { route } from '../../test/projectBuilder.js';
import { scheduleOf } from '../schedule/scheduleOf.js';

/**
 * A crest straight in plan, but for the millimetre a typed point was rounded to: its thrust is upward,
 * with a horizontal part of a few newtons that only the rounding made.
 */
const crest = (offset: number) =>
  route({
    nodes: [
      { id: 'a', x: 0, y: 0, z: 100, end: 'tie-in' },
      { id: 'b', x: 40, y: offset, z: 102 },
      { id: 'c', x: 80, y: 0, z: 100, end: 'tie-in' },
    ],
    pipes: [
      { from: 'a', to: 'b', od: 0.222 },
      { from: 'b', to: 'c', od: 0.222 },
    ],
    pressure: 1e6,
    // soft clay (φ = 0): an anchor's base holds no horizontal force by friction, so a block was added
    soils: [{ id: 'clay', bearing: 47880, unitWeight: 17000, frictionAngle: 0, cohesion: 12000 }],
  });

describe('a thrust within the straight-joint tolerance of vertical', () => {
  it('gets an anchor and no bearing block for its rounding-noise horizontal part', () => {
    const f = analyse(crest(0.001)).byNode.get('b')!;
    const e = f.envelope;
    // a 1 mm offset over 40 m turns the plan by 0.003°: the horizontal part is ~1e-4 of the thrust
    expect(e.horizontal.force).toBeGreaterThan(0);
    expect(e.horizontal.force / e.upward.force).toBeLessThan(Math.sin((0.5 * Math.PI) / 180));
    expect(f.restraint.block).toBeNull();
    expect(f.restraint.anchor).not.toBeNull();
    // dropped as a joint deflected under 0.5° is: the anchor holds the uplift alone
    expect(f.restraint.anchor!.horizontalThrust).toBe(0);
    // the same anchor as for the crest exactly straight in plan (no horizontal part at all)
    expect(f.restraint.anchor!.side).toBe(analyse(crest(0)).byNode.get('b')!.restraint.anchor!.side);
  });

  it('still gets a block where the plan turns beyond that tolerance', () => {
    // 1 m over 40 m: a 2.9° turn in plan, a real horizontal thrust
    const f = analyse(crest(1)).byNode.get('b')!;
    expect(f.envelope.horizontal.force / f.envelope.upward.force).toBeGreaterThan(Math.sin((0.5 * Math.PI) / 180));
    expect(f.restraint.block ?? f.restraint.anchor).not.toBeNull();
    expect(f.restraint.block !== null || f.restraint.anchor!.horizontalThrust > 0).toBe(true);
  });
});

describe('a sag held by a trench-bottom pad', () => {
  it('lists the pad thickness among the values not read in their source', () => {
    const p = route({
      nodes: [
        { id: 'a', x: 0, y: 0, z: 100, end: 'tie-in' },
        { id: 'b', x: 40, y: 0, z: 98 },
        { id: 'c', x: 80, y: 0, z: 100, end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 'b', od: 0.222 },
        { from: 'b', to: 'c', od: 0.222 },
      ],
      pressure: 1e6,
    });
    const row = scheduleOf(analyse(p)).fittings.find((f) => f.node === 'b')!;
    expect(row.restraint.trenchBottom).not.toBeNull();
    // the pad's volume in the take-off uses the register's pad.thickness, registered unverified
    expect(row.unverified).toContain('pad.thickness');
  });
});
