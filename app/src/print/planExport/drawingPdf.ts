import type { Drawing } from './planDrawing.js';
import { INK_COLOUR } from './drawingSvg.js';
import { winAnsiBytes } from './winAnsi.js';

/** PDF points per millimetre. */
const PT = 72 / 25.4;
const f = (v: number) => (Math.round(v * 100) / 100).toString();
const rgb = (hex: string) => [1, 3, 5].map((i) => f(parseInt(hex.slice(i, i + 2), 16) / 255)).join(' ');

/** A PDF literal string's body: WinAnsi bytes (`winAnsiBytes`), its delimiters escaped (PDF 32000-1, 7.3.4.2). */
const pdfText = (bytes: string): string => bytes.replace(/[()\\]/g, (b) => `\\${b}`);

/**
 * The drawing as a one-page vector PDF (PDF 1.4: Helvetica, uncompressed content) whose page is the
 * sheet's size, so that it prints at the stated scale. Returned as bytes.
 */
export function drawingPdf(d: Drawing): Uint8Array {
  const H = d.height;
  const X = (x: number) => f(x * PT);
  const Y = (y: number) => f((H - y) * PT);
  const ops: string[] = ['1 J 1 j'];
  for (const m of d.marks) {
    if (m.t === 'line') {
      ops.push(
        `${rgb(INK_COLOUR[m.ink])} RG ${f(m.width * PT)} w ${m.dash ? `[${f(1.5 * PT)} ${f(1 * PT)}] 0 d` : '[] 0 d'} ${X(m.x1)} ${Y(m.y1)} m ${X(m.x2)} ${Y(m.y2)} l S`,
      );
    } else if (m.t === 'poly') {
      const path = m.points.map(([x, y], i) => `${X(x)} ${Y(y)} ${i ? 'l' : 'm'}`).join(' ') + ' h';
      const c = rgb(INK_COLOUR[m.ink]);
      if (m.fill) ops.push(`q /Half gs ${c} rg ${path} f Q`);
      ops.push(`${c} RG ${f(0.3 * PT)} w ${m.dash ? `[${f(1.5 * PT)} ${f(PT)}] 0 d` : '[] 0 d'} ${path} S`);
    } else {
      const size = m.size * PT;
      // Helvetica averages about half an em per character: enough to centre a short label.
      const bytes = winAnsiBytes(m.text);
      const text = pdfText(bytes);
      const shift = m.anchor === 'middle' ? (bytes.length * size * 0.5) / 2 : 0;
      ops.push(
        `0 0 0 rg BT /${m.bold ? 'F2' : 'F1'} ${f(size)} Tf ${f(m.x * PT - shift)} ${Y(m.y)} Td (${text}) Tj ET`,
      );
    }
  }
  const content = ops.join('\n');
  const objects = [
    '<< /Type /Catalog /Pages 2 0 R >>',
    '<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
    `<< /Type /Page /Parent 2 0 R /MediaBox [0 0 ${f(d.width * PT)} ${f(d.height * PT)}] /Contents 4 0 R /Resources << /Font << /F1 5 0 R /F2 6 0 R >> /ExtGState << /Half 7 0 R >> >> >>`,
    `<< /Length ${content.length} >>\nstream\n${content}\nendstream`,
    '<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica /Encoding /WinAnsiEncoding >>',
    '<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica-Bold /Encoding /WinAnsiEncoding >>',
    '<< /Type /ExtGState /ca 0.35 >>',
  ];
  let body = '%PDF-1.4\n%\u00e2\u00e3\u00cf\u00d3\n';
  const offsets: number[] = [];
  objects.forEach((o, i) => {
    offsets.push(body.length);
    body += `${i + 1} 0 obj\n${o}\nendobj\n`;
  });
  const xref = body.length;
  body += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n`;
  for (const o of offsets) body += `${String(o).padStart(10, '0')} 00000 n \n`;
  body += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  // Every character is below 256 (winAnsiBytes saw to it), one byte each: offsets are byte offsets.
  const bytes = new Uint8Array(body.length);
  for (let i = 0; i < body.length; i++) bytes[i] = body.charCodeAt(i) & 0xff;
  return bytes;
}
