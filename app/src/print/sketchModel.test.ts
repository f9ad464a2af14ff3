import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { analyse, formatDimension, parseProject, scheduleOf, settingOut } from '@mainbrace/solver';
import { sketchOf } from './sketchModel.js';

const parsed = parseProject(
  JSON.parse(readFileSync(resolve(import.meta.dirname, '../../../public/demo/larkspur-rise.json'), 'utf8')),
);
if (!parsed.ok) throw new Error('demo does not parse');
const analysis = analyse(parsed.project);
const rows = scheduleOf(analysis).fittings;
const dims = (s: ReturnType<typeof sketchOf>) =>
  [...s.plan, ...s.section].flatMap((x) => (x.t === 'dim' ? [x.text] : []));

describe('restraint sketches are drawn from the schedule row', () => {
  it('dimensions every block with its face width, face height and thickness, as the schedule rounds them', () => {
    for (const f of rows.filter((r) => r.restraint.block)) {
      const b = f.restraint.block!;
      const d = dims(sketchOf(f, analysis, 'si'));
      for (const v of [b.faceWidth, b.faceHeight, b.depth]) expect(d, f.mark).toContain(formatDimension(v, 'si'));
    }
  });

  it('draws the plan to one scale: the block’s drawn face is its width times the plan scale', () => {
    const f = rows.find((r) => r.restraint.block && !r.restraint.reverseBlock && !r.restraint.trenchBottom)!;
    const s = sketchOf(f, analysis, 'si');
    const poly = s.plan.find((x) => x.t === 'poly' && x.role === 'block')!;
    if (poly.t !== 'poly') throw new Error('no block');
    const [a, b, c, d] = poly.points as [number, number][];
    const thickness = Math.hypot(b![0] - a![0], b![1] - a![1]);
    const width = Math.hypot(c![0] - b![0], c![1] - b![1]);
    // Drawn width / drawn thickness = face width / thickness (same scale both ways).
    expect(width / thickness).toBeCloseTo(f.restraint.block!.faceWidth / f.restraint.block!.depth, 9);
    expect(Math.hypot(d![0] - a![0], d![1] - a![1])).toBeCloseTo(width, 9);
  });

  it('gives an anchor its three dimensions and its depth to the base in words', () => {
    const f = rows.find((r) => r.restraint.anchor)!;
    const s = sketchOf(f, analysis, 'si');
    const a = settingOut(f, parsed.project.design.dimensionStep).anchor!;
    const line = s.lines.find((l) => l.startsWith('Anchor'))!;
    expect(line).toContain(`${formatDimension(a.height, 'si')} H`);
    expect(line).toContain(`${formatDimension(a.length, 'si')} L × ${formatDimension(a.width, 'si')} W`);
    expect(line).toContain('anchor straps to the fitting');
  });

  it('names each restrained leg by the mark it runs toward, with its joints', () => {
    const f = rows.find((r) => r.restraint.restrainedLegs.length > 0)!;
    const s = sketchOf(f, analysis, 'si');
    expect(s.jointsOnly).toBe(true);
    for (const l of f.restraint.restrainedLegs)
      expect(s.lines.join(' ')).toContain(`toward ${l.toward} (${l.joints} joints)`);
    // One tick per joint to restrain on the plan.
    const ticks = s.plan.filter((x) => x.t === 'line' && x.role === 'joint').length;
    expect(ticks).toBe(f.restraint.restrainedLegs.reduce((n, l) => n + l.joints, 0));
  });

  it('draws an error-level restraint as outlines only, with the not-adequate line first', () => {
    const f = rows.find((r) => r.restraint.block)!;
    const failing = {
      ...f,
      diagnostics: [{ code: 'soil.no-bearing', severity: 'error', subject: {}, values: {} }],
    } as unknown as typeof f;
    const s = sketchOf(failing, analysis, 'si');
    expect(s.notAdequate).toBe(true);
    expect(s.lines[0]).toMatch(/^NOT ADEQUATE/);
    expect([...s.plan, ...s.section].some((x) => x.t === 'poly' && x.role === 'block')).toBe(false);
  });
});
