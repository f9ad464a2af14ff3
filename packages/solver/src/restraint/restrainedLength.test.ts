import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { scheduleOf } from '../schedule/scheduleOf.js';
import { route, type NodeSpec, type PipeSpec } from '../../test/projectBuilder.js';
import type { Soil } from '../model/projectSchema.js';
import { expectClose } from '../../test/tolerance.js';

// Hand calculation of the restrained-joint method, docs/check-values.md CV-34 (DIPRA form, from memory):
// 12-in DI, OD D = 0.33528 m, ID 0.3162 m, pipe weight W_p = 700 N/m (given), cover H = 1.2 m,
// soil γ = 18 kN/m³, φ = 30°, c = 0, f_φ = 0.6, trench type 4 (K_n = 0.85), P = 1 MPa, S_f = 1.5.
//   W_e = γ·H·D = 18000 × 1.2 × 0.33528 = 7,242.05 N/m
//   W_w = 9789.0 × π/4 × 0.3162² = 768.69 N/m
//   W = 2·W_e + W_p + W_w = 15,952.79 N/m;  δ = 0.6 × 30° = 18°
//   F_s = W·tan δ = 5,183.37 N/m
//   Kp = 3;  H_c = 1.2 + 0.16764 = 1.36764 m;  P_p = γ·H_c·Kp = 73,852.6 Pa;  R_s = K_n·P_p·D = 21,047.1 N/m
//   A = π/4·D² = 0.0882887 m²
//   90° bend:  L = S_f·P·A·tan 45° / (F_s + ½R_s) = 1.5 × 88,288.7 / 15,706.9 = 8.4315 m each side
//   dead end:  L = S_f·P·A / F_s = 132,433 / 5,183.37 = 25.550 m
const soils = [{ id: 's', bearing: 150e3, unitWeight: 18000, frictionAngle: 30, cohesion: 0, pipeFrictionRatio: 0.6 }];
const pipe = { od: 0.33528, id_: 0.3162, weightPerLength: 700, trenchType: 4 };

/** The fitting at b: a bend of `deflection`° at 1 MPa between two 30 m pipes of 0.326 m OD in `soil`. */
function bendIn(soil: Soil, deflection: number) {
  const t = (deflection * Math.PI) / 180;
  const p = route({
    pressure: 1e6,
    soils: [soil],
    nodes: [
      { id: 'a', x: -30, y: 0, end: 'tie-in' },
      { id: 'b', x: 0, y: 0 },
      { id: 'c', x: 30 * Math.cos(t), y: 30 * Math.sin(t), end: 'tie-in' },
    ],
    pipes: [
      { from: 'a', to: 'b', od: 0.326 },
      { from: 'b', to: 'c', od: 0.326 },
    ],
  });
  return analyse(p).byNode.get('b')!;
}

/**
 * CV-34's 90° bend on restrained joints at b, at 1 MPa: 30 m of the 12-in in from a tie-in at a, then
 * out along +y the nodes and pipes given (the first pipe from b, p2).
 */
const cv34Bend = (out: { nodes: NodeSpec[]; pipes: PipeSpec[] }) =>
  route({
    pressure: 1e6,
    soils,
    nodes: [{ id: 'a', x: -30, y: 0, end: 'tie-in' }, { id: 'b', x: 0, y: 0, restraint: 'joints' }, ...out.nodes],
    pipes: [{ from: 'a', to: 'b', ...pipe }, ...out.pipes],
  });

describe('restrained joint length (DIPRA method; docs/check-values.md CV-34)', () => {
  it('a 90° bend needs 8.43 m each side, as worked by hand', () => {
    const p = cv34Bend({
      nodes: [{ id: 'c', x: 0, y: 30, end: 'tie-in' }],
      pipes: [{ from: 'b', to: 'c', ...pipe }],
    });
    const r = analyse(p).byNode.get('b')!.restraint;
    expect(r.block).toBeNull();
    expect(r.restrainedLegs).toHaveLength(2);
    for (const leg of r.restrainedLegs) expectClose(leg.length, 8.4315, 1e-4);
  });

  it('a zone that runs through a reducer onto a smaller pipe grows by the resistance it lacks there', () => {
    // CV-34's 90° bend, with a reducer 5 m along one leg onto 8-in DI (OD 0.2299 m, ID 0.2180 m, given
    // W_p = 400 N/m, trench type 4), same soil and cover, worked as CV-34:
    //   W_e = 18000 × 1.2 × 0.2299 = 4,965.84 N/m;  W_w = 9789.0 × π/4 × 0.2180² = 365.38 N/m
    //   W = 10,697.06 N/m;  F_s = W·tan 18° = 3,475.68 N/m
    //   H_c = 1.31495 m;  P_p = 18000 × 1.31495 × 3 = 71,007.3 Pa;  R_s = 0.85 × P_p × 0.2299 = 13,875.9 N/m
    //   r₂ = F_s + ½R_s = 10,413.63 N/m, against r₁ = 15,706.92 N/m on the 12-in
    // The 8.4315 m the bend needs holds 8.4315·r₁; the 5 m of 12-in hold 5·r₁, the rest on 8-in:
    //   L = 5 + (8.4315 − 5) × 15,706.92 / 10,413.63 = 10.1758 m
    const p = cv34Bend({
      nodes: [
        { id: 'c', x: 0, y: 5, restraint: 'joints' },
        { id: 'd', x: 0, y: 60, end: 'tie-in' },
      ],
      pipes: [
        { from: 'b', to: 'c', ...pipe },
        { from: 'c', to: 'd', od: 0.2299, id_: 0.218, weightPerLength: 400, trenchType: 4 },
      ],
    });
    const legs = analyse(p).byNode.get('b')!.restraint.restrainedLegs;
    expectClose(legs.find((l) => l.pipe === 'p1')!.length, 8.4315, 1e-4);
    expectClose(legs.find((l) => l.pipe === 'p2')!.length, 10.1758, 1e-4);
  });

  it('a dead end needs 25.55 m along its pipe, and warns that it runs past the next node', () => {
    const p = route({
      pressure: 1e6,
      soils,
      nodes: [
        { id: 'a', x: 0, y: 0, end: 'tie-in' },
        { id: 'b', x: 20, y: 0, restraint: 'joints' },
      ],
      pipes: [{ from: 'a', to: 'b', ...pipe }],
    });
    const f = analyse(p).byNode.get('b')!;
    expectClose(f.restraint.restrainedLength!, 25.5496, 1e-4);
    expect(f.diagnostics.map((d) => d.code)).toContain('joints.encroach');
    // the warning gives the length the schedule gives: 25.5496 m rounded up to 25.6 m, not 25.5
    const row = scheduleOf(analyse(p)).fittings.find((r) => r.node === 'b')!;
    expect(row.warnings.join(' ')).toContain('restrained length 25.6 m');
  });

  it('longer for polyethylene-encased pipe (0.7 × friction, from memory)', () => {
    const make = (encasement: 'none' | 'polyethylene') =>
      route({
        pressure: 1e6,
        soils,
        nodes: [
          { id: 'a', x: 0, y: 0, end: 'tie-in' },
          { id: 'b', x: 40, y: 0, restraint: 'joints' },
        ],
        pipes: [{ from: 'a', to: 'b', ...pipe, encasement }],
      });
    const bare = analyse(make('none')).byNode.get('b')!.restraint.restrainedLength!;
    const wrapped = analyse(make('polyethylene')).byNode.get('b')!.restraint.restrainedLength!;
    expectClose(wrapped / bare, 1 / 0.7, 1e-9);
  });

  it('a muck node gets no block, a warning, and restrained joints instead', () => {
    const f = bendIn({ id: 'muck', bearing: 0, unitWeight: 14000, frictionAngle: 0, cohesion: 5000 }, 90);
    expect(f.restraint.block).toBeNull();
    expect(f.diagnostics.map((d) => d.code)).toContain('soil.no-bearing');
    expect(f.restraint.restrainedLength).toBeGreaterThan(0);
  });

  it('a soil with no shear strength (φ = 0, c = 0) holds a bend by nothing: not adequate, no length issued', () => {
    // Kp = Ka = 1: the soil pushes back on the moving side no harder than on the other (first principles)
    const f = bendIn({ id: 'peat', bearing: 0, unitWeight: 11000, frictionAngle: 0, cohesion: 0 }, 45);
    expect(f.geometry.kind).toBe('bend');
    expect(f.restraint.block).toBeNull();
    expect(f.diagnostics.map((d) => d.code)).toContain('joints.no-resistance');
    expect(f.restraint.restrainedLegs).toEqual([]);
    expect(f.restraint.restrainedLength).toBeNull();
  });

  it('zero thrust gives no restraint at all', () => {
    const p = route({
      pressure: 0,
      nodes: [
        { id: 'a', x: -30, y: 0, end: 'tie-in' },
        { id: 'b', x: 0, y: 0 },
        { id: 'c', x: 0, y: 30, end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 'b', od: 0.326 },
        { from: 'b', to: 'c', od: 0.326 },
      ],
    });
    const r = analyse(p).byNode.get('b')!.restraint;
    expect([r.block, r.anchor, r.trenchBottom, r.restrainedLength]).toEqual([null, null, null, null]);
  });

  it('is longer below groundwater: buoyancy and submerged soil, worked by hand (effective stress below the water table)', () => {
    // Water table at the ground: W_e = (γ − γw)·H·D = (18000 − 9789.0) × 1.2 × 0.33528 = 3,303.58 N/m;
    // buoyancy B = γw·π/4·D² = 864.26 N/m; W = 2·W_e + W_p + W_w − B = 7,211.60 N/m; F_s = W·tan 18° = 2,343.19 N/m;
    // dead end L = S_f·p·A/F_s = 1.5 × 1e6 × 0.0882887 / 2,343.19 = 56.518 m (dry: 25.550 m).
    const p = route({
      pressure: 1e6,
      soils,
      design: { groundwaterElevation: 105 },
      nodes: [
        { id: 'a', x: 0, y: 0, end: 'tie-in' },
        { id: 'b', x: 80, y: 0, restraint: 'joints' },
      ],
      pipes: [{ from: 'a', to: 'b', ...pipe }],
    });
    expectClose(analyse(p).byNode.get('b')!.restraint.restrainedLength!, 56.5183, 1e-4);
  });

  it('holds an upward-thrust crest by friction and the hold-down weight, worked by hand (form by analogy, to verify)', () => {
    // 45° crest, level leg in, leg out falling 45°: T = 2·p·A·sin 22.5° = 67,573.3 N, mostly upward.
    // F_s = 5,183.37 N/m (as above, dry); W_u = W_p + W_w + W_e = 700 + 768.69 + 7,242.05 = 8,710.74 N/m;
    // L = S_f·T/(2·cos 22.5°·(F_s + ½·W_u)) = 1.5 × 67,573.3 / (2 × 0.92388 × 9,538.74) = 5.7508 m each side.
    const p = route({
      pressure: 1e6,
      soils,
      nodes: [
        { id: 'a', x: -40, y: 0, z: 100, end: 'tie-in' },
        { id: 'c', x: 0, y: 0, z: 100, restraint: 'joints' },
        { id: 'b', x: 30, y: 0, z: 70, end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 'c', ...pipe },
        { from: 'c', to: 'b', ...pipe },
      ],
    });
    const r = analyse(p).byNode.get('c')!.restraint;
    expect(r.restrainedLegs).toHaveLength(2);
    for (const leg of r.restrainedLegs) expectClose(leg.length, 5.7508, 1e-4);
  });
});

describe('restrained joints by pipe material', () => {
  const bend = (material: string, soil: Record<string, unknown>) =>
    route({
      pressure: 1e6,
      soils: [{ id: 's', bearing: 150e3, unitWeight: 18000, frictionAngle: 30, ...soil }],
      nodes: [
        { id: 'a', x: -30, y: 0, end: 'tie-in' },
        { id: 'b', x: 0, y: 0, restraint: 'joints' },
        { id: 'c', x: 0, y: 30, end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 'b', ...pipe, material },
        { from: 'b', to: 'c', ...pipe, material },
      ],
    });

  it('refuses PVC, PE and steel joints without the project’s own friction ratio: an error naming f_φ', () => {
    for (const material of ['pvc', 'hdpe', 'steel', 'other']) {
      const f = analyse(bend(material, { cohesion: 0 })).byNode.get('b')!;
      expect(f.restraint.restrainedLegs).toEqual([]);
      const d = f.diagnostics.filter((x) => x.code === 'joints.no-material-basis');
      expect(d).toHaveLength(2); // one for each leg
      expect(d[0]!.severity).toBe('error');
      expect(d[0]!.values).toEqual({ frictionMissing: 1, adhesionMissing: 0 });
    }
  });

  it('asks for the adhesion ratio too in a soil with cohesion', () => {
    const f = analyse(bend('pvc', { cohesion: 20e3, pipeFrictionRatio: 0.5 })).byNode.get('b')!;
    expect(f.diagnostics.find((x) => x.code === 'joints.no-material-basis')!.values).toEqual({
      frictionMissing: 0,
      adhesionMissing: 1,
    });
  });

  it('sizes PVC with the ratio the project gives, the same hand-worked 8.43 m as iron of equal weight, and warns', () => {
    // with f_φ = 0.6 given and the pipe weight given, the material changes nothing in F_s or R_s
    const f = analyse(bend('pvc', { cohesion: 0, pipeFrictionRatio: 0.6 })).byNode.get('b')!;
    for (const leg of f.restraint.restrainedLegs) expectClose(leg.length, 8.4315, 1e-4);
    expect(f.diagnostics.map((x) => x.code)).toContain('joints.material-basis');
    expect(f.basis).toContain('joints.material-basis');
    expect(f.basis).not.toContain('joints.friction-ratio');
  });

  it('keeps the ductile-iron defaults, recorded as not verified against the manual', () => {
    const f = analyse(bend('ductile-iron', { cohesion: 0 })).byNode.get('b')!;
    expect(f.restraint.restrainedLegs).toHaveLength(2);
    expect(f.basis).toContain('joints.friction-ratio');
    expect(f.diagnostics.some((x) => x.code === 'joints.no-material-basis')).toBe(false);
  });
});
