import { ceilTo, roundTo } from '../units/format.js';

/**
 * 10^d for the decimals the JSON schedule keeps (0–6, scheduleJson.ts), exact. From 7 places on, V8
 * writes a number under 10⁻⁶ with an exponent (1e-7): more places take String's text.
 */
const POWERS = [1, 10, 100, 1000, 1e4, 1e5, 1e6];

const HEX = '0123456789abcdef';

/** Room kept beyond the piece size, so that most writes need no check of their own length. */
const RESERVE = 1024;

/** ASCII text as bytes, made once for `JsonBytes.bytes`. */
export function ascii(text: string): Uint8Array {
  const b = new Uint8Array(text.length);
  for (let i = 0; i < text.length; i++) b[i] = text.charCodeAt(i);
  return b;
}

/**
 * JSON text written straight into UTF-8 bytes and handed on in pieces of at least `chunk` bytes (each
 * piece a new array, which the receiver may keep). A 10,000-fitting schedule is some 13 MB of text and
 * 700,000 numbers: built as strings, a cold process spent most of the writer's time making and
 * collecting them; here a number's digits, a key and a string's characters go to the buffer directly.
 *
 * Strings are escaped as JSON.stringify escapes them (quote, backslash, C0 controls, lone surrogates,
 * lower-case hex). `escape`, when given, is asked about every character JSON leaves as it is (U+007F
 * and above) and writes those it accepts as `\uXXXX` too: the command line's terminal guard, done in
 * the one place a character from the project file can reach the output.
 */
export class JsonBytes {
  private buf: Uint8Array;
  private at = 0;

  constructor(
    private readonly sink: (bytes: Uint8Array) => void,
    private readonly chunk = 1 << 16,
    private readonly escape: ((code: number) => boolean) | null = null,
  ) {
    this.buf = new Uint8Array(chunk + RESERVE);
  }

  /** Hands on what is written so far, when a piece is full, and makes room for `n` more bytes. */
  private room(n: number): void {
    if (this.at >= this.chunk) this.flush();
    if (this.at + n > this.buf.length) {
      const bigger = new Uint8Array(this.at + n + RESERVE);
      bigger.set(this.buf.subarray(0, this.at));
      this.buf = bigger;
    }
  }

  /** Hands on what is written so far (nothing when empty). */
  flush(): void {
    if (this.at === 0) return;
    this.sink(this.buf.subarray(0, this.at));
    this.buf = new Uint8Array(this.chunk + RESERVE);
    this.at = 0;
  }

  /** One byte of ASCII: punctuation. */
  byte(c: number): void {
    this.room(1);
    this.buf[this.at++] = c;
  }

  /** Bytes made once (`ascii`): a key with its punctuation, `null`. */
  bytes(b: Uint8Array): void {
    this.room(b.length);
    this.buf.set(b, this.at);
    this.at += b.length;
  }

  /** Text that is JSON already and ASCII: a number's text. */
  raw(text: string): void {
    const n = text.length;
    this.room(n);
    const buf = this.buf;
    let at = this.at;
    for (let i = 0; i < n; i++) buf[at++] = text.charCodeAt(i);
    this.at = at;
  }

  /** A string value as a JSON literal, quoted and escaped. */
  str(text: string): void {
    const n = text.length;
    // Worst case: every UTF-16 unit written as \uXXXX.
    this.room(6 * n + 2);
    const buf = this.buf;
    let at = this.at;
    buf[at++] = 34;
    for (let i = 0; i < n; i++) {
      const c = text.charCodeAt(i);
      if (c >= 0x20 && c < 0x7f && c !== 34 && c !== 92) buf[at++] = c;
      else {
        this.at = at;
        i = this.special(text, i, c);
        at = this.at;
      }
    }
    buf[at++] = 34;
    this.at = at;
  }

  /**
   * JSON text made by JSON.stringify (a subject's value that is not a string): as it is, in UTF-8 (its
   * strings are escaped already, and nothing outside them is beyond ASCII; DEL and above go through
   * `escape` as in a string).
   */
  json(text: string): void {
    const n = text.length;
    this.room(6 * n);
    for (let i = 0; i < n; i++) {
      const c = text.charCodeAt(i);
      if (c < 0x7f) this.buf[this.at++] = c;
      else i = this.special(text, i, c);
    }
  }

  /**
   * One character that is not plain printable ASCII, at `i`: JSON's own escapes for a quote, a
   * backslash and a C0 control (only inside a string, where they can occur), a surrogate pair in four
   * bytes, the rest in UTF-8 or, when `escape` asks for it, as \uXXXX. Returns the index of its last
   * UTF-16 unit.
   */
  private special(text: string, i: number, c: number): number {
    if (c < 0x20 || c === 34 || c === 92) {
      // JSON.stringify's short forms, then \u00XX for the other C0 controls.
      const short =
        c === 34
          ? 34
          : c === 92
            ? 92
            : c === 8
              ? 98
              : c === 9
                ? 116
                : c === 10
                  ? 110
                  : c === 12
                    ? 102
                    : c === 13
                      ? 114
                      : 0;
      if (short) {
        this.buf[this.at++] = 92;
        this.buf[this.at++] = short;
      } else this.unicodeEscape(c);
      return i;
    }
    if (c >= 0xd800 && c <= 0xdfff) {
      const d = c <= 0xdbff && i + 1 < text.length ? text.charCodeAt(i + 1) : 0;
      if (d >= 0xdc00 && d <= 0xdfff) {
        const p = 0x10000 + ((c - 0xd800) << 10) + (d - 0xdc00);
        const buf = this.buf;
        buf[this.at++] = 0xf0 | (p >> 18);
        buf[this.at++] = 0x80 | ((p >> 12) & 0x3f);
        buf[this.at++] = 0x80 | ((p >> 6) & 0x3f);
        buf[this.at++] = 0x80 | (p & 0x3f);
        return i + 1;
      }
      // A lone surrogate: JSON.stringify writes it escaped (well-formed JSON.stringify, ES2019).
      this.unicodeEscape(c);
      return i;
    }
    if (this.escape?.(c)) this.unicodeEscape(c);
    else this.utf8(c);
    return i;
  }

  /** A character of the Basic Multilingual Plane, not a surrogate, in UTF-8. */
  private utf8(c: number): void {
    const buf = this.buf;
    if (c < 0x80) buf[this.at++] = c;
    else if (c < 0x800) {
      buf[this.at++] = 0xc0 | (c >> 6);
      buf[this.at++] = 0x80 | (c & 0x3f);
    } else {
      buf[this.at++] = 0xe0 | (c >> 12);
      buf[this.at++] = 0x80 | ((c >> 6) & 0x3f);
      buf[this.at++] = 0x80 | (c & 0x3f);
    }
  }

  private unicodeEscape(c: number): void {
    const buf = this.buf;
    buf[this.at++] = 92;
    buf[this.at++] = 117;
    buf[this.at++] = HEX.charCodeAt(c >> 12);
    buf[this.at++] = HEX.charCodeAt((c >> 8) & 15);
    buf[this.at++] = HEX.charCodeAt((c >> 4) & 15);
    buf[this.at++] = HEX.charCodeAt(c & 15);
  }

  /** A number as JSON.stringify writes it: String's text, null when not finite. */
  num(v: number): void {
    this.raw(Number.isFinite(v) ? String(v) : 'null');
  }

  /** `v` rounded to `decimals` places (roundTo), as JSON.stringify writes the rounded number. */
  round(v: number, decimals: number): void {
    const f = POWERS[decimals];
    // roundTo's arithmetic with the power from the table (Math.pow gives the same exact powers).
    if (f === undefined) this.decimal(roundTo(v, decimals), decimals);
    else this.decimal(Math.round(v * f) / f, decimals);
  }

  /** `v` rounded up to `decimals` places (ceilTo): built dimensions and volumes. */
  up(v: number, decimals: number): void {
    this.decimal(ceilTo(v, decimals), decimals);
  }

  /** `v` rounded, or null. */
  roundOrNull(v: number | null, decimals: number): void {
    if (v === null) this.raw('null');
    else this.round(v, decimals);
  }

  /**
   * `x`, already at `decimals` places (k / 10^decimals for an integer k), as JSON.stringify writes it:
   * its digits worked out from k into the buffer, which is several times quicker in a cold process than
   * V8's shortest-digits search for a fraction (a 10,000-fitting schedule writes some 700,000 numbers).
   * Equal because a decimal of at most 15 significant digits is the shortest text that reads back as the
   * double nearest to it (IEEE 754 binary64 keeps 15 decimal digits: DBL_DIG); beyond that, or for NaN,
   * ±Infinity and more decimals, String's text. jsonBytes.test.ts holds the two equal.
   */
  private decimal(x: number, decimals: number): void {
    const f = POWERS[decimals];
    if (f === undefined || !Number.isFinite(x)) {
      this.num(x);
      return;
    }
    const k = Math.round(x * f);
    if (!(Math.abs(k) < 1e15) || k / f !== x) {
      this.raw(String(x));
      return;
    }
    // A sign, 15 digits, a point and 8 decimals at most.
    this.room(32);
    let m = k;
    // -0 has k = -0, which is not below 0: written 0, as JSON.stringify writes it.
    if (k < 0) {
      this.buf[this.at++] = 45;
      m = -k;
    }
    // Nearly every figure of a schedule fits 31 bits scaled: integer arithmetic, which is quicker.
    if (m <= 0x7fffffff) this.small(m | 0, f | 0, decimals);
    else this.large(m, f, decimals);
  }

  /** m / f in digits, trailing zeros of the fraction left out; 0 ≤ m < 2^31, f = 10^decimals. */
  private small(m: number, f: number, decimals: number): void {
    const whole = (m / f) | 0;
    let fraction = m - whole * f;
    const buf = this.buf;
    let length = 1;
    for (let p = 10; p <= whole; p *= 10) length++;
    let at = this.at + length;
    for (let i = at, n = whole; ;) {
      const q = (n / 10) | 0;
      buf[--i] = 48 + n - q * 10;
      n = q;
      if (n === 0) break;
    }
    if (fraction !== 0) {
      let places = decimals;
      while (fraction % 10 === 0) {
        fraction = (fraction / 10) | 0;
        places--;
      }
      buf[at++] = 46;
      // The fraction's digits, with the zeros that lead them.
      for (let i = at + places - 1; i >= at; i--) {
        const q = (fraction / 10) | 0;
        buf[i] = 48 + fraction - q * 10;
        fraction = q;
      }
      at += places;
    }
    this.at = at;
  }

  /** As `small`, for 2^31 ≤ m < 10^15, in double arithmetic (exact on integers below 2^53). */
  private large(m: number, f: number, decimals: number): void {
    const whole = Math.floor(m / f);
    let fraction = m - whole * f;
    let length = 1;
    for (let p = 10; p <= whole; p *= 10) length++;
    let at = this.at + length;
    for (let i = at, n = whole; ;) {
      const q = Math.floor(n / 10);
      this.buf[--i] = 48 + n - q * 10;
      n = q;
      if (n === 0) break;
    }
    if (fraction !== 0) {
      let places = decimals;
      while (fraction % 10 === 0) {
        fraction /= 10;
        places--;
      }
      this.buf[at++] = 46;
      for (let i = at + places - 1; i >= at; i--) {
        const q = Math.floor(fraction / 10);
        this.buf[i] = 48 + fraction - q * 10;
        fraction = q;
      }
      at += places;
    }
    this.at = at;
  }
}
