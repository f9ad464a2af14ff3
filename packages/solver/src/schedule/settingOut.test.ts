import { describe, it, expect } from 'vitest';
import { anchorBox, padThickness, settingOut } from './settingOut.js';
import type { ScheduleFitting } from './scheduleRows.js';

// A fitting built by hand: centreline at level 100.00, a 0.30 m OD pipe (ID 0.28) under 1.20 m of
// cover, so the ground is at 100 + 0.15 + 1.20 = 101.35 and the centreline is 1.35 m down.
const fitting = (restraint: Partial<ScheduleFitting['restraint']>): ScheduleFitting =>
  ({
    mark: 'A1',
    position: [500, 200, 100],
    cover: 1.2,
    groundLevel: 101.35,
    pipes: [{ id: 'p1', outsideDiameter: 0.3, insideDiameter: 0.28, material: 'ductile-iron', toward: null }],
    restraint: {
      block: null,
      reverseBlock: null,
      anchor: null,
      trenchBottom: null,
      restrainedLength: null,
      restrainedLegs: [],
      ...restraint,
    },
  }) as unknown as ScheduleFitting;

const block = {
  bearingArea: 0.5,
  faceWidth: 0.8,
  faceHeight: 0.7,
  concreteVolume: 0.8 * 0.7 * 0.6,
  depth: 0.6,
  direction: [0, -1, 0] as [number, number, number],
  passiveResistance: 1,
  passiveRatio: 2,
  thrust: 10_000,
  shapeFactor: 1,
  upwardThrust: 0,
  governs: 'bearing' as const,
};

describe('setting-out of a fitting', () => {
  it('gives the fitting, its invert (centreline − ID/2) and the ground', () => {
    const s = settingOut(fitting({}), 0.05);
    expect([s.east, s.north, s.centreline, s.ground]).toEqual([500, 200, 100, 101.35]);
    expect(s.invert).toBeCloseTo(99.86, 12); // 100 − 0.28/2
  });

  it('puts a block bearing south half its 0.6 m thickness south of the fitting, face centred on the pipe', () => {
    const b = settingOut(fitting({ block }), 0.05).block!;
    expect(b.east).toBeCloseTo(500, 12);
    expect(b.north).toBeCloseTo(199.7, 12); // 200 − 0.6/2
    expect(b.bearing).toBeCloseTo(180, 9);
    expect(b.topDepth).toBeCloseTo(1.0, 12); // 1.35 − 0.7/2
    expect(b.baseDepth).toBeCloseTo(1.7, 12); // 1.35 + 0.7/2
    expect(b.baseLevel).toBeCloseTo(99.65, 12); // 101.35 − 1.7
  });

  it('hangs an anchor under the pipe: top at the underside 1.50 m down, base one height lower', () => {
    const a = settingOut(
      fitting({
        anchor: {
          concreteVolume: 1.9,
          length: 1.25,
          width: 1.25,
          height: 1.25,
          side: 1.25,
          submerged: false,
          upwardThrust: 0,
          horizontalThrust: 0,
        },
      }),
      0.05,
    ).anchor!;
    expect(a.cube).toBe(false);
    expect([a.length, a.width, a.height]).toEqual([1.25, 1.25, 1.25]);
    expect(a.topDepth).toBeCloseTo(1.5, 12); // 1.2 cover + 0.3 OD
    expect(a.baseDepth).toBeCloseTo(2.75, 12);
  });

  it('reads an anchor given as length × width × height as it is', () => {
    expect(anchorBox({ length: 2, width: 1.5, height: 1, concreteVolume: 3 })).toEqual({
      length: 2,
      width: 1.5,
      height: 1,
      cube: false,
    });
  });

  it('lays a pad under the pipe, 150 mm thick or one step if that is more', () => {
    expect(padThickness(0.05)).toBe(0.15);
    expect(padThickness(0.2)).toBe(0.2);
    const p = settingOut(fitting({ trenchBottom: { bearingArea: 0.5, width: 0.9, length: 0.6 } }), 0.05).pad!;
    expect(p.baseDepth).toBeCloseTo(1.65, 12); // 1.5 + 0.15
  });
});
