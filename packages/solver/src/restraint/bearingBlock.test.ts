import { describe, it, expect } from 'vitest';
import { sizeBearingBlock, type BearingBlockInput } from './bearingBlock.js';
import { FOOT, INCH, PSF } from '../units/conversions.js';
import { LBF } from '../../test/projectBuilder.js';
import { expectClose } from '../../test/tolerance.js';

const FT2 = FOOT * FOOT;
const base = (over: Partial<BearingBlockInput> = {}): BearingBlockInput => ({
  thrust: 29_030 * LBF,
  direction: [1, 0, 0],
  allowableBearing: 1500 * PSF,
  safetyFactor: 1.5,
  outsideDiameter: 13.2 * INCH,
  cover: 4 * FOOT,
  step: 2 * INCH,
  blockDepth: 0.6,
  soil: { unitWeight: 18000, frictionAngle: 30, cohesion: 0 },
  waterDepth: null,
  waterUnitWeight: 998.2 * 9.80665,
  ...over,
});

describe('bearing block area A = SF·T/σ (DIPRA form, domain reference §4.1)', () => {
  it('29,030 lb at SF 1.5 on 1,500 psf silt needs 29.03 ft² (CV-11)', () => {
    expectClose(sizeBearingBlock(base()).block!.bearingArea / FT2, 29.03, 1e-4);
  });

  it.each([
    [1000, 43.54],
    [4000, 10.89],
    [9000, 4.84],
  ])('on %i psf the same thrust needs %s ft² (CV-12: soft clay, sand, hard clay)', (psf, ft2) => {
    expectClose(sizeBearingBlock(base({ allowableBearing: psf * PSF })).block!.bearingArea / FT2, ft2, 1e-3);
  });

  it('the AWWA M23 Example 1 bend (7,385 lb, 1,500 psf, SF 1.5) needs 7.385 ft² and gets a face at least that large (CV-7)', () => {
    const r = sizeBearingBlock(base({ thrust: 7385 * LBF, outsideDiameter: 9.05 * INCH, cover: 3 * FOOT }));
    expectClose(r.block!.bearingArea / FT2, 7.385, 1e-4);
    expect(r.block!.faceWidth * r.block!.faceHeight).toBeGreaterThanOrEqual(r.block!.bearingArea);
    // Hand check of the face rule: centre 3 ft + 9.05/24 ft = 3.377 ft down; h ≤ ⅔ × 3.377 = 2.251 ft → 26 in
    // (2-in steps); b = 7.385 ft² / 2.1667 ft = 3.408 ft → 42 in.
    expectClose(r.block!.faceHeight / INCH, 26, 1e-9);
    expectClose(r.block!.faceWidth / INCH, 42, 1e-9);
  });

  it('keeps the face at least one OD high, in whole steps, with width × height ≥ the area', () => {
    for (const t of [1e3, 1e4, 5e4, 2e5, 8e5]) {
      const b = sizeBearingBlock(base({ thrust: t })).block!;
      expect(b.faceHeight).toBeGreaterThanOrEqual(13.2 * INCH);
      expect(b.faceWidth * b.faceHeight).toBeGreaterThanOrEqual(b.bearingArea * (1 - 1e-12));
      expectClose(b.faceHeight / (2 * INCH), Math.round(b.faceHeight / (2 * INCH)), 0, 1e-9);
      expectClose(b.faceWidth / (2 * INCH), Math.round(b.faceWidth / (2 * INCH)), 0, 1e-9);
    }
  });

  it('area grows with thrust and safety factor and falls with bearing (monotonic)', () => {
    const a = (o: Partial<BearingBlockInput>) => sizeBearingBlock(base(o)).bearingArea;
    expect(a({ thrust: 40_000 * LBF })).toBeGreaterThan(a({}));
    expect(a({ safetyFactor: 2 })).toBeGreaterThan(a({}));
    expect(a({ allowableBearing: 3000 * PSF })).toBeLessThan(a({}));
  });

  it('warns when the cover is too shallow for a face one OD high', () => {
    const r = sizeBearingBlock(base({ cover: 0.3 * FOOT }));
    expect(r.diagnostics.map((d) => d.code)).toContain('block.taller-than-cover');
  });

  it('warns when the passive resistance of the face is below the safety factor', () => {
    const r = sizeBearingBlock(
      base({ soil: { unitWeight: 14000, frictionAngle: 0, cohesion: 0 }, allowableBearing: 9000 * PSF }),
    );
    expect(r.block!.passiveRatio).toBeLessThan(1.5);
    expect(r.diagnostics.map((d) => d.code)).toContain('block.passive-short');
  });

  it('estimates concrete as face × block depth', () => {
    const b = sizeBearingBlock(base()).block!;
    expectClose(b.concreteVolume, b.faceWidth * b.faceHeight * 0.6, 1e-12);
  });
});
