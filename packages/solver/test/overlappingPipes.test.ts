import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import type { Project } from '../src/model/projectSchema.js';
import { overlappingPipes } from '../src/model/crossChecks.js';
import { overlappingPipesOracle } from './oracle/overlapOracle.js';

/**
 * Small random networks on a coarse grid, so that repeated pairs (either way round), pipes folded back
 * along one line, zero-length pipes, loops and pipes to missing nodes all occur.
 */
const network = fc
  .integer({ min: 2, max: 8 })
  .chain((n) =>
    fc.record({
      nodes: fc.array(
        fc.record({
          x: fc.integer({ min: -2, max: 2 }),
          y: fc.integer({ min: -2, max: 2 }),
          z: fc.integer({ min: 0, max: 1 }),
        }),
        { minLength: n, maxLength: n },
      ),
      pipes: fc.array(fc.tuple(fc.integer({ min: 0, max: n }), fc.integer({ min: 0, max: n })), { maxLength: 14 }),
      ids: fc.array(fc.constantFrom('a', 'b', 'Z', 'é', 'n10', 'n9', ''), { minLength: n, maxLength: n }),
    }),
  )
  .map(({ nodes, pipes, ids }) => ({
    nodes: nodes.map((c, i) => ({ id: `${ids[i]}${i}`, x: c.x * 3, y: c.y * 3, elevation: 100 + c.z * 3 })),
    pipes: pipes.map(([f, t], i) => ({
      id: `p${i}`,
      from: f < ids.length ? `${ids[f]}${f}` : 'missing',
      to: t < ids.length ? `${ids[t]}${t}` : 'missing',
    })),
  }));

const problems = (check: typeof overlappingPipes, p: Project) => {
  const out: string[] = [];
  check(p, (path, message) => out.push(`${path.join('.')}: ${message}`));
  return out;
};

describe('overlappingPipes, written as plain loops, finds what the check it replaced found', () => {
  it('the same problems in the same order on random networks (fast-check, fixed seed)', () => {
    let found = 0;
    fc.assert(
      fc.property(network, (net) => {
        const p = net as unknown as Project;
        const expected = problems(overlappingPipesOracle, p);
        found += expected.length;
        expect(problems(overlappingPipes, p)).toEqual(expected);
      }),
      { seed: 20261203, numRuns: 2000 },
    );
    expect(found).toBeGreaterThan(500);
  });
});
