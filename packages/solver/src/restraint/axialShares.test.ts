import { describe, expect, it } from 'vitest';
import type { Leg } from '../network/legs.js';
import type { Vec3 } from '../geometry/vector.js';
import { axialShares } from './axialShares.js';

const leg = (id: string, direction: Vec3): Leg => ({ pipe: { id } as Leg['pipe'], direction }) as Leg;
const s = Math.SQRT1_2;

describe('thrust shared between restrained pipes, each pulled along its axis (hand resolution of forces)', () => {
  it('gives a tee’s thrust, which lies along its branch, to the branch alone', () => {
    const legs = [leg('west', [-1, 0, 0]), leg('east', [1, 0, 0]), leg('south', [0, -1, 0])];
    const shares = axialShares(legs, [0, 20e3, 0]);
    expect(shares.map((x) => [x.leg.pipe.id, x.force])).toEqual([['south', 20e3]]);
  });

  it('splits a cross’s leaning thrust into its two components along the pipes against it', () => {
    // Hand: T = (45.4, 16.9) kN on a cross whose legs run W, E, N, S: the W pipe holds the 45.4 kN along
    // it, the S pipe the 16.9 kN across the first (each pipe pulled by the fitting, away from it).
    const legs = [leg('west', [-1, 0, 0]), leg('east', [1, 0, 0]), leg('north', [0, 1, 0]), leg('south', [0, -1, 0])];
    const shares = axialShares(legs, [45.4e3, 16.9e3, 0]);
    expect(shares.map((x) => x.leg.pipe.id)).toEqual(['west', 'south']);
    expect(shares[0]!.force).toBeCloseTo(45.4e3, 6);
    expect(shares[1]!.force).toBeCloseTo(16.9e3, 6);
  });

  it('resolves along pipes that are not square to each other', () => {
    // Hand: pipes leaving W and SW; T = (20, 5) kN = f₁·(1, 0) + f₂·(√½, √½): f₂ = 5/√½ = 7.071 kN,
    // f₁ = 20 − 5 = 15 kN.
    const legs = [leg('west', [-1, 0, 0]), leg('south-west', [-s, -s, 0]), leg('east', [1, 0, 0])];
    const shares = axialShares(legs, [20e3, 5e3, 0]);
    expect(shares.map((x) => x.leg.pipe.id)).toEqual(['west', 'south-west']);
    expect(shares[0]!.force).toBeCloseTo(15e3, 6);
    expect(shares[1]!.force).toBeCloseTo(5e3 / s, 6);
  });

  it('leaves the whole thrust on the first pipe when no other pulls against the part across it', () => {
    const legs = [leg('west', [-1, 0, 0]), leg('north', [0, 1, 0])];
    const shares = axialShares(legs, [30e3, 40e3, 0]);
    expect(shares).toHaveLength(1);
    expect(shares[0]!.force).toBeCloseTo(50e3, 6);
  });
});
