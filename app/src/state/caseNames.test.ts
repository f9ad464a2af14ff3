import { describe, expect, it } from 'vitest';
import type { LoadCase } from '@mainbrace/solver';
import { caseNames } from './caseNames.js';

const cases: LoadCase[] = [
  { id: 'working', label: 'Working', kind: 'working', pressure: 1.0e6, flowFactor: 1 },
  { id: 'test', label: 'Field test', kind: 'test', pressure: 1.4e6, flowFactor: 0 },
];

describe('the case names a picker shows (a stable store selector)', () => {
  it('is the same array after a pressure edit, which replaces the case list but no name', () => {
    const before = caseNames(cases);
    const after = caseNames(cases.map((c) => (c.id === 'test' ? { ...c, pressure: 1.5e6 } : c)));
    expect(after).toBe(before);
    expect(after.map((c) => c.label)).toEqual(['Working', 'Field test']);
  });

  it('is a new array when a label, a kind or the list of cases changes', () => {
    const before = caseNames(cases);
    const renamed = caseNames(cases.map((c) => (c.id === 'test' ? { ...c, label: 'Hydrostatic' } : c)));
    expect(renamed).not.toBe(before);
    expect(renamed[1]).toEqual({ id: 'test', label: 'Hydrostatic', kind: 'test' });
    const fewer = caseNames(cases.slice(0, 1));
    expect(fewer.map((c) => c.id)).toEqual(['working']);
    const rekinded = caseNames(cases.map((c) => (c.id === 'test' ? { ...c, kind: 'other' as const } : c)));
    expect(rekinded[1]!.kind).toBe('other');
  });
});
