import { describe, it } from 'vitest';
import { passiveResistance, rankinePassiveCoefficient } from './passiveResistance.js';

/** Unit weight of water at 998.2 kg/m³ × 9.80665 m/s², N/m³. */
const WATER_UNIT_WEIGHT = 998.2 * 9.80665;
import { expectClose } from '../../test/tolerance.js';

describe('Rankine passive resistance (domain reference §4.6)', () => {
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
