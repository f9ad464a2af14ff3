import { describe, expect, it } from 'vitest';
import { routePieces } from './connectivity.js';
import { chain, emptyProject, project } from '../testFixtures.js';

describe('routePieces', () => {
  it('finds one piece in a connected main and none in an empty project', () => {
    expect(routePieces(chain([0, 0], [30, 0], [30, 40]))).toEqual([['n1', 'n2', 'n3']]);
    expect(routePieces(emptyProject())).toEqual([]);
  });
  it('finds a run drawn apart from the main as a second, smaller piece', () => {
    const doc = project(
      [
        { id: 'a', x: 0, y: 0 },
        { id: 'b', x: 30, y: 0 },
        { id: 'c', x: 60, y: 0 },
        { id: 'd', x: 15, y: 2 },
        { id: 'e', x: 15, y: 30 },
      ],
      [
        { from: 'a', to: 'b' },
        { from: 'b', to: 'c' },
        { from: 'd', to: 'e' },
      ],
    );
    expect(routePieces(doc)).toEqual([
      ['a', 'b', 'c'],
      ['d', 'e'],
    ]);
  });
});
