import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { analyse } from '../../src/analysis/analyse.js';
import { parseProjectText } from '../../src/model/parseProject.js';
import { norm } from '../../src/geometry/vector.js';
import { expectClose } from '../tolerance.js';

interface Expected {
  title: string;
  handCalculation: string[];
  fittings: {
    node: string;
    /** N, the governing thrust */
    thrust: number;
    /** m per pipe; {} when none may be sized */
    restrainedLengths?: Record<string, number>;
    /** m², SF·T/σ: an issued block bears on at least this */
    blockFaceAreaAtLeast?: number;
  }[];
  diagnostics: { include: { code: string; pipe?: string; case?: string; node?: string }[]; exclude: string[] };
}

const dir = fileURLToPath(new URL('.', import.meta.url));
const names = readdirSync(dir)
  .filter((f) => f.endsWith('.project.json'))
  .map((f) => f.replace('.project.json', ''));

describe('golden projects (packages/solver/test/golden)', () => {
  it('has the four golden projects, each with its expected schedule and hand calculation', () => {
    expect(names.sort()).toEqual(['en545-ratings', 'm23-example-1', 'pvc-limits', 'restrained-iron']);
  });

  for (const name of names) {
    const expected = JSON.parse(readFileSync(`${dir}${name}.expected.json`, 'utf8')) as Expected;
    it(`${name}: ${expected.title}`, () => {
      expect(expected.handCalculation.length).toBeGreaterThan(0);
      const parsed = parseProjectText(readFileSync(`${dir}${name}.project.json`, 'utf8'));
      if (!parsed.ok) throw new Error(`${name} does not parse`);
      const a = analyse(parsed.project);
      const all = [...a.diagnostics, ...a.fittings.flatMap((f) => f.diagnostics)];
      for (const e of expected.fittings) {
        const f = a.byNode.get(e.node);
        if (!f) throw new Error(`${name}: no fitting at ${e.node}`);
        // published and hand values are given to 0.1 N or better: 1e-5 relative
        expectClose(norm(f.envelope.governing.total), e.thrust, 1e-5);
        if (e.restrainedLengths) {
          const got = Object.fromEntries(f.restraint.restrainedLegs.map((l) => [l.pipe, l.length]));
          expect(Object.keys(got).sort()).toEqual(Object.keys(e.restrainedLengths).sort());
          for (const [pipe, length] of Object.entries(e.restrainedLengths)) expectClose(got[pipe]!, length, 1e-4);
        }
        if (e.blockFaceAreaAtLeast !== undefined) {
          const block = f.restraint.block;
          if (block)
            expect(block.faceWidth * block.faceHeight).toBeGreaterThanOrEqual(e.blockFaceAreaAtLeast * (1 - 1e-9));
          // no block issued: the fitting must then say that its restraint is not adequate
          else expect(f.diagnostics.some((d) => d.severity === 'error')).toBe(true);
        }
      }
      for (const want of expected.diagnostics.include) {
        const hit = all.some(
          (d) =>
            d.code === want.code &&
            (want.pipe === undefined || d.subject.pipe === want.pipe) &&
            (want.case === undefined || d.subject.case === want.case) &&
            (want.node === undefined || d.subject.node === want.node),
        );
        expect(hit, `${name}: expected ${JSON.stringify(want)}`).toBe(true);
      }
      for (const code of expected.diagnostics.exclude) expect(all.map((d) => d.code)).not.toContain(code);
    });
  }
});
