import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseProject, parseProjectText } from './parseProject.js';
import { problemText } from './problems.js';
import { nodeCover, nodeGround, pipeLevelFor } from './groundLevel.js';
import { analyse } from '../analysis/analyse.js';
import { legsByNode } from '../network/legs.js';
import { fittingSite } from '../restraint/site.js';
import { scheduleOf } from '../schedule/scheduleOf.js';
import { settingOut } from '../schedule/settingOut.js';

// A bend at b between two 0.3 m OD pipes (project-format.md, "Ground levels").
const file = (b: Record<string, unknown>) => ({
  format: 'mainbrace-project',
  version: 1,
  loadCases: [{ id: 'w', pressure: 800000 }],
  soils: [{ id: 's', bearing: 150000 }],
  nodes: [
    { id: 'a', x: 0, y: 0, elevation: 100 },
    { id: 'b', x: 20, y: 0, elevation: 100, ...b },
    { id: 'c', x: 20, y: 20, elevation: 100 },
  ],
  pipes: [
    { id: 'p1', from: 'a', to: 'b', outsideDiameter: 0.3, insideDiameter: 0.28 },
    { id: 'p2', from: 'b', to: 'c', outsideDiameter: 0.3, insideDiameter: 0.28 },
  ],
});

const parsed = (b: Record<string, unknown>) => {
  const r = parseProject(file(b));
  if (!r.ok) throw new Error(r.problems.map(problemText).join('\n'));
  return r.project;
};

describe('ground levels at nodes', () => {
  it('derive the cover from ground − pipe centreline − OD/2 (hand calculation: 102 − 100 − 0.15 = 1.85 m)', () => {
    const p = parsed({ groundLevel: 102 });
    const b = p.nodes[1]!;
    expect(nodeCover(b, 0.3)).toBeCloseTo(1.85, 12);
    expect(nodeGround(b, 0.3)).toBe(102);
    const site = fittingSite(p, b, legsByNode(p).get('b')!);
    expect(site.cover).toBeCloseTo(1.85, 12);
  });

  it('place the pipe at ground − cover − OD/2 when the cover is what is fixed (101.5 − 1.2 − 0.15 = 100.15 m)', () => {
    expect(pipeLevelFor(101.5, 1.2, 0.3)).toBeCloseTo(100.15, 12);
  });

  it('size the same block as the equivalent stated cover', () => {
    const withGround = analyse(parsed({ groundLevel: 102 })).byNode.get('b')!;
    const withCover = analyse(parsed({ cover: 1.85 })).byNode.get('b')!;
    expect(withGround.restraint).toEqual(withCover.restraint);
  });

  it('put the surveyed ground and its cover in the schedule, and set the block out from that ground', () => {
    // A stated cover beside a ground level is not used (project-format.md, "Ground levels").
    const p = parsed({ groundLevel: 102, cover: 0.6 });
    const row = scheduleOf(analyse(p)).fittings.find((f) => f.node === 'b')!;
    expect(row.groundLevel).toBe(102);
    expect(row.cover).toBeCloseTo(1.85, 12); // 102 − 100 − 0.15
    const block = row.restraint.block!;
    const out = settingOut(row, p.design.dimensionStep);
    // the face is centred on the pipe centreline, 2.0 m below the ground (102 − 100)
    expect(out.block!.topDepth).toBeCloseTo(2 - block.faceHeight / 2, 12);
    expect(out.block!.baseDepth).toBeCloseTo(2 + block.faceHeight / 2, 12);
    expect(out.block!.baseLevel).toBeCloseTo(100 - block.faceHeight / 2, 12);
    // the same as the equivalent stated cover, number for number
    const stated = scheduleOf(analyse(parsed({ cover: 1.85 }))).fittings.find((f) => f.node === 'b')!;
    expect(row.cover).toBeCloseTo(stated.cover, 12);
    expect(row.groundLevel).toBeCloseTo(stated.groundLevel, 12);
    expect(settingOut(stated, p.design.dimensionStep).block!.baseDepth).toBeCloseTo(out.block!.baseDepth, 12);
  });

  it('refuse a pipe standing out of the ground, naming the field', () => {
    const r = parseProject(file({ groundLevel: 99.9 }));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems.map(problemText).join('\n')).toMatch(/nodes\[1\]\.groundLevel.*out of the ground/);
  });

  it('leave a file without ground levels exactly as it was read before (e2e/fixtures/earlier-project.json)', () => {
    const path = fileURLToPath(new URL('../../../../e2e/fixtures/earlier-project.json', import.meta.url));
    const text = readFileSync(path, 'utf8');
    const r = parseProjectText(text);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // No ground level appears, and every node keeps the cover it states.
    const raw = JSON.parse(text) as { nodes: { cover?: number }[] };
    r.project.nodes.forEach((n, i) => {
      expect('groundLevel' in n).toBe(false);
      expect(n.cover).toBe(raw.nodes[i]!.cover ?? 1.2);
      expect(nodeCover(n, 0.5)).toBe(n.cover);
    });
  });
});
