import { describe, it, expect } from 'vitest';
import { fileKind } from './routeImport.js';

describe('what an opened file holds', () => {
  it('takes .csv, .txt and .geojson by their names', () => {
    expect(fileKind('survey.CSV', 'E,N\n1,2\n')).toBe('csv');
    expect(fileKind('points.txt', 'E;N\n1;2\n')).toBe('csv');
    expect(fileKind('route.geojson', '{}')).toBe('geojson');
  });

  it('tells a GeoJSON .json from a project file by its content', () => {
    expect(fileKind('route.json', '{"type":"FeatureCollection","features":[]}')).toBe('geojson');
    expect(fileKind('main.json', '{"format":"mainbrace-project","version":1}')).toBe('project');
    // Not JSON at all: the project reader names the line and column.
    expect(fileKind('broken.json', '{"format": ')).toBe('project');
  });
});
