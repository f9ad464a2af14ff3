import { describe, it, expect } from 'vitest';
import { terminalActsOn, terminalSafe } from './terminalText.js';

describe('terminalActsOn', () => {
  it('is the guard’s set for every character JSON leaves as it is (U+007F to U+FFFF)', () => {
    const differ: string[] = [];
    for (let c = 0x7f; c <= 0xffff; c++) {
      if (c >= 0xd800 && c <= 0xdfff) continue; // surrogates come in pairs, or JSON escapes them
      const ch = String.fromCharCode(c);
      if (terminalActsOn(c) !== (terminalSafe(ch) !== ch)) differ.push(c.toString(16));
    }
    expect(differ).toEqual([]);
    // The set is not empty either way: DEL, a C1 control, the bidi isolates, the paragraph separator.
    expect([0x7f, 0x9b, 0x2069, 0x2029].every(terminalActsOn)).toBe(true);
    expect([0xa0, 0xe9, 0x2030, 0xfeff].some(terminalActsOn)).toBe(false);
  });
});
