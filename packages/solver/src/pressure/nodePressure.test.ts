import { describe, it, expect } from 'vitest';
import { pressureAt, VACUUM_GAUGE_PRESSURE } from './nodePressure.js';
import { PSI, FOOT } from '../units/conversions.js';
import { expectClose } from '../../test/tolerance.js';

describe('pressure at a node from the case datum', () => {
  it('a fitting 30 m below a gauge reading 1.0 MPa sees 1.2937 MPa with no flow (CV-19)', () => {
    const p = pressureAt({ id: 't', pressure: 1e6, datumElevation: 130, flowFactor: 0 }, 100, 998.2);
    expectClose(p, 1.2937e6, 1e-4);
  });

  it('water of 62.4 lb/ft³ adds 0.4333 psi per foot of depth (hydrostatics ρ·g·h, computed: 62.4/144 = 0.4333)', () => {
    const density = (62.4 * 0.45359237) / FOOT ** 3; // lb/ft³ → kg/m³ (NIST SP 811)
    const p = pressureAt({ id: 't', pressure: 0, datumElevation: FOOT, flowFactor: 0 }, 0, density);
    expectClose(p / PSI, 0.4333, 2e-4);
  });

  it('a node above the datum sees less pressure, and a case without a datum applies everywhere', () => {
    expect(pressureAt({ id: 'w', pressure: 500e3, datumElevation: 90, flowFactor: 1 }, 95, 1000)).toBeLessThan(500e3);
    expect(pressureAt({ id: 'w', pressure: 500e3, flowFactor: 1 }, 250, 1000)).toBe(500e3);
  });

  it('never goes below the vapour pressure: −98.99 kPa gauge (101.325 kPa atmosphere, 2.339 kPa vapour at 20 °C)', () => {
    expect(VACUUM_GAUGE_PRESSURE).toBe(-98_986);
    expect(pressureAt({ id: 'd', pressure: 0, datumElevation: 100, flowFactor: 0 }, 150, 998.2)).toBe(-98_986);
    expect(pressureAt({ id: 'd', pressure: 0, datumElevation: 100, flowFactor: 0 }, 105, 998.2)).toBeCloseTo(
      -998.2 * 9.80665 * 5,
      6,
    );
  });
});
