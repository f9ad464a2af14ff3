import { describe, expect, it } from 'vitest';
import { keptPer } from './keptPer.js';

describe('a value kept per key while its inputs stay the same objects', () => {
  it('is made again only when the key or one of its inputs is another object', () => {
    const kept = keptPer<object, number>();
    const key = {};
    const a = {};
    let made = 0;
    const make = () => ++made;
    expect(kept(key, [a, undefined], make)).toBe(1);
    expect(kept(key, [a, undefined], make)).toBe(1);
    expect(kept(key, [{}, undefined], make)).toBe(2); // an equal-looking but new input
    expect(kept(key, [{}, undefined, 3], make)).toBe(3); // another number of inputs
    expect(kept({}, [], make)).toBe(4); // another key
  });
});
