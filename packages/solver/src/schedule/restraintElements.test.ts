import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { scheduleOf } from './scheduleOf.js';
import { restraintElements } from './restraintElements.js';
import { scheduleView } from './scheduleView.js';
import { INCH, POUND_PER_CUBIC_FOOT_WEIGHT } from '../units/conversions.js';
import { psi, route } from '../../test/projectBuilder.js';
import { expectClose } from '../../test/tolerance.js';
import { WORDING } from '../diagnostics/codeMeanings.js';

/**
 * A vertical bend with one leg level: in along +x, out along +x turned 45° down (crest) or up (sag).
 * The thrust is −p·A·(n₁ + n₂) with n₁ = (−1, 0, 0) and n₂ = (cos 45°, 0, ∓sin 45°) from the node, so
 * T = p·A·(1 − cos 45°, 0, ± sin 45°): the horizontal part points along +x — east, toward the outside
 * of the bend — and the vertical part up at a crest, down at a sag (statics of the momentum balance).
 */
const vertical = (sign: 1 | -1) =>
  route({
    pressure: psi(150),
    soils: [{ id: 'sand', bearing: 95761, unitWeight: 19000, frictionAngle: 36, cohesion: 0 }],
    design: { concreteUnitWeight: 150 * POUND_PER_CUBIC_FOOT_WEIGHT },
    nodes: [
      { id: 'a', x: -20, y: 0, z: 100 },
      { id: 'c', x: 0, y: 0, z: 100 },
      { id: 'b', x: 10, y: 0, z: 100 - sign * 10 },
    ],
    pipes: [
      { from: 'a', to: 'c', od: 13.2 * INCH },
      { from: 'c', to: 'b', od: 13.2 * INCH },
    ],
  });

describe('vertical bends: thrust parts apart, each restraint element with its own force and way', () => {
  it('marks a crest: the block bears east for the horizontal part, the anchor holds the upward part', () => {
    const a = analyse(vertical(1));
    const row = scheduleOf(a).fittings.find((f) => f.node === 'c')!;
    expect(row.profile).toBe('crest');
    const p = row.designPressure;
    const area = (Math.PI / 4) * (13.2 * INCH) ** 2;
    expectClose(row.horizontalThrust, p * area * (1 - Math.SQRT1_2), 1e-9);
    expectClose(row.upwardThrust, p * area * Math.SQRT1_2, 1e-9);
    expect(row.downwardThrust).toBe(0);
    const els = restraintElements(row, 'si', 0.05);
    const block = els.find((e) => e.kind === 'block')!;
    const anchor = els.find((e) => e.kind === 'anchor')!;
    expect(block.bears).toBeCloseTo(90, 9); // east, the outside of the bend
    expectClose(block.force!, row.horizontalThrust, 1e-12);
    expect(anchor.bears).toBe('up');
    expectClose(anchor.force!, row.upwardThrust, 1e-12);
    const view = scheduleView(a, 'si', WORDING);
    const cells = view.rows.find((r) => r.fitting.node === 'c')!.cells;
    expect(cells.fitting).toBe('Bend 45° crest');
    expect(cells.restraint).toMatch(/^block .* bears 90° E, [\d.]+ kN; anchor .* holds [\d.]+ kN up$/);
  });

  it('marks a sag: the pad bears the downward part, nothing is held up', () => {
    const a = analyse(vertical(-1));
    const row = scheduleOf(a).fittings.find((f) => f.node === 'c')!;
    expect(row.profile).toBe('sag');
    expect(row.upwardThrust).toBe(0);
    const els = restraintElements(row, 'si', 0.05);
    expect(els.some((e) => e.kind === 'anchor')).toBe(false);
    // The downward part (p·A·sin 45°) needs more than the block's base: a pad of the trench's width.
    const pad = els.find((e) => e.kind === 'trenchBottom')!;
    expect(pad.bears).toBe('down');
    expectClose(pad.force!, row.downwardThrust, 1e-12);
    const view = scheduleView(a, 'si', WORDING);
    expect(view.rows.find((r) => r.fitting.node === 'c')!.cells.fitting).toBe('Bend 45° sag');
  });

  it('says when the block’s base bears a sag’s downward part, since no pad is sized for it', () => {
    // In level, out rising 6 m over 30 m: θ = atan(6/30) = 11.31°. T_down = p·A·sin θ (the downward
    // part of −p·A·(n₁ + n₂)); with OD 0.222 m at 1 MPa that is 1e6 · 0.03871 · 0.19612 = 7.59 kN, which
    // a 0.25 m wide block's 0.60 m base holds at the sand's 191.5 kPa (1.5 · 7.59 / 191.5 = 0.059 m²).
    const a = analyse(
      route({
        pressure: 1e6,
        nodes: [
          { id: 'a', x: -30, y: 0, z: 100 },
          { id: 'c', x: 0, y: 0, z: 100 },
          { id: 'b', x: 30, y: 0, z: 106 },
        ],
        pipes: [
          { from: 'a', to: 'c', od: 0.222 },
          { from: 'c', to: 'b', od: 0.222 },
        ],
      }),
    );
    const row = scheduleOf(a).fittings.find((f) => f.node === 'c')!;
    expect(row.profile).toBe('sag');
    const area = (Math.PI / 4) * 0.222 ** 2;
    expectClose(row.downwardThrust, 1e6 * area * Math.sin(Math.atan(6 / 30)), 1e-9);
    expect(row.restraint.block).not.toBeNull();
    expect(row.restraint.trenchBottom).toBeNull();
    const block = restraintElements(row, 'si', 0.05).find((e) => e.kind === 'block')!;
    const said = /and ([\d.]+) kN down on its base/.exec(block.forceText);
    expect(said).not.toBeNull();
    expect(Number(said![1])).toBeCloseTo(row.downwardThrust / 1000, 1);
    const cells = scheduleView(a, 'si', WORDING).rows.find((r) => r.fitting.node === 'c')!.cells;
    expect(cells.restraint).toContain(`and ${said![1]} kN down on its base`);
  });

  it('marks no crest or sag on a plan bend', () => {
    const plan = route({
      pressure: psi(150),
      nodes: [
        { id: 'a', x: -20, y: 0 },
        { id: 'c', x: 0, y: 0 },
        { id: 'b', x: 10, y: 10 },
      ],
      pipes: [
        { from: 'a', to: 'c', od: 13.2 * INCH },
        { from: 'c', to: 'b', od: 13.2 * INCH },
      ],
    });
    expect(scheduleOf(analyse(plan)).fittings[0]!.profile).toBeNull();
  });
});
