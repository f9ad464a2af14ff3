import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { scheduleOf } from '../schedule/scheduleOf.js';
import { restraintSummary } from '../schedule/restraintText.js';
import { route } from '../../test/projectBuilder.js';
import type { Soil } from '../model/projectSchema.js';

/**
 * A capped DN300 (OD 0.326 m) at 0.2 m cover, 1 MPa: the face rule allows no face taller than half the
 * depth to its bottom, so at a pipe centre 0.363 m down no block holds 1.5 × 83.5 kN (hand check:
 * T = 1e6 · π · 0.326² / 4 = 83.47 kN). Restrained joints are sized instead along 120 m of pipe.
 */
const cappedShallow = (soil: Soil) =>
  route({
    pressure: 1e6,
    soils: [soil],
    nodes: [
      { id: 'n1', x: 0, y: 0, end: 'tie-in', cover: 0.2 },
      { id: 'n2', x: 120, y: 0, cover: 0.2 },
    ],
    pipes: [{ from: 'n1', to: 'n2', od: 0.326 }],
  });

const softClay: Soil = { id: 'clay', bearing: 47_880, unitWeight: 17_000, frictionAngle: 0, cohesion: 12_000 };

describe('a fitting where no block fits and restrained joints are sized instead', () => {
  it('is issued with the joints and a warning saying why, not as not adequate, when the joints hold', () => {
    const a = analyse(cappedShallow(softClay));
    const f = a.byNode.get('n2')!;
    expect(f.restraint.block).toBeNull();
    expect(f.restraint.restrainedLength).toBeGreaterThan(0);
    const none = f.diagnostics.find((d) => d.code === 'block.none-holds')!;
    expect(none.severity).toBe('warning');
    expect(none.values.thrust).toBeCloseTo((1e6 * Math.PI * 0.326 ** 2) / 4, 0);
    expect(f.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    const row = scheduleOf(a).fittings.find((r) => r.node === 'n2')!;
    expect(restraintSummary(row, 'si', 0.05)).toMatch(/^restrain \d+\.\d m toward A1/);
  });

  it('is not adequate where the joints cannot hold either (no friction, no cohesion)', () => {
    const a = analyse(cappedShallow({ ...softClay, cohesion: 0 }));
    const f = a.byNode.get('n2')!;
    expect(f.diagnostics.filter((d) => d.severity === 'error').map((d) => d.code)).toContain('joints.no-resistance');
    const row = scheduleOf(a).fittings.find((r) => r.node === 'n2')!;
    expect(restraintSummary(row, 'si', 0.05)).toMatch(/^NOT ADEQUATE/);
  });
});
