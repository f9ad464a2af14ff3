import { describe, it, expect } from 'vitest';
import { analyse, scheduleOf } from '@mainbrace/solver';
import { sizedForLine } from './sizedFor.js';
import { demoProject } from '../testFixtures.js';
import { show } from '../format/quantity.js';

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
    expect(sizedForLine(unlabelled, fittings, 'si')).toMatch(/^Sized for gauge pressures working 620 kPa/);
  });

  it('names the soil at each restrained fitting with the bearing its concrete was sized on', () => {
    const line = sizedForLine(project, fittings, 'us');
    const withConcrete = fittings.filter(
      (f) => f.restraint.block || f.restraint.anchor || f.restraint.trenchBottom || f.restraint.restrainedLegs.length,
    );
    const soils = new Set(withConcrete.map((f) => f.soil));
    const named = line.slice(line.indexOf('Soil assumed:')).match(/\b[A-Z]\d+\b/g) ?? [];
    // marks are named when the page's concrete bears on more than one soil
    expect(new Set(named)).toEqual(soils.size > 1 ? new Set(withConcrete.map((f) => f.mark)) : new Set());
    const mixed = withConcrete.slice(0, 2).map((f, i) => ({ ...f, soil: i ? 'brook-clay' : 'sand' }));
    expect(sizedForLine(project, mixed, 'si')).toContain(`(${mixed[0]!.mark})`);
    // The demo's sand: 95,761 Pa = 2,000 lb/ft² (1 psf = 47.880 Pa, NIST SP 811 appendix B).
    expect(line).toMatch(/Medium dense sand, 2,?000 psf allowable/);
  });

  it('gives a soil whose bearing rises with depth the bearing at the blocks, and a soil without a label its id', () => {
    // A soil as the IBC 1806.2 rows are stored: no bearing at the surface, a rise per metre of depth.
    const rising = {
      ...project,
      soils: project.soils.map((s) => ({ ...s, label: undefined, bearing: 0, bearingPerDepth: 20_000 })),
    };
    const rows = scheduleOf(analyse(rising)).fittings;
    const line = sizedForLine(rising, rows, 'si');
    expect(line).not.toMatch(/undefined| 0 kPa/);
    // 20 kPa per metre down to each block's face centre, cover + OD/2 (the block sizing's own rule): the
    // shallowest sand block gives the low end of the range the line prints
    const depths = rows
      .filter((f) => f.restraint.block && f.soil === 'sand')
      .map((f) => f.cover + Math.max(...f.pipes.map((p) => p.outsideDiameter)) / 2);
    expect(depths.length).toBeGreaterThan(1);
    expect(line).toContain(`sand, ${show(20_000 * Math.min(...depths), 'stress', 'si')}`);
  });
});
