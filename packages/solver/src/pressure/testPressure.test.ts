import { describe, it, expect } from 'vitest';
import { proposeTestPressure } from './testPressure.js';
import { FOOT, PSI } from '../units/conversions.js';
import { route } from '../../test/projectBuilder.js';
import { expectClose } from '../../test/tolerance.js';

// Water of 62.4 lb/ft³ (0.4333 psi per foot) so the published arithmetic of CV-22 carries over.
const DENSITY = (62.4 * 0.45359237) / FOOT ** 3;

describe('field-test pressure from the working pressure and the route elevations', () => {
  it('AWWA C600: 100 psi working at the gauge, high point 20 ft up: 1.5 × 100 = 150 psi governs over 122.8 psi (CV-22)', () => {
    const gauge = 100 * FOOT;
    const p = route({
      density: DENSITY,
      cases: [{ id: 'w', pressure: 100 * PSI, datumElevation: gauge }],
      nodes: [
        { id: 'a', x: 0, y: 0, z: gauge },
        { id: 'b', x: 300, y: 0, z: gauge + 20 * FOOT },
      ],
      pipes: [{ from: 'a', to: 'b', od: 0.33 }],
    });
    const r = proposeTestPressure(p, p.loadCases[0]!, 'awwa-c600', gauge)!;
    // high point: 100 − 20 × 0.4333 = 91.33 psi working; 1.25 × 91.33 = 114.2 psi there = 122.8 psi at the gauge
    expectClose(r.criteria[1]!.working / PSI, 91.33, 1e-3);
    expectClose(r.criteria[1]!.atTestPoint / PSI, 122.8, 1e-3);
    expectClose(r.pressure / PSI, 150, 1e-9);
    expect(r.governing).toBe(0);
  });

  it('AWWA C600: with hydrostatic working pressure the point-of-testing criterion governs, however tall the section', () => {
    const p = route({
      density: DENSITY,
      cases: [{ id: 'w', pressure: 40 * PSI, datumElevation: 0 }],
      nodes: [
        { id: 'a', x: 0, y: 0, z: 0 },
        { id: 'b', x: 300, y: 0, z: 60 * FOOT },
      ],
      pipes: [{ from: 'a', to: 'b', od: 0.33 }],
    });
    // gauge at the low point: 1.5 × 40 = 60 psi; high point works at 40 − 26.0 = 14.0 psi → 1.25 × 14.0 + 26.0 = 43.5 psi
    const r = proposeTestPressure(p, p.loadCases[0]!, 'awwa-c600')!;
    expectClose(r.pressure / PSI, 60, 1e-9);
    const steep = route({
      density: DENSITY,
      cases: [{ id: 'w', pressure: 40 * PSI, datumElevation: 60 * FOOT }],
      nodes: [
        { id: 'a', x: 0, y: 0, z: 0 },
        { id: 'b', x: 300, y: 0, z: 60 * FOOT },
      ],
      pipes: [{ from: 'a', to: 'b', od: 0.33 }],
    });
    // working 40 psi at the top, 66.0 psi at the bottom gauge: 1.5 × 66.0 = 99.0; 1.25 × 40 + 26.0 = 76.0 → 99.0 governs
    expectClose(
      proposeTestPressure(steep, steep.loadCases[0]!, 'awwa-c600')!.pressure / PSI,
      1.5 * (40 + 60 * 0.43333),
      1e-3,
    );
  });

  it('AWWA C605: 1.5 × the working pressure at the lowest point, stated at the test point', () => {
    const p = route({
      density: DENSITY,
      cases: [{ id: 'w', pressure: 80 * PSI, datumElevation: 10 * FOOT }],
      nodes: [
        { id: 'a', x: 0, y: 0, z: 0 },
        { id: 'b', x: 300, y: 0, z: 10 * FOOT },
      ],
      pipes: [{ from: 'a', to: 'b', od: 0.33 }],
    });
    const r = proposeTestPressure(p, p.loadCases[0]!, 'awwa-c605', 10 * FOOT)!;
    // lowest point works at 80 + 4.333 = 84.33 psi; 1.5 × 84.33 = 126.5 psi there, 122.2 psi at the gauge 10 ft up
    expectClose(r.criteria[0]!.least / PSI, 126.5, 1e-3);
    expectClose(r.pressure / PSI, 126.5 - 4.333, 1e-3);
  });
});
