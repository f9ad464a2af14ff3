import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { sizeGravityAnchor } from './gravityAnchor.js';
import { CUBIC_YARD, FOOT, INCH, POUND_PER_CUBIC_FOOT_WEIGHT } from '../units/conversions.js';
import { LBF, psi, route } from '../../test/projectBuilder.js';
import { expectClose, expectPrinted } from '../../test/tolerance.js';
import { scheduleOf } from '../schedule/scheduleOf.js';
import { restraintSummary } from '../schedule/restraintText.js';

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

describe('gravity anchor at a crest bend (DIPRA gravity block form; docs/check-values.md CV-13)', () => {
  const f = analyse(crestRoute({ design: { concreteUnitWeight: 150 * PCF, upliftSafetyFactor: 1.5 } })).byNode.get(
    'c',
  )!;

  it('has T_v = P·A·sin Δ = 14,515 lb and T_h = P·A·(1 − cos Δ) = 6,012 lb (CV-13)', () => {
    expectPrinted(f.envelope.upward.force / LBF, 14_515);
    expectPrinted(f.envelope.horizontal.force / LBF, 6_012);
  });

  it('needs 145.1 ft³ (5.38 yd³) of 150 pcf concrete at SF 1.5 (CV-13)', () => {
    const v = f.restraint.anchor!.requiredVolume;
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
      slidingSafetyFactor: 1.5,
      concreteUnitWeight: 150 * PCF,
      site,
    });
    expectClose(r.anchor!.requiredVolume / FT3, 248.5, 5e-4);
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

  it('takes base friction on the weight less the uplift, W′ − T_up (statics; hand calculation)', () => {
    // CV-13 crest on sand φ = 36°, 150 pcf concrete, SF 1.5 on uplift and on sliding; tan(⅔·36°) = tan 24°
    // = 0.445229. Uplift alone: W = 1.5 × 14,515 = 21,772.5 lb, whose friction on the whole weight
    // (21,772.5 × 0.445229 = 9,694 lb) would seem to hold 1.5 × 6,012 = 9,018 lb — but the base carries
    // only W − T_up = 7,257.5 lb, friction 3,231 lb. For friction to hold: W = 14,515 + 9,018 / 0.445229
    // = 14,515 + 20,254.8 = 34,769.8 lb, V = 34,769.8 / 150 = 231.80 ft³, friction then exactly 9,018 lb.
    const sand = { id: 'sand', bearing: 95761, unitWeight: 19000, frictionAngle: 36, cohesion: 0 };
    const site = {
      soil: sand,
      soilName: 'sand',
      od: 0.335,
      cover: 1.2,
      invert: 99.8,
      groundwater: null,
      waterDepth: null,
      trenchWidth: 1,
      waterUnitWeight: 62.4 * PCF,
      step: 0.05,
    };
    const anchor = (horizontal: number) =>
      sizeGravityAnchor({
        upward: 14_515 * LBF,
        horizontal: horizontal * LBF,
        safetyFactor: 1.5,
        slidingSafetyFactor: 1.5,
        concreteUnitWeight: 150 * PCF,
        site,
      }).anchor!;
    const upliftOnly = anchor(0);
    expectClose(upliftOnly.requiredVolume / FT3, 145.15, 1e-3);
    expectClose(upliftOnly.baseFriction / LBF, 3_231.3, 1e-3);
    expect(upliftOnly.governs).toBe('uplift');
    const alone = anchor(6_012);
    expectClose(alone.requiredVolume / FT3, 231.8, 5e-4);
    expectClose(alone.baseFriction / LBF, 9_018, 1e-6);
    expect(alone.governs).toBe('sliding');
  });

  it('builds a bearing block where friction under the uplift cannot hold the horizontal thrust', () => {
    // The same crest through the analysis: anchor alone 231.8 ft³ against a block (≈ 4.5 ft² of face)
    // plus the 145.1 ft³ uplift anchor: the block and anchor use less concrete and are built.
    const p = crestRoute({
      soils: [{ id: 'sand', bearing: 95761, unitWeight: 19000, frictionAngle: 36, cohesion: 0 }],
      design: { concreteUnitWeight: 150 * PCF },
    });
    const f = analyse(p).byNode.get('c')!;
    const r = f.restraint;
    expect(r.block).not.toBeNull();
    expect(r.block!.thrust).toBe(f.envelope.horizontal.force);
    expect(r.anchor!.horizontalThrust).toBe(0);
    expectClose(r.anchor!.requiredVolume / FT3, 145.1, 5e-4);
  });

  it('refuses a gravity anchor where the submerged weight is not positive (heavy water)', () => {
    // The file schema now refuses such water; the solver still must not trust its caller: heavy water
    // (2,400 kg/m³, γw = 23,536 N/m³) against 23,000 N/m³ concrete, groundwater above the pipe.
    const p = crestRoute({ design: { groundwaterElevation: 105, concreteUnitWeight: 23_000 } });
    const heavy = { ...p, water: { ...p.water, density: 2400 } };
    const f = analyse(heavy).byNode.get('c')!;
    expect(f.restraint.anchor).toBeNull();
    expect(f.diagnostics.map((d) => d.code)).toContain('anchor.no-weight');
    expect(f.restraint.restrainedLegs.length).toBeGreaterThan(0);
  });
});

describe('the gravity anchor as built', () => {
  // CV-13 crest (145.1 ft³ required) on a 2-in step: ∛(145.15 ft³) = 5.253 ft = 1.6011 m, rounded up
  // to 32 × 0.0508 m = 1.6256 m (5 ft 4 in), so the cube built holds 1.6256³ = 4.2958 m³ (151.7 ft³).
  const p = crestRoute({ design: { concreteUnitWeight: 150 * PCF, dimensionStep: 2 * INCH } });
  const a = analyse(p);
  const anchor = a.byNode.get('c')!.restraint.anchor!;

  it('has the volume of the cube that is poured, not the smaller volume required', () => {
    expectClose(anchor.side, 1.6256, 1e-9);
    expectClose(anchor.requiredVolume / FT3, 145.1, 5e-4);
    expectClose(anchor.concreteVolume, 1.6256 ** 3, 1e-9);
    expect(anchor.concreteVolume).toBeGreaterThanOrEqual(anchor.requiredVolume);
  });

  it('prints on the schedule the volume of the dimensions it prints (5 ft 4 in cube: 5.62 yd³)', () => {
    const f = scheduleOf(a).fittings.find((x) => x.node === 'c')!;
    const text = restraintSummary(f, 'us', 2 * INCH);
    expect(text).toContain('anchor 5 ft 4 in l × 5 ft 4 in w × 5 ft 4 in h, 5.62 yd³');
  });
});

describe('a gravity anchor on a soil with no allowable bearing', () => {
  it('is not built: its weight would bear on that soil, so joints are sized instead and the reason given', () => {
    // Statics: a dead-weight anchor holds the uplift by its weight, which the soil under it must carry
    // (as a trench-bottom pad's load); a soil with no allowable bearing carries none.
    const f = analyse(crestRoute({ soils: [{ id: 'peat', bearing: 0, frictionAngle: 30 }] })).byNode.get('c')!;
    expect(f.restraint.anchor).toBeNull();
    expect(f.restraint.block).toBeNull();
    expect(f.restraint.restrainedLegs.length).toBeGreaterThan(0);
    expect(f.restraint.diagnostics.map((d) => d.code)).toContain('pad.no-bearing');
    // the same route on sand has its anchor
    expect(analyse(crestRoute()).byNode.get('c')!.restraint.anchor).not.toBeNull();
  });
});
