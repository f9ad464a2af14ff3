import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { analyse } from './analyse.js';
import { parseProject } from '../model/parseProject.js';
import { route } from '../../test/projectBuilder.js';

const found = (p: ReturnType<typeof route>, node: string, code: string) =>
  analyse(p)
    .byNode.get(node)!
    .diagnostics.find((d) => d.code === code);

describe('water in equals water out (continuity)', () => {
  it('finds no imbalance on the demo, whose flows were laid out to balance', () => {
    const demo = parseProject(
      JSON.parse(
        readFileSync(fileURLToPath(new URL('../../../../public/demo/larkspur-rise.json', import.meta.url)), 'utf8'),
      ),
    );
    expect(demo.ok).toBe(true);
    if (!demo.ok) return;
    for (const f of analyse(demo.project).fittings)
      expect(f.diagnostics.filter((d) => d.code === 'flow.unbalanced' || d.code === 'flow.into-cap')).toEqual([]);
  });

  it('warns of a flow into a cap and of a tee whose flows do not add up', () => {
    const p = route({
      nodes: [
        { id: 'a', x: 0, y: 0, end: 'tie-in' },
        { id: 't', x: 10, y: 0 },
        { id: 'b', x: 20, y: 0 },
        { id: 'c', x: 10, y: 10, end: 'tie-in' },
      ],
      pipes: [
        { from: 'a', to: 't', od: 0.222, flow: 0.05 },
        { from: 't', to: 'b', od: 0.222, flow: 0.02 },
        { from: 't', to: 'c', od: 0.17, flow: 0.01 },
      ],
    });
    // Continuity by hand: 0.05 m³/s in at t, 0.02 + 0.01 out, so 0.02 m³/s more arrives than leaves.
    expect(found(p, 'b', 'flow.into-cap')?.values.flow).toBeCloseTo(0.02, 12);
    expect(found(p, 't', 'flow.unbalanced')?.values.net).toBeCloseTo(-0.02, 12);
  });
});
