import { describe, it, expect } from 'vitest';
import { winAnsiBytes } from './winAnsi.js';

const codes = (s: string) => [...winAnsiBytes(s)].map((c) => c.charCodeAt(0));

describe('WinAnsi text for the standard PDF fonts', () => {
  it('writes the typographic characters at their Annex D codes', () => {
    // PDF 32000-1:2008, Annex D, Table D.2, WIN column (octal): emdash 227, endash 226, quoteleft 221,
    // quoteright 222, quotedblleft 223, quotedblright 224, bullet 225, Euro 200, ellipsis 205,
    // multiply 327, degree 260, twosuperior 262, threesuperior 263, mu 265.
    expect(codes('—–‘’“”•€…')).toEqual([0o227, 0o226, 0o221, 0o222, 0o223, 0o224, 0o225, 0o200, 0o205]);
    expect(codes('×°²³µ')).toEqual([0o327, 0o260, 0o262, 0o263, 0o265]);
    expect(winAnsiBytes('Pipe (A1) \\ 2 m')).toBe('Pipe (A1) \\ 2 m');
  });

  it('spells letters and signs the encoding lacks with their nearest, not "?"', () => {
    expect(winAnsiBytes('Łódź')).toBe('L\u00f3dz'); // ó is Latin-1 (363 octal); Ł and ź are not in WinAnsi
    expect(winAnsiBytes('Москва')).toBe('Moskva');
    expect(winAnsiBytes('Щука')).toBe('Shchuka');
    expect(winAnsiBytes('φ = 30°, γc − γw')).toBe('ph = 30\u00b0, gc - gw');
    expect(winAnsiBytes('Ő ≤ 5')).toBe('O <= 5');
    // Nothing near in the encoding: the one case left to '?'.
    expect(winAnsiBytes('水')).toBe('?');
  });
});
