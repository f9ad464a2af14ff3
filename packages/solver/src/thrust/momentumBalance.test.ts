import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { bendRoute, inches, psi, route, LBF } from '../../test/projectBuilder.js';
import { expectClose, expectPrinted, expectVecClose } from '../../test/tolerance.js';

const thrustAt = (p: ReturnType<typeof route>, node: string) => {
  const f = analyse(p).byNode.get(node);
  if (!f) throw new Error(`no fitting at ${node}`);
  return f.envelope.governing;
};
const lbf = (v: readonly number[]) => Math.hypot(...v) / LBF;

describe('bends: T = 2·P·A·sin(Δ/2) (DIPRA; AWWA M23, M41) from the vector sum', () => {
  // CV-2 and CV-3: 12-in ductile iron, OD 13.20 in (AWWA C151, docs/check-values.md CV-35), 150 psi.
  it.each([
    [90, 29_030],
    [45, 15_711],
    [22.5, 8_009],
    [11.25, 4_024],
  ])('a %s° bend on 12-in DI at 150 psi pushes %i lb (CV-2, CV-3)', (deg, printed) => {
    const t = thrustAt(bendRoute(deg, inches(13.2), psi(150)), 'n2');
    expectPrinted(lbf(t.total), printed);
  });

  it('the AWWA M23 Example 1 bend, 8-in C900 at 150 psi and 45°, pushes 7,385 lb (CV-7, published)', () => {
    const t = thrustAt(bendRoute(45, inches(9.05), psi(150)), 'n2');
    expectPrinted(lbf(t.total), 7_385);
  });

  it('a DN300 EN 545 90° bend (OD 326 mm) at 10 bar pushes 118.04 kN (CV-9)', () => {
    const t = thrustAt(bendRoute(90, 0.326, 1e6), 'n2');
    expectClose(Math.hypot(...t.total), 118_040, 1e-4);
  });

  it('the thrust of a bend points to the outside, along the bisector (CV-24)', () => {
    // in along +x, out along +y: the outside of the bend is (+1, −1)/√2
    const t = thrustAt(bendRoute(90, 0.326, 1e6), 'n2');
    const m = Math.hypot(...t.total);
    expectVecClose([t.total[0] / m, t.total[1] / m, t.total[2] / m], [Math.SQRT1_2, -Math.SQRT1_2, 0], 1e-9);
  });
});

describe('dead ends, tees, reducers and crosses from the vector sum', () => {
  const P = psi(150);
  it('a 12-in DI dead end at 150 psi pushes 20,527 lb toward the cap (CV-4)', () => {
    const p = route({
      pressure: P,
      nodes: [
        { id: 'n1', x: 0, y: 0 },
        { id: 'n2', x: 10, y: 0 },
      ],
      pipes: [{ from: 'n1', to: 'n2', od: inches(13.2) }],
    });
    const t = thrustAt(p, 'n2');
    expectPrinted(lbf(t.total), 20_527);
    expect(t.total[0]).toBeGreaterThan(0);
  });

  it('a 12×8 DI tee at 150 psi pushes 9,649 lb away from the branch (CV-5)', () => {
    const p = route({
      pressure: P,
      nodes: [
        { id: 'a', x: -10, y: 0 },
        { id: 't', x: 0, y: 0 },
        { id: 'b', x: 10, y: 0 },
        { id: 'c', x: 0, y: 10 },
      ],
      pipes: [
        { from: 'a', to: 't', od: inches(13.2) },
        { from: 't', to: 'b', od: inches(13.2) },
        { from: 't', to: 'c', od: inches(9.05) },
      ],
    });
    const t = thrustAt(p, 't');
    expectPrinted(lbf(t.total), 9_649);
    expect(t.total[1]).toBeLessThan(0);
    expect(analyse(p).byNode.get('t')?.geometry.kind).toBe('tee');
  });

  it('a 12×8 DI reducer at 150 psi pushes 10,878 lb toward the small end (CV-6)', () => {
    const p = route({
      pressure: P,
      nodes: [
        { id: 'a', x: -10, y: 0 },
        { id: 'r', x: 0, y: 0 },
        { id: 'b', x: 10, y: 0 },
      ],
      pipes: [
        { from: 'a', to: 'r', od: inches(13.2) },
        { from: 'r', to: 'b', od: inches(9.05) },
      ],
    });
    const t = thrustAt(p, 'r');
    expectPrinted(lbf(t.total), 10_878);
    expect(t.total[0]).toBeGreaterThan(0);
  });

  it('a cross with 8-in and 6-in opposite branches at 150 psi pushes 4,040 lb toward the 6-in (CV-25)', () => {
    const p = route({
      pressure: P,
      nodes: [
        { id: 'a', x: -10, y: 0 },
        { id: 'x', x: 0, y: 0 },
        { id: 'b', x: 10, y: 0 },
        { id: 'n', x: 0, y: 10 },
        { id: 's', x: 0, y: -10 },
      ],
      pipes: [
        { from: 'a', to: 'x', od: inches(13.2) },
        { from: 'x', to: 'b', od: inches(13.2) },
        { from: 'x', to: 'n', od: inches(9.05) },
        { from: 'x', to: 's', od: inches(6.9) },
      ],
    });
    const t = thrustAt(p, 'x');
    expectPrinted(lbf(t.total), 4_040);
    expect(t.total[1]).toBeLessThan(0); // toward the 6-in branch, which runs south
  });

  it('a DN300 dead end at 10 bar pushes 83.47 kN (CV-10)', () => {
    const p = route({
      pressure: 1e6,
      nodes: [
        { id: 'n1', x: 0, y: 0 },
        { id: 'n2', x: 0, y: 10 },
      ],
      pipes: [{ from: 'n1', to: 'n2', od: 0.326 }],
    });
    expectClose(Math.hypot(...thrustAt(p, 'n2').total), 83_470, 1e-4);
  });
});

describe('dynamic thrust: ρ·Q²/a along each pipe', () => {
  it('a 90° bend, ID 0.300 m at 2 m/s, adds 399.1 N to 99,965 N of static thrust on the ID area (CV-14)', () => {
    const id = 0.3;
    const q = (2 * Math.PI * id * id) / 4;
    const p = route({
      pressure: 1e6,
      density: 998.2,
      design: { thrustArea: 'inside' },
      nodes: [
        { id: 'n1', x: -10, y: 0 },
        { id: 'n2', x: 0, y: 0 },
        { id: 'n3', x: 0, y: 10 },
      ],
      pipes: [
        { from: 'n1', to: 'n2', od: 0.326, id_: id, flow: q },
        { from: 'n2', to: 'n3', od: 0.326, id_: id, flow: q },
      ],
    });
    const t = thrustAt(p, 'n2');
    expectClose(Math.hypot(...t.dynamic), 399.1, 2e-4);
    expectClose(Math.hypot(...t.static), 99_965, 1e-5);
  });

  it('a reducing bend balances both components as worked by hand', () => {
    // Hand calculation (steady momentum equation, e.g. White, "Fluid Mechanics", ch. 3):
    // inlet DN250 (OD 0.274 m, ID 0.250 m) along +x, outlet DN200 (OD 0.222 m, ID 0.200 m) turned 60° left,
    // Q = 0.080 m³/s, p = 800 kPa at both ends, ρ = 1000 kg/m³, thrust on the OD areas.
    //   A1 = π/4·0.274² = 0.0589646 m²   A2 = π/4·0.222² = 0.0387076 m²
    //   a1 = π/4·0.250² = 0.0490874 m²   a2 = π/4·0.200² = 0.0314159 m²
    //   V1 = Q/a1 = 1.62975 m/s           V2 = Q/a2 = 2.54648 m/s
    //   p·A1 = 47,171.64 N   ρ·Q·V1 = 130.380 N   p·A2 = 30,966.05 N   ρ·Q·V2 = 203.718 N
    //   Fx = (p·A1 + ρQV1) − (p·A2 + ρQV2)·cos 60° = 47,302.02 − 31,169.77 × 0.5 = 31,717.14 N
    //   Fy = −(p·A2 + ρQV2)·sin 60° = −31,169.77 × 0.866025 = −26,993.81 N
    //   static part (31,688.62, −26,817.39) N, dynamic part (28.521, −176.425) N
    const r = (60 * Math.PI) / 180;
    const p = route({
      pressure: 800e3,
      density: 1000,
      nodes: [
        { id: 'a', x: -10, y: 0 },
        { id: 'rb', x: 0, y: 0 },
        { id: 'b', x: 10 * Math.cos(r), y: 10 * Math.sin(r) },
      ],
      pipes: [
        { from: 'a', to: 'rb', od: 0.274, id_: 0.25, flow: 0.08 },
        { from: 'rb', to: 'b', od: 0.222, id_: 0.2, flow: 0.08 },
      ],
    });
    const t = thrustAt(p, 'rb');
    expectVecClose(t.total, [31_717.14, -26_993.81, 0], 1e-6);
    expectVecClose(t.static, [31_688.62, -26_817.39, 0], 1e-6);
    expectVecClose(t.dynamic, [28.521, -176.425, 0], 1e-4);
    expect(analyse(p).byNode.get('rb')?.geometry.kind).toBe('reducing-bend');
  });
});
