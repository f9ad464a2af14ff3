import { describe, it, expect } from 'vitest';
import { analyse, scheduleOf } from '@mainbrace/solver';
import { sizedForLine } from './sizedFor.js';
import { demoProject } from '../testFixtures.js';

describe('the crew page says what its restraints were sized for', () => {
  const project = demoProject();
  const fittings = scheduleOf(analyse(project)).fittings;

  it('names every pressure case with its gauge pressure and datum, the field test among them', () => {
    const line = sizedForLine(project, fittings, 'si');
    // The demo's cases (public/demo/larkspur-rise.json): 620 / 930 kPa at 104 m, field test 1,035 kPa at 97 m.
    expect(line).toContain('Working 620 kPa at level 104.00 m');
    expect(line).toContain('Field test 1035 kPa at level 97.00 m');
    // 1,035 kPa = 150.1 psi (1 psi = 6.894757 kPa, NIST SP 811 appendix B).
    expect(sizedForLine(project, fittings, 'us')).toContain('Field test 150.1 psi');
    // a case without a label reads as its id (caseLabel.ts)
    const unlabelled = { ...project, loadCases: project.loadCases.map(({ label: _, ...c }) => c) };
    expect(sizedForLine(unlabelled, fittings, 'si')).toMatch(/^Sized for: working 620 kPa/);
  });

  it('names the soil under each piece of concrete with its allowable bearing, and only fittings with concrete', () => {
    const line = sizedForLine(project, fittings, 'us');
    const withConcrete = fittings.filter((f) => f.restraint.block || f.restraint.anchor || f.restraint.trenchBottom);
    const soils = new Set(withConcrete.map((f) => f.soil));
    const named = line.slice(line.indexOf('bears on:')).match(/\b[A-Z]\d+\b/g) ?? [];
    // marks are named when the page's concrete bears on more than one soil
    expect(new Set(named)).toEqual(soils.size > 1 ? new Set(withConcrete.map((f) => f.mark)) : new Set());
    const mixed = withConcrete.slice(0, 2).map((f, i) => ({ ...f, soil: i ? 'brook-clay' : 'sand' }));
    expect(sizedForLine(project, mixed, 'si')).toContain(`(${mixed[0]!.mark})`);
    // The demo's sand: 95,761 Pa = 2,000 lb/ft² (1 psf = 47.880 Pa, NIST SP 811 appendix B).
    expect(line).toMatch(/Medium dense sand, 2,?000 psf allowable/);
  });
});
