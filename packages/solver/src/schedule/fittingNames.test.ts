import { describe, expect, it } from 'vitest';
import { fittingTitle } from './fittingNames.js';
import { analyse } from '../analysis/analyse.js';
import { scheduleOf } from './scheduleOf.js';
import { route } from '../../test/projectBuilder.js';

const branch = (kind: 'tee' | 'wye' | 'cross', branchAngle: number) =>
  fittingTitle({ kind, deflection: null, branchAngle });

describe('fittingTitle', () => {
  it('names a branch by its angle to a tenth of a degree', () => {
    // A main due east falling 0.15 m in 30 m and a spur due south falling 0.25 m in 50 m (hand
    // calculation): cos θ = (−0.15)·(−0.25) / (|(30, 0, −0.15)|·|(0, −50, −0.25)|), θ = 89.9986°.
    const cos = (-0.15 * -0.25) / (Math.hypot(30, 0.15) * Math.hypot(50, 0.25));
    const theta = (Math.acos(cos) * 180) / Math.PI;
    expect(theta).toBeLessThan(89.999);
    expect(branch('tee', theta)).toBe('Tee, branch at 90°');
    expect(branch('tee', 84.37)).toBe('Tee, branch at 84.4°');
    expect(branch('wye', 44.96)).toBe('Wye, branch at 45°');
  });

  it('keeps a bend’s deflection to a hundredth, where the standard 11.25° needs it', () => {
    expect(fittingTitle({ kind: 'bend', deflection: 11.25, branchAngle: null })).toBe('Bend 11.25°');
    expect(fittingTitle({ kind: 'bend', deflection: 16.314, branchAngle: null, profile: 'crest' })).toBe(
      'Bend 16.31° crest',
    );
  });
});

describe('a crest is named by the line’s grade, not by the way its thrust points', () => {
  // n1 (0 m) rises 10 m over 100 m to n2, then runs level: the grade turns down by atan(0.1) = 5.71° at n2,
  // a high point. The case's datum lies 150 m below (pressure 0 there), so n2 stands above the hydraulic
  // grade: the gauge pressure is held at the vapour floor and the thrust points down.
  const crest = (datum: number) =>
    scheduleOf(
      analyse(
        route({
          cases: [{ id: 'working', pressure: 0, datumElevation: datum }],
          nodes: [
            { id: 'n1', x: 0, y: 0, z: 100 },
            { id: 'n2', x: 100, y: 0, z: 110 },
            { id: 'n3', x: 200, y: 0, z: 110 },
          ],
          pipes: [
            { from: 'n1', to: 'n2', od: 0.326 },
            { from: 'n2', to: 'n3', od: 0.326 },
          ],
        }),
      ),
    ).fittings.find((f) => f.node === 'n2')!;
  it('under a vacuum the high point still reads crest, its thrust downward', () => {
    const f = crest(-40);
    expect(fittingTitle(f)).toBe('Bend 5.71° crest');
    expect(f.downwardThrust).toBeGreaterThan(f.upwardThrust);
    expect(f.diagnostics.map((d) => d.code)).toContain('pressure.vapour-floor');
  });
  it('under pressure too', () => expect(fittingTitle(crest(300))).toBe('Bend 5.71° crest'));
});

describe('a bend is named as the fitting a crew orders', () => {
  // Standard bends 90°, 45°, 22½°, 11¼° (AWWA C110/A21.10, from memory); joints take up 0.5° (register:
  // fitting.straight-tolerance).
  const bend = (deflection: number) => fittingTitle({ kind: 'bend', deflection, branchAngle: null });
  it('within the joints’ tolerance of a standard bend, by the standard angle', () => {
    expect(bend(89.97)).toBe('Bend 90°');
    expect(bend(45.01)).toBe('Bend 45°');
    expect(bend(22.9)).toBe('Bend 22.5°');
  });
  it('farther off, by the angle drawn (its odd-bend finding names the nearest)', () => {
    expect(bend(47)).toBe('Bend 47°');
    expect(bend(4.06)).toBe('Bend 4.06°');
  });
});
