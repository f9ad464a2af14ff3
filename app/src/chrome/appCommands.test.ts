import { describe, expect, it, vi } from 'vitest';
import { planHarness } from '../tools/planHarness.js';
import { runCommand } from './appCommands.js';
import { blankProject } from '../files/blankProject.js';
import { chain, project } from '../testFixtures.js';
import { toScreen } from '../state/viewport.js';

/** A site with its own soil, groundwater and case datum, as a demo would carry. */
function siteProject() {
  const base = chain([0, 0], [30, 0], [30, 40]);
  return {
    ...base,
    design: { ...base.design, groundwaterElevation: 104 },
    soils: [{ ...base.soils[0]!, id: 'clay', label: 'Stiff clay' }],
    defaultSoil: 'clay',
    nodes: base.nodes.map((n) => ({ ...n, soil: undefined })),
  };
}

describe('New', () => {
  it('starts from the documented blank defaults, not from the open project’s site, when nothing is unsaved', async () => {
    const h = planHarness(siteProject());
    h.actions.markSaved(h.doc());
    runCommand('new', h.store, h.actions);
    // the blank project's module loads on first use
    await vi.waitFor(() => expect(h.doc().nodes).toEqual([]));
    const doc = h.doc();
    const blank = blankProject();
    expect(doc.nodes).toEqual([]);
    expect(doc.soils).toEqual(blank.soils);
    expect(doc.design.groundwaterElevation).toBeNull();
    expect(doc.loadCases).toEqual(blank.loadCases);
  });
  it('asks before discarding work not saved to a file, and changes nothing until answered', async () => {
    const h = planHarness(siteProject());
    const before = h.doc();
    runCommand('new', h.store, h.actions);
    expect(h.doc()).toBe(before);
    const notice = h.state().notice!;
    expect(notice.title).toMatch(/changes not saved to a file/);
    expect(notice.actions!.map((a) => a.label)).toEqual([
      'Save, then start new',
      'Discard and start new',
      'Keep working',
    ]);
    notice.actions!.find((a) => a.label === 'Keep working')!.run();
    expect(h.doc()).toBe(before);
    runCommand('new', h.store, h.actions);
    h.state()
      .notice!.actions!.find((a) => a.label === 'Discard and start new')!
      .run();
    await vi.waitFor(() => expect(h.doc().nodes).toEqual([]));
    h.actions.undo();
    expect(h.doc()).toBe(before);
  });
});

describe('opening a route fits the view to it', () => {
  it('shows the whole of a newly opened route, wherever the old view was', () => {
    const h = planHarness(chain([0, 0], [30, 0]));
    const far = project(
      [
        { id: 'a', x: 5000, y: 5000 },
        { id: 'b', x: 5400, y: 5100 },
      ],
      [{ from: 'a', to: 'b' }],
    );
    h.actions.replaceProject(far);
    // inside the 800 × 500 canvas less Fit's margin of 0.14 × 500 = 70 px
    for (const n of far.nodes) {
      const p = toScreen(h.state().viewport, n);
      expect(p.sx).toBeGreaterThanOrEqual(70 - 1e-9);
      expect(p.sx).toBeLessThanOrEqual(730 + 1e-9);
      expect(p.sy).toBeGreaterThanOrEqual(70 - 1e-9);
      expect(p.sy).toBeLessThanOrEqual(430 + 1e-9);
    }
  });
});
