import { describe, expect, it } from 'vitest';
import { fittingTitle } from './fittingNames.js';

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
