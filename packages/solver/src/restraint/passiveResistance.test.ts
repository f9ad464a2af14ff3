import { describe, it, expect } from 'vitest';
import { ovesenFactor, passiveResistance, rankinePassiveCoefficient } from './passiveResistance.js';

/** Unit weight of water at 998.2 kg/m³ × 9.80665 m/s², N/m³. */
const WATER_UNIT_WEIGHT = 998.2 * 9.80665;
import { expectClose } from '../../test/tolerance.js';

describe('Rankine passive resistance (Rankine earth pressure; docs/check-values.md CV-15 to CV-17)', () => {
  it.each([
    [25, 2.464],
    [30, 3.0],
    [35, 3.69],
    [40, 4.599],
  ])('Kp at φ = %s° is %s (CV-15)', (phi, kp) => {
    expectClose(rankinePassiveCoefficient(phi), kp, 2e-4);
  });

  it('a 1 m face from 0.9 to 1.9 m in sand (γ 18 kN/m³, φ 30°) resists 75.6 kN (CV-16)', () => {
    const r = passiveResistance({
      width: 1,
      top: 0.9,
      bottom: 1.9,
      unitWeight: 18000,
      frictionAngle: 30,
      cohesion: 0,
      waterDepth: null,
      waterUnitWeight: WATER_UNIT_WEIGHT,
    });
    expectClose(r, 75_600, 1e-9);
  });

  it('the same face in undrained clay (φ 0, c_u 25 kPa) resists 75.2 kN = 25.2 + 50.0 (CV-17)', () => {
    const r = passiveResistance({
      width: 1,
      top: 0.9,
      bottom: 1.9,
      unitWeight: 18000,
      frictionAngle: 0,
      cohesion: 25000,
      waterDepth: null,
      waterUnitWeight: WATER_UNIT_WEIGHT,
    });
    expectClose(r, 75_200, 1e-9);
  });

  it('below the water table the soil weighs γ − γw (hand calculation)', () => {
    // Water at the ground surface: R = ½·(γ − γw)·Kp·(z2² − z1²) = ½·(18000 − 9789.0)·3·2.8
    const r = passiveResistance({
      width: 1,
      top: 0.9,
      bottom: 1.9,
      unitWeight: 18000,
      frictionAngle: 30,
      cohesion: 0,
      waterDepth: 0,
      waterUnitWeight: WATER_UNIT_WEIGHT,
    });
    expectClose(r, 0.5 * (18000 - WATER_UNIT_WEIGHT) * 3 * 2.8, 1e-9);
    // Water at 1.4 m: dry 0.9–1.4 m, then σ' = γ·1.4 + (γ − γw)(z − 1.4) to 1.9 m.
    const split = passiveResistance({
      width: 1,
      top: 0.9,
      bottom: 1.9,
      unitWeight: 18000,
      frictionAngle: 30,
      cohesion: 0,
      waterDepth: 1.4,
      waterUnitWeight: WATER_UNIT_WEIGHT,
    });
    const dry = 0.5 * 18000 * (1.4 ** 2 - 0.9 ** 2);
    const wet = 18000 * 1.4 * 0.5 + 0.5 * (18000 - WATER_UNIT_WEIGHT) * 0.5 ** 2;
    expectClose(split, 3 * (dry + wet), 1e-9);
  });
});

describe('Ovesen 3-D factor for a short block (Ovesen 1964 via Duncan & Mokwa 2001; equation from memory)', () => {
  it('is 2.209 for a 0.6 m square face from 0.9 to 1.5 m in φ = 30° sand (hand calculation, from memory)', () => {
    // Kp = 3, Ka = 1/3, Kp − Ka = 2.6667, (Kp − Ka)^⅔ = 1.92299; E = 0.9/1.5 = 0.6, b/h = 1, B = 1:
    // 1.1·0.6⁴ = 0.14256; 1.6/(1 + 5) = 0.26667; 0.4·2.6667·0.6³/(1 + 0.05) = 0.21943; sum 0.62866
    // M = 1 + 1.92299 × 0.62866 = 2.2089
    expectClose(ovesenFactor({ frictionAngle: 30, top: 0.9, bottom: 1.5, width: 0.6 }), 2.2089, 1e-4);
  });

  it('takes no 3-D gain in undrained clay, φ = 0 (Kp = Ka = 1)', () => {
    expect(ovesenFactor({ frictionAngle: 0, top: 0.9, bottom: 1.5, width: 0.6 })).toBe(1);
  });

  it('falls toward the 2-D value as the face widens, and grows with depth (invariants)', () => {
    const m = (width: number, top = 0.9) => ovesenFactor({ frictionAngle: 30, top, bottom: top + 0.6, width });
    expect(m(0.3)).toBeGreaterThan(m(0.6));
    expect(m(0.6)).toBeGreaterThan(m(3));
    expect(m(3)).toBeGreaterThan(m(300));
    expect(m(0.6, 2)).toBeGreaterThan(m(0.6, 0.9));
    // A face reaching the ground surface (E = 0) and very wide: the 2-D wedge, M → 1.
    expectClose(ovesenFactor({ frictionAngle: 30, top: 0, bottom: 1, width: 1e6 }), 1, 1e-4);
  });
});
