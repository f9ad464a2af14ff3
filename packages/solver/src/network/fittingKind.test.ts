import { describe, it, expect } from 'vitest';
import { analyse } from '../analysis/analyse.js';
import { route } from '../../test/projectBuilder.js';

const kinds = (p: ReturnType<typeof route>) =>
  Object.fromEntries(analyse(p).fittings.map((f) => [f.node.id, f.geometry.kind]));

describe('which fitting stands at each node', () => {
  it('names bends, dead ends and leaves straight joints out (project-format.md: under 0.5°)', () => {
    const p = route({
      nodes: [
        { id: 'a', x: 0, y: 0 },
        { id: 'b', x: 10, y: 0 },
        { id: 'c', x: 20, y: 0.05 }, // 0.29° off line: straight
        { id: 'd', x: 30, y: 10 },
        { id: 'e', x: 30, y: 20, end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 'b', od: 0.326 },
        { from: 'b', to: 'c', od: 0.326 },
        { from: 'c', to: 'd', od: 0.326 },
        { from: 'd', to: 'e', od: 0.326 },
      ],
    });
    expect(kinds(p)).toEqual({ a: 'dead-end', c: 'bend', d: 'bend' });
  });

  it('counts a deflection of exactly 0.5° as a bend, though acos gives 0.49999999999986°', () => {
    const t = (0.5 * Math.PI) / 180;
    const p = route({
      nodes: [
        { id: 'a', x: 0, y: 0, end: 'tie-in' },
        { id: 'b', x: 50, y: 0 },
        { id: 'c', x: 50 + 50 * Math.cos(t), y: 50 * Math.sin(t), end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 'b', od: 0.326 },
        { from: 'b', to: 'c', od: 0.326 },
      ],
    });
    expect(kinds(p)).toEqual({ b: 'bend' });
  });

  it('reads a 90° bend from coordinates rounded to 6 decimals as 90°, not sharper', () => {
    // 45° each way from the bend at (50, 0), the far ends at 6 decimals as a survey file gives them:
    // 35.355339 and 35.355340 for 50·sin 45° = 35.3553390593, which turns the bend 90.0000008°
    const p = route({
      nodes: [
        { id: 'a', x: 14.644661, y: -35.35534, end: 'tie-in' },
        { id: 'b', x: 50, y: 0, restraint: 'joints' },
        { id: 'c', x: 85.355339, y: -35.355339, end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 'b', od: 0.326 },
        { from: 'b', to: 'c', od: 0.326 },
      ],
    });
    const b = analyse(p).byNode.get('b')!;
    expect(b.geometry.deflection).toBeGreaterThan(90);
    expect(b.diagnostics.map((d) => d.code)).not.toContain('joints.sharp-bend');
  });

  it('reads a right angle drawn with nodes kept to the millimetre as 90°, not sharper, and 90.2° as sharper', () => {
    // out 200 m north-west of (0, 0) then 200 m on at a right angle, each node kept to the millimetre:
    // (−141.421, 141.421) → (0.003, 282.839) turns 90.0012° at the bend; a far node 0.7 m further
    // round turns 90.2° (tan⁻¹(0.7/200) = 0.2005°, hand calculation)
    const bendAt = (x: number, y: number) => {
      const p = route({
        nodes: [
          { id: 'a', x: 0, y: 0, end: 'tie-in' },
          { id: 'b', x: -141.421, y: 141.421, restraint: 'joints' },
          { id: 'c', x, y, end: 'tie-in' },
        ],
        pipes: [
          { from: 'a', to: 'b', od: 0.222 },
          { from: 'b', to: 'c', od: 0.222 },
        ],
      });
      return analyse(p).byNode.get('b')!;
    };
    const right = bendAt(0.003, 282.839);
    expect(right.geometry.deflection).toBeGreaterThan(90.001);
    expect(right.diagnostics.map((d) => d.code)).not.toContain('joints.sharp-bend');
    const sharper = bendAt(0.003 + 0.7 * Math.SQRT1_2, 282.839 - 0.7 * Math.SQRT1_2);
    expect(sharper.geometry.deflection).toBeCloseTo(90.2, 1);
    expect(sharper.diagnostics.map((d) => d.code)).toContain('joints.sharp-bend');
  });

  it('tells a reducer, a reducing bend and a closed valve apart', () => {
    const p = route({
      nodes: [
        { id: 'a', x: 0, y: 0, end: 'tie-in' },
        { id: 'v', x: 10, y: 0, valve: true },
        { id: 'r', x: 20, y: 0 },
        { id: 'rb', x: 30, y: 0 },
        { id: 'e', x: 40, y: 10, end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 'v', od: 0.326 },
        { from: 'v', to: 'r', od: 0.326 },
        { from: 'r', to: 'rb', od: 0.222 },
        { from: 'rb', to: 'e', od: 0.17 },
      ],
    });
    expect(kinds(p)).toEqual({ v: 'valve', r: 'reducer', rb: 'reducing-bend' });
  });

  it('calls a square branch a tee, a 45° branch a wye and four pipes a cross', () => {
    const p = route({
      nodes: [
        { id: 'w0', x: -10, y: 0, end: 'tie-in' },
        { id: 't', x: 0, y: 0 },
        { id: 'y', x: 20, y: 0 },
        { id: 'x', x: 40, y: 0 },
        { id: 'x1', x: 50, y: 0, end: 'tie-in' },
        { id: 'tb', x: 0, y: 10, end: 'tie-in' },
        { id: 'yb', x: 30, y: 10, end: 'tie-in' },
        { id: 'xn', x: 40, y: 10, end: 'tie-in' },
        { id: 'xs', x: 40, y: -10, end: 'tie-in' },
      ],
      pipes: [
        { from: 'w0', to: 't', od: 0.326 },
        { from: 't', to: 'y', od: 0.326 },
        { from: 'y', to: 'x', od: 0.326 },
        { from: 'x', to: 'x1', od: 0.326 },
        { from: 't', to: 'tb', od: 0.17 },
        { from: 'y', to: 'yb', od: 0.17 },
        { from: 'x', to: 'xn', od: 0.222 },
        { from: 'x', to: 'xs', od: 0.17 },
      ],
    });
    const a = analyse(p);
    expect(kinds(p)).toEqual({ t: 'tee', y: 'wye', x: 'cross' });
    expect(a.byNode.get('y')?.geometry.branchAngle).toBeCloseTo(45, 9);
    // The main runs w0 → t → y → x → x1 (straight on at each fitting); branches are lettered as met.
    expect(['w0', 't', 'y', 'x', 'x1'].map((n) => a.marks.get(n))).toEqual(['A1', 'A2', 'A3', 'A4', 'A5']);
    expect(['tb', 'yb', 'xn', 'xs'].map((n) => a.marks.get(n))).toEqual(['B1', 'C1', 'D1', 'E1']);
  });

  it('names a junction whose run turns by its branch (a square one a tee), and flags the turn', () => {
    // The run turns 24° at j (in along +x, out 24° left); the branch leaves square to the incoming run:
    // 90° from the first run leg, 66° from the second, so the branch folds to 90° against the run axis.
    const t = (24 * Math.PI) / 180;
    const p = route({
      nodes: [
        { id: 'a', x: -20, y: 0, end: 'tie-in' },
        { id: 'j', x: 0, y: 0 },
        { id: 'b', x: 20 * Math.cos(t), y: 20 * Math.sin(t), end: 'tie-in' },
        { id: 'c', x: 0, y: -15, end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 'j', od: 0.326 },
        { from: 'j', to: 'b', od: 0.326 },
        { from: 'j', to: 'c', od: 0.17 },
      ],
    });
    const j = analyse(p).byNode.get('j')!;
    expect(j.geometry.kind).toBe('tee');
    expect(j.diagnostics.find((d) => d.code === 'fitting.bent-run')?.values.turn).toBeCloseTo(24, 9);
  });

  it('splits a vertical bend into its plan and slope changes', () => {
    // level along +x, then rising 1 in 1 while turning 90° in plan: plan change 90°, slope change +45°
    const p = route({
      nodes: [
        { id: 'n1', x: 0, y: 0, z: 100 },
        { id: 'n2', x: 10, y: 0, z: 100 },
        { id: 'n3', x: 10, y: 10, z: 110 },
      ],
      pipes: [
        { from: 'n1', to: 'n2', od: 0.326 },
        { from: 'n2', to: 'n3', od: 0.326 },
      ],
    });
    const g = analyse(p).byNode.get('n2')!.geometry;
    expect(g.horizontalDeflection).toBeCloseTo(90, 9);
    expect(g.verticalDeflection).toBeCloseTo(45, 9);
    expect(g.deflection).toBeCloseTo(90, 9); // cos Δ = (1,0,0)·(0,1,1)/√2 = 0
  });
});
