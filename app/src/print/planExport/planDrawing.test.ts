import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { analyse, FOOT, parseProject, scheduleOf } from '@mainbrace/solver';
import { PLAN_SCALES, planDrawing } from './planDrawing.js';
import { drawingSvg } from './drawingSvg.js';
import { drawingPdf } from './drawingPdf.js';

const parsed = parseProject(
  JSON.parse(readFileSync(resolve(import.meta.dirname, '../../../../public/demo/larkspur-rise.json'), 'utf8')),
);
if (!parsed.ok) throw new Error('demo does not parse');
const analysis = analyse(parsed.project);
const rows = scheduleOf(analysis).fittings;
const scale = (id: string) => PLAN_SCALES.find((s) => s.id === id)!;

describe('plan export at scale', () => {
  it('states the scales as the drawing set reads them: 1:500 is 2 mm a metre, 1" = 40 ft is 1:480', () => {
    expect(scale('1:500').mmPerMetre).toBe(2);
    expect(1000 / scale('1in40ft').mmPerMetre).toBeCloseTo(480, 9); // 40 ft × 12 in/ft = 480 in per inch
    expect(scale('1in20ft').mmPerMetre).toBeCloseTo(25.4 / (20 * FOOT), 12);
  });

  it('draws every pipe at the scale: its paper length is its plan length times mm per metre', () => {
    const d = planDrawing(analysis, rows, 'si', scale('1:1000'), 'Demo');
    const pipes = d.marks.filter((m) => m.t === 'line' && m.ink === 'pipe');
    expect(pipes).toHaveLength(parsed.project.pipes.length);
    const at = new Map(parsed.project.nodes.map((n) => [n.id, n]));
    parsed.project.pipes.forEach((p, i) => {
      const m = pipes[i]!;
      if (m.t !== 'line') throw new Error('not a line');
      const ground = Math.hypot(at.get(p.to)!.x - at.get(p.from)!.x, at.get(p.to)!.y - at.get(p.from)!.y);
      expect(Math.hypot(m.x2 - m.x1, m.y2 - m.y1)).toBeCloseTo(ground * 1, 9);
    });
    // Every fitting's mark at 2.5 mm (≈ 7 pt).
    for (const f of rows) expect(d.marks.some((m) => m.t === 'text' && m.text === f.mark && m.size >= 2.47)).toBe(true);
  });

  it('refuses a sheet longer than a plotter roll, naming a smaller scale as the way out', () => {
    const far = {
      ...parsed.project,
      nodes: parsed.project.nodes.map((n, i) => (i === 0 ? { ...n, x: n.x - 2000 } : n)),
    };
    expect(() => planDrawing(analyse(far), rows, 'si', scale('1:200'), 'Demo')).toThrow(/choose a smaller scale/);
  });

  it('writes an SVG sized in millimetres and a one-page PDF whose page is the sheet in points', () => {
    const d = planDrawing(analysis, rows, 'si', scale('1:1000'), 'Demo');
    const svg = drawingSvg(d);
    expect(svg).toContain(`width="${Math.round(d.width * 1000) / 1000}mm"`);
    const pdf = new TextDecoder('latin1').decode(drawingPdf(d));
    expect(pdf.startsWith('%PDF-1.4')).toBe(true);
    const box = /\/MediaBox \[0 0 ([\d.]+) ([\d.]+)\]/.exec(pdf)!;
    expect(Number(box[1])).toBeCloseTo((d.width * 72) / 25.4, 1);
    // The cross-reference table points at each object's first byte.
    const xref = Number(/startxref\n(\d+)/.exec(pdf)![1]);
    expect(pdf.slice(xref, xref + 4)).toBe('xref');
    const offsets = [...pdf.slice(xref).matchAll(/^(\d{10}) 00000 n $/gm)].map((m) => Number(m[1]));
    offsets.forEach((o, i) => expect(pdf.slice(o, o + `${i + 1} 0 obj`.length)).toBe(`${i + 1} 0 obj`));
  });
});
