import { describe, it, expect } from 'vitest';
import { defaultPipe, pipeChoice } from './pipeChoice.js';

describe('the pipe an imported run is given', () => {
  const fallback = defaultPipe(); // EN 545 ductile iron DN200, OD 222 mm (EN 545 table)

  it('keeps a named material when the named size is in none of its series, and says which size it took', () => {
    const { pipe, problem } = pipeChoice({ material: 'PVC', size: 'huge' }, fallback);
    expect(pipe.material).toBe('pvc');
    expect(problem).toMatch(
      /^size "huge" is not in .*pvc.*; took \S+ \S+, the size nearest the default pipe's: check it$/,
    );
    // The first PVC series is AWWA C900 DR18, whose sizes have the ductile-iron outside diameters: 6 in is
    // 6.90 in (175 mm), 8 in is 9.05 in (229.9 mm), 10 in is 11.10 in (282 mm) (from memory). Nearest to
    // the default's 222 mm: the 8 in.
    expect(pipe).toMatchObject({ series: 'pvc-c900-dr18', nominal: '8' });
    expect(pipe.outsideDiameter).toBeCloseTo(9.05 * 0.0254, 9);
  });

  it('says so plainly when the catalogue has no pipe of the named material', () => {
    const { pipe, problem } = pipeChoice({ material: 'steel', size: '400' }, fallback);
    expect(pipe).toEqual(fallback);
    expect(problem).toBe(
      "no pipe in the catalogue is steel; took di-en545 DN200 (ductile-iron): set this run's pipe by hand",
    );
  });

  it('takes a named size of the named material as it is written', () => {
    expect(pipeChoice({ material: 'ductile iron', size: 'DN 300' }, fallback)).toMatchObject({
      pipe: { series: 'di-en545', nominal: 'DN300', material: 'ductile-iron' },
      problem: null,
    });
  });
});
