import { describe, expect, it } from 'vitest';
import { analyse } from './analyse.js';
import { calculationRecord } from './calculationRecord.js';
import { routeInput, validProject } from '../../test/projectBuilder.js';

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
