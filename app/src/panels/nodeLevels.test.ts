import { describe, it, expect } from 'vitest';
import type { ProjectNode } from '@mainbrace/solver';
import { levelPatch } from './nodeLevels.js';

const node = (extra: Partial<ProjectNode> = {}): ProjectNode => ({
  id: 'n1',
  x: 0,
  y: 0,
  elevation: 100,
  cover: 1.2,
  end: 'cap',
  valve: false,
  restraint: 'block',
  ...extra,
});

// Hand calculations, OD 0.3 m: ground = pipe + OD/2 + cover.
describe('typing one of ground, cover and pipe level', () => {
  it('adds a ground level where the stated cover puts it (100 + 0.15 + 1.2 = 101.35 m)', () => {
    expect(levelPatch(node(), 0.3, { typed: 'add-ground' })).toEqual({ groundLevel: 101.35, cover: 1.2 });
  });
  it('places the pipe from a typed cover (102 − 1.5 − 0.15 = 100.35 m)', () => {
    expect(levelPatch(node({ groundLevel: 102 }), 0.3, { typed: 'cover', value: 1.5 })).toEqual({
      cover: 1.5,
      elevation: 100.35,
    });
  });
  it('derives the cover from a typed pipe level (102 − 99.5 − 0.15 = 2.35 m)', () => {
    expect(levelPatch(node({ groundLevel: 102 }), 0.3, { typed: 'pipe', value: 99.5 })).toEqual({
      elevation: 99.5,
      cover: 2.35,
    });
  });
  it('keeps the cover and moves the pipe with a new ground (cover 1.85 m; 103 − 1.85 − 0.15 = 101 m)', () => {
    expect(levelPatch(node({ groundLevel: 102 }), 0.3, { typed: 'ground', value: 103 })).toEqual({
      groundLevel: 103,
      elevation: 101,
      cover: 1.85,
    });
  });
  it('without a ground level, cover and pipe level stay independent', () => {
    expect(levelPatch(node(), 0.3, { typed: 'cover', value: 2 })).toEqual({ cover: 2 });
    expect(levelPatch(node(), 0.3, { typed: 'pipe', value: 98 })).toEqual({ elevation: 98 });
  });
  it('removing the ground level keeps the cover it gave, so nothing moves', () => {
    expect(levelPatch(node({ groundLevel: 102, cover: 9 }), 0.3, { typed: 'remove-ground' })).toEqual({
      groundLevel: undefined,
      cover: 1.85,
    });
  });
});
