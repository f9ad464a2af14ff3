import { describe, it, expect } from 'vitest';
import { BEDDINGS, DEFAULT_BEDDING, WRAP_WORDS, beddingReference, findBedding } from './layingConditions.js';
import { TRENCH_COEFFICIENT } from '../restraint/pipeSoilResistance.js';

describe('beddings: the laying conditions of AWWA C150/C151 in words', () => {
  it('describes each of the five laying conditions in words, numbered 1 to 5 as the standard numbers them', () => {
    expect(BEDDINGS.map((b) => b.condition)).toEqual([1, 2, 3, 4, 5]);
    for (const b of BEDDINGS) {
      expect(b.words.length).toBeGreaterThan(b.short.length);
      expect(b.short).not.toMatch(/type|condition/i); // the number is a reference, not the name
    }
    expect(beddingReference(4)).toBe('AWWA C150/C151 laying condition 4');
  });

  it('offers a bedding for every condition the restrained-joint sizing has a coefficient for', () => {
    expect(Object.keys(TRENCH_COEFFICIENT).map(Number)).toEqual(BEDDINGS.map((b) => b.condition));
  });

  it('takes a pipe that states no bedding as condition 3, as the sizing does (common practice)', () => {
    expect(DEFAULT_BEDDING).toBe(3);
    expect(findBedding(undefined).condition).toBe(3);
    expect(findBedding(5).condition).toBe(5);
    expect(Object.keys(WRAP_WORDS)).toEqual(['none', 'polyethylene']);
  });
});
