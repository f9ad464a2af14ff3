import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { analyse } from './analyse.js';
import { parseProject } from '../model/parseProject.js';
import { route } from '../../test/projectBuilder.js';

const warned = (p: ReturnType<typeof route>, node: string, text: RegExp) =>
  analyse(p)
    .byNode.get(node)!
    .warnings.some((w) => text.test(w));

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
      expect(f.warnings.filter((w) => /flow/i.test(w) && /balance|cap/.test(w))).toEqual([]);
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
    expect(warned(p, 'b', /runs into this cap/)).toBe(true);
    expect(warned(p, 't', /do not balance \(20\.0 L\/s more arrives than leaves\)/)).toBe(true);
  });
});
