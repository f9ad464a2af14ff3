import { describe, expect, it } from 'vitest';
import { analyse } from './analyse.js';
import { calculationRecord } from './calculationRecord.js';
import { demoInput, routeInput, validProject } from '../../test/projectBuilder.js';

// A 45° bend restrained by joints on DN300-sized pipe, 1 MPa: the record's restrained-length steps name
// the register entry of their equation. Which entry and its standing are read from docs/provenance.md
// (the register's page): the bend equation is not verified, so the record says against what.
const project = validProject(
  routeInput({
    nodes: [
      { id: 'a', x: 0, y: 0 },
      { id: 'b', x: 30, y: 0, restraint: 'joints' },
      { id: 'c', x: 30 + 30 * Math.SQRT1_2, y: 30 * Math.SQRT1_2 },
    ],
    pipes: [
      { from: 'a', to: 'b', od: 0.326, material: 'ductile-iron' },
      { from: 'b', to: 'c', od: 0.326, material: 'ductile-iron' },
    ],
  }),
);

describe('a fitting’s calculation record', () => {
  const bend = analyse(project).fittings.find((f) => f.node.id === 'b')!;
  const record = calculationRecord(project, bend);

  it('words the restrained length’s equation from the register, with what it was not verified against', () => {
    const steps = record.filter((s) => s.title.startsWith('Restrained length along'));
    expect(steps.map((s) => s.title)).toEqual(['Restrained length along p1', 'Restrained length along p2']);
    for (const s of steps) {
      // each leg of a bend holds the whole resultant T = 2·p·A·sin(θ/2) (the bend equation's T)
      expect(s.inputs.find((v) => v.symbol === 'T')!.label).toBe('governing thrust');
      expect(s.reference).toMatch(
        /^Restrained length at a horizontal bend L = .*, not verified against DIPRA, Thrust Restraint Design for Ductile Iron Pipe.*, horizontal bend equation$/,
      );
    }
  });

  it('gives every step a reference in words, and nothing of how the sizing named it', () => {
    for (const s of record) {
      expect(Object.keys(s)).toEqual(['title', 'formula', 'inputs', 'result', 'reference']);
      expect(s.reference.length).toBeGreaterThan(0);
    }
  });
});

describe('the demo’s records read whose block each step sizes', () => {
  const demo = validProject(demoInput());
  const a = analyse(demo);

  it('a valve whose thrust reverses: the opposite block’s steps say so, after the first block’s', () => {
    const valve = a.fittings.find((f) => f.restraint.reverseBlock)!;
    const titles = calculationRecord(demo, valve).map((s) => s.title);
    const first = titles.indexOf('Required bearing area');
    const opposite = titles.indexOf('Opposite block, for the reversed thrust: Required bearing area');
    expect(first).toBeGreaterThan(-1);
    expect(opposite).toBeGreaterThan(first);
    // every step of the second block is marked, none of the first block's
    expect(titles.filter((t) => t === 'Bearing face')).toHaveLength(1);
  });

  it('a block thickened for uplift ends with the volume at its thickness, the volume the schedule gives', () => {
    const held = a.fittings.filter((f) => f.restraint.block && f.restraint.block.upwardThrust > 0);
    expect(held.length).toBeGreaterThan(0);
    for (const f of held) {
      const step = calculationRecord(demo, f).find((s) => s.title === 'Concrete volume at that thickness')!;
      // V = b · h · t of the block as issued
      const b = f.restraint.block!;
      expect(step.result.value).toBeCloseTo(b.faceWidth * b.faceHeight * b.depth, 12);
      expect(step.result.value).toBe(b.concreteVolume);
    }
  });
});
