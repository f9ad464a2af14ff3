import { describe, it, expect } from 'vitest';
import { layingLengthText, restrainedJointCount, restrainedJointPositions } from './restrainedJoints.js';

// Hand count: with a joint at the fitting and one every laying length ℓ, the joints closer to the
// fitting than the restrained length L are those at 0, ℓ, 2ℓ … below L: ⌈L/ℓ⌉ of them.
describe('joints to restrain along a leg', () => {
  it('restrains the fitting joint alone when the first 6 m pipe already covers 5 m or exactly 6 m', () => {
    expect(restrainedJointCount(5, 6)).toBe(1);
    expect(restrainedJointCount(6, 6)).toBe(1);
    expect(restrainedJointCount(6 + 1e-12, 6)).toBe(1); // a rounding hair is not another pipe
  });

  it('restrains two joints for 6.2 m of 6 m pipes (at 0 and 6 m) and three for 12.01 m', () => {
    expect(restrainedJointPositions(6.2, 6)).toEqual([0, 6]);
    expect(restrainedJointPositions(12.01, 6)).toEqual([0, 6, 12]);
  });

  it('counts 20 ft pipes in feet as well: 45 ft needs joints at 0, 20 and 40 ft', () => {
    const ft = 0.3048;
    expect(restrainedJointPositions(45 * ft, 20 * ft).map((x) => Math.round(x / ft))).toEqual([0, 20, 40]);
  });

  it('restrains nothing for no restrained length', () => {
    expect(restrainedJointCount(0, 6)).toBe(0);
    expect(restrainedJointPositions(0, 6)).toEqual([]);
  });

  it('words the laying length to a tenth, as a length along the line: 6 m pipes are 19.7 ft, not 20 ft', () => {
    // 6 m / 0.3048 m per ft = 19.685 ft, to the nearest tenth 19.7 ft; 20 ft × 0.3048 = 6.096 m.
    expect(layingLengthText(6, 'us')).toBe('19.7 ft');
    expect(layingLengthText(6, 'si')).toBe('6.0 m');
    expect(layingLengthText(20 * 0.3048, 'us')).toBe('20.0 ft');
    expect(layingLengthText(20 * 0.3048, 'si')).toBe('6.1 m');
  });
});
