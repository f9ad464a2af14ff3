import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { ceilTo, roundTo } from '../units/format.js';
import { scheduleSizedNumbers } from '../../test/scheduleNumbers.js';
import { JsonBytes } from './jsonBytes.js';
import { terminalActsOn, terminalSafe } from '../cli/terminalText.js';

/** What a JsonBytes writes, as text, and the pieces it handed on. */
function written(fill: (o: JsonBytes) => void, chunk = 1 << 16, escape: ((c: number) => boolean) | null = null) {
  const pieces: Uint8Array[] = [];
  const o = new JsonBytes((b) => pieces.push(b), chunk, escape);
  fill(o);
  o.flush();
  const all = new Uint8Array(pieces.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of pieces) {
    all.set(p, at);
    at += p.length;
  }
  return { text: new TextDecoder('utf-8', { fatal: true }).decode(all), pieces };
}

describe('JsonBytes writes a rounded number as JSON.stringify writes it', () => {
  it('rounded and rounded up to 0–8 decimals, any double (fast-check, fixed seed)', () => {
    fc.assert(
      fc.property(fc.double(), fc.integer({ min: 0, max: 8 }), (v, d) => {
        expect(written((o) => o.round(v, d), 64).text).toBe(JSON.stringify(roundTo(v, d)));
        expect(written((o) => o.up(v, d), 64).text).toBe(JSON.stringify(ceilTo(v, d)));
      }),
      { seed: 20261203, numRuns: 5000 },
    );
  }, 60_000);

  it('at the sizes a schedule carries, checked against JSON.stringify (fast-check, fixed seed)', () => {
    fc.assert(
      fc.property(scheduleSizedNumbers, fc.integer({ min: 0, max: 6 }), (v, d) => {
        expect(written((o) => o.round(v, d)).text).toBe(JSON.stringify(roundTo(v, d)));
        expect(written((o) => o.up(v, d)).text).toBe(JSON.stringify(ceilTo(v, d)));
      }),
      { seed: 20261203, numRuns: 10000 },
    );
  }, 60_000);

  it('at the edges: minus zero, leading zeros of the fraction, the 15-digit bound, non-finite values', () => {
    const cases: [number, number, string][] = [
      [-0, 3, '0'],
      [-0.0004, 3, '0'], // rounds to -0
      [0.000001, 6, '0.000001'],
      [-0.000001, 6, '-0.000001'],
      [0.1 + 0.2, 3, '0.3'],
      [1.0005, 3, '1.001'],
      [-2.25, 4, '-2.25'],
      [999999999999.999, 3, '999999999999.999'],
      [123456789012345.6, 1, '123456789012345.6'],
      [1e21, 0, '1e+21'],
      [NaN, 3, 'null'],
      [-Infinity, 1, 'null'],
    ];
    for (const [v, d, text] of cases) expect(written((o) => o.round(v, d)).text).toBe(text);
    expect(written((o) => o.roundOrNull(null, 2)).text).toBe('null');
    expect(written((o) => o.num(-0)).text).toBe(JSON.stringify(-0));
    expect(written((o) => o.num(7.25)).text).toBe('7.25');
    // Either side of 2^31 scaled, where the digits change from integer to double arithmetic.
    for (const k of [2147483647, 2147483648, 2147483650, 21474836470]) {
      for (const d of [0, 1, 3, 6]) {
        const x = k / 10 ** d;
        expect(written((o) => o.round(x, d)).text).toBe(JSON.stringify(x));
        expect(written((o) => o.round(-x, d)).text).toBe(JSON.stringify(-x));
      }
    }
    // round() takes 10^d from a table: the powers Math.pow gives, so that it is roundTo's arithmetic.
    for (let d = 0; d <= 8; d++) expect(10 ** d).toBe(Math.pow(10, d));
  });
});

describe('JsonBytes writes strings as JSON.stringify does, in UTF-8', () => {
  it('any UTF-16 text, lone surrogates included (fast-check, fixed seed)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 40 }), (s) => {
        expect(written((o) => o.str(s)).text).toBe(JSON.stringify(s));
        // JSON text made elsewhere passes as it is.
        expect(written((o) => o.json(JSON.stringify({ s }))).text).toBe(JSON.stringify({ s }));
      }),
      { seed: 20261203, numRuns: 2000 },
    );
  }, 30_000);

  it('with the terminal guard: what terminalSafe makes of the JSON text (fast-check, fixed seed)', () => {
    const risky = fc.constantFrom(
      ...'\u0000\u0007\b\t\n\r\u001b\u007f\u0085\u009b\u061c\u200e\u2028\u2029\u202e\u2066\u2069"\\é€\u{1F6B0}'.split(
        '',
      ),
    );
    const text = fc.array(fc.oneof(risky, fc.string({ unit: 'binary', maxLength: 3 }))).map((a) => a.join(''));
    fc.assert(
      fc.property(text, (s) => {
        expect(written((o) => o.str(s), 1 << 16, terminalActsOn).text).toBe(terminalSafe(JSON.stringify(s)));
        const inJson = JSON.stringify([s]);
        expect(written((o) => o.json(inJson), 1 << 16, terminalActsOn).text).toBe(terminalSafe(inJson));
      }),
      { seed: 20261203, numRuns: 2000 },
    );
  }, 30_000);
});

describe('JsonBytes hands on its bytes in pieces', () => {
  it('of at least the piece size but the last, each a new array, whatever a string’s length', () => {
    const long = 'x'.repeat(5000) + '\u00e9'.repeat(3000);
    const fill = (o: JsonBytes) => {
      for (let i = 0; i < 200; i++) {
        o.raw(i ? ',' : '[');
        o.round(i / 7, 3);
      }
      o.raw(',');
      o.str(long);
      o.raw(']');
    };
    const whole = written(fill).text;
    expect(whole).toBe(JSON.stringify([...Array.from({ length: 200 }, (_, i) => roundTo(i / 7, 3)), long]));
    for (const chunk of [1, 7, 100, 4096]) {
      const { text, pieces } = written(fill, chunk);
      expect(text).toBe(whole);
      expect(pieces.slice(0, -1).every((p) => p.length >= chunk)).toBe(true);
      expect(new Set(pieces.map((p) => p.buffer)).size).toBe(pieces.length);
    }
  });
});
