import { describe, it, expect } from 'vitest';
import { analyse, FOOT, PAGE_CAUTIONS, scheduleOf } from '@mainbrace/solver';
import { PLAN_SCALES, planDrawing } from './planDrawing.js';
import { drawingSvg } from './drawingSvg.js';
import { drawingPdf } from './drawingPdf.js';
import { demoProject } from '../../testFixtures.js';

const parsed = { project: demoProject() };
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

  it('prints the em dash and curly quotes as WinAnsi bytes, and the cautions every printed page carries', () => {
    const d = planDrawing(analysis, rows, 'us', scale('1in40ft'), parsed.project.name);
    const strings = pdfStrings(drawingPdf(d));
    // PDF 32000-1:2008, Annex D, Table D.2: emdash is WinAnsi 227 octal (0x97), quoteright 222 (0x92).
    const title = strings.find((b) => latin(b).startsWith('Larkspur Rise'))!;
    expect([...title.slice(0, 16)]).toEqual([...Buffer.from('Larkspur Rise ', 'ascii'), 0x97, 0x20]);
    expect(strings.some((b) => b.includes(0x3f))).toBe(false); // no '?' where a character was
    const text = strings.map(fromWinAnsi).join(' ');
    expect(text).toContain('Larkspur Rise — Quillon Avenue main, phase 1 — plan at 1" = 40 ft');
    // The five cautions of a printed output: design aid, licensed engineer, local codes and the utility's
    // standards, undisturbed soil, curing before the test.
    for (const topic of [
      /design aid/,
      /licensed professional engineer/,
      /Local codes, the utility’s standards/,
      /bear on undisturbed soil/,
      /cure before pressure testing/,
    ])
      expect(text).toMatch(topic);
    for (const c of PAGE_CAUTIONS) expect(text).toContain(c);
    // The SVG carries the same words, in UTF-8.
    const svg = drawingSvg(d);
    expect(svg).toContain('Larkspur Rise — Quillon Avenue');
    for (const c of PAGE_CAUTIONS) expect(svgText(svg)).toContain(c);
  });
});

const latin = (b: Uint8Array) => String.fromCharCode(...b);

/**
 * The WinAnsi codes above 127 this plan's words use that are not Latin-1, as PDF 32000-1:2008, Annex D,
 * Table D.2 lists them (octal): quoteleft 221, quoteright 222, quotedblleft 223, quotedblright 224,
 * endash 226, emdash 227. 240–377 octal are Latin-1 (×, °, ²).
 */
const WIN_ANSI: Record<number, string> = { 0o221: '‘', 0o222: '’', 0o223: '“', 0o224: '”', 0o226: '–', 0o227: '—' };
const fromWinAnsi = (b: Uint8Array) =>
  [...b].map((c) => (c >= 0x80 && c < 0xa0 ? (WIN_ANSI[c] ?? '\ufffd') : String.fromCharCode(c))).join('');

/**
 * The bytes of each string a PDF's content stream shows with Tj, its escapes undone (PDF 32000-1,
 * 7.3.4.2): "\(", "\)", "\\" stand for the character after the backslash.
 */
function pdfStrings(pdf: Uint8Array): Uint8Array[] {
  const all = latin(pdf);
  const start = all.indexOf('stream\n') + 'stream\n'.length;
  const content = all.slice(start, all.indexOf('\nendstream', start));
  const out: Uint8Array[] = [];
  for (const m of content.matchAll(/\(((?:\\.|[^\\)])*)\) Tj/g))
    out.push(Uint8Array.from(m[1]!.replace(/\\(.)/g, '$1'), (c) => c.charCodeAt(0)));
  return out;
}

/** The text of an SVG's text elements, one line each joined by spaces. */
const svgText = (svg: string) =>
  [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]!.replace(/&amp;/g, '&')).join(' ');
