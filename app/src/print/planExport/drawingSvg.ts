import type { Drawing, Ink } from './planDrawing.js';

export const INK_COLOUR: Record<Ink, string> = {
  pipe: '#1d6fb8',
  block: '#5d5b55',
  anchor: '#2f4858',
  pad: '#6d6a5f',
  joint: '#8b3a7e',
  ink: '#23262b',
  thrust: '#c0391b',
};

const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const n = (v: number) => (Math.round(v * 1000) / 1000).toString();

/** The drawing as a standalone SVG file whose width and height are in millimetres: it prints at scale. */
export function drawingSvg(d: Drawing): string {
  const out = [
    `<?xml version="1.0" encoding="UTF-8"?>`,
    `<svg xmlns="http://www.w3.org/2000/svg" width="${n(d.width)}mm" height="${n(d.height)}mm" viewBox="0 0 ${n(d.width)} ${n(d.height)}" font-family="Helvetica, Arial, sans-serif">`,
    `<rect x="0" y="0" width="${n(d.width)}" height="${n(d.height)}" fill="#fff"/>`,
  ];
  for (const m of d.marks) {
    if (m.t === 'line')
      out.push(
        `<line x1="${n(m.x1)}" y1="${n(m.y1)}" x2="${n(m.x2)}" y2="${n(m.y2)}" stroke="${INK_COLOUR[m.ink]}" stroke-width="${n(m.width)}" stroke-linecap="round"${m.dash ? ' stroke-dasharray="1.5 1"' : ''}/>`,
      );
    else if (m.t === 'poly')
      out.push(
        `<polygon points="${m.points.map(([x, y]) => `${n(x)},${n(y)}`).join(' ')}" fill="${m.fill ? INK_COLOUR[m.ink] : 'none'}" fill-opacity="${m.fill ? 0.35 : 0}" stroke="${INK_COLOUR[m.ink]}" stroke-width="0.3"${m.dash ? ' stroke-dasharray="1.5 1"' : ''}/>`,
      );
    else
      out.push(
        `<text x="${n(m.x)}" y="${n(m.y)}" font-size="${n(m.size)}"${m.bold ? ' font-weight="700"' : ''}${m.anchor === 'middle' ? ' text-anchor="middle"' : ''}>${esc(m.text)}</text>`,
      );
  }
  out.push('</svg>');
  return out.join('\n') + '\n';
}
