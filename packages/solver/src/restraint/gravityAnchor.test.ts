import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { sizeGravityAnchor } from './gravityAnchor.js';
import { CUBIC_YARD, FOOT, INCH, POUND_PER_CUBIC_FOOT_WEIGHT } from '../units/conversions.js';
import { LBF, psi, route } from '../../test/projectBuilder.js';
import { expectClose, expectPrinted } from '../../test/tolerance.js';

const FT3 = FOOT ** 3;
const PCF = POUND_PER_CUBIC_FOOT_WEIGHT;

/**
 * CV-13: 12-in DI (OD 13.20 in), 150 psi, 45° vertical bend, one leg horizontal: the line runs level
 * along +x, then turns down 45° — the thrust of the crest at node c points up and back.
 */
const crestRoute = (extra: Partial<Parameters<typeof route>[0]> = {}) =>
  route({
    pressure: psi(150),
    nodes: [
      { id: 'a', x: -20, y: 0, z: 100 },
      { id: 'c', x: 0, y: 0, z: 100 },
      { id: 'b', x: 10, y: 0, z: 90 },
    ],
    pipes: [
      { from: 'a', to: 'c', od: 13.2 * INCH },
      { from: 'c', to: 'b', od: 13.2 * INCH },
    ],
    ...extra,
  });

describe('gravity anchor at a crest bend (domain reference §5)', () => {
  const f = analyse(crestRoute({ design: { concreteUnitWeight: 150 * PCF, upliftSafetyFactor: 1.5 } })).byNode.get(
    'c',
  )!;

  it('has T_v = P·A·sin Δ = 14,515 lb and T_h = P·A·(1 − cos Δ) = 6,012 lb (CV-13)', () => {
    expectPrinted(f.envelope.upward.force / LBF, 14_515);
    expectPrinted(f.envelope.horizontal.force / LBF, 6_012);
  });

  it('needs 145.1 ft³ (5.38 yd³) of 150 pcf concrete at SF 1.5 (CV-13)', () => {
    const v = f.restraint.anchor!.concreteVolume;
    expectClose(v / FT3, 145.1, 5e-4);
    expectClose(v / CUBIC_YARD, 5.38, 1e-3);
  });

  it('needs 248.5 ft³ submerged, with γ′ = 150 − 62.4 pcf (CV-13: water of 62.4 pcf)', () => {
    // Groundwater above the pipe: the whole anchor lies below it.
    const site = {
      soil: { id: 's', bearing: 1e5, unitWeight: 18000, frictionAngle: 30, cohesion: 0 },
      soilName: 's',
      od: 0.335,
      cover: 1.2,
      invert: 99.8,
      groundwater: 101,
      waterDepth: 0,
      trenchWidth: 1,
      waterUnitWeight: 62.4 * PCF,
      step: 0.05,
    };
    const r = sizeGravityAnchor({
      upward: 14_515 * LBF,
      horizontal: 0,
      safetyFactor: 1.5,
      concreteUnitWeight: 150 * PCF,
      site,
    });
    expectClose(r.anchor.concreteVolume / FT3, 248.5, 5e-4);
    expect(r.diagnostics.map((d) => d.code)).toEqual(['anchor.submerged']);
  });

  it('takes the anchor as submerged when groundwater stands above its bottom, below the pipe', () => {
    const wet = crestRoute({ design: { groundwaterElevation: 99.0 } });
    const anchor = analyse(wet).byNode.get('c')!.restraint.anchor!;
    expect(anchor.submerged).toBe(true);
    expectClose(anchor.unitWeight, 23600 - 998.2 * 9.80665, 1e-12);
  });

  it('puts no anchor at a sag, where the thrust bears down on the trench bottom', () => {
    const sag = route({
      pressure: psi(150),
      nodes: [
        { id: 'a', x: -10, y: 0, z: 110 },
        { id: 's', x: 0, y: 0, z: 100 },
        { id: 'b', x: 20, y: 0, z: 100 },
      ],
      pipes: [
        { from: 'a', to: 's', od: 13.2 * INCH },
        { from: 's', to: 'b', od: 13.2 * INCH },
      ],
    });
    const r = analyse(sag).byNode.get('s')!.restraint;
    expect(r.anchor).toBeNull();
    expect(r.trenchBottom!.bearingArea).toBeGreaterThan(0);
  });

  it('takes the anchor as dry when groundwater stays below its bottom', () => {
    // dry volume 145.1 ft³ = 4.109 m³ → 1.65 m cube under an invert at 99.83 m: bottom at 98.18 m
    const dry = crestRoute({ design: { groundwaterElevation: 98.0 } });
    expect(analyse(dry).byNode.get('c')!.restraint.anchor!.submerged).toBe(false);
  });

  it('needs no bearing block where the anchor’s base friction holds SF × the horizontal thrust', () => {
    // CV-13 crest on sand φ = 36°: F_f = W·tan 24° = 21,772 lb × 0.4452 = 9,693 lb ≥ 1.5 × 6,012 = 9,018 lb
    const p = crestRoute({
      soils: [{ id: 'sand', bearing: 95761, unitWeight: 19000, frictionAngle: 36, cohesion: 0 }],
      design: { concreteUnitWeight: 150 * PCF },
    });
    const r = analyse(p).byNode.get('c')!.restraint;
    expectPrinted(r.anchor!.baseFriction / LBF, 9_693, 5);
    expect(r.block).toBeNull();
  });
});
