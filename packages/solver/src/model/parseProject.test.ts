import { describe, it, expect } from 'vitest';
import { parseProject, parseProjectText } from './parseProject.js';
import { problemText } from './problems.js';

const good = () => ({
  format: 'mainbrace-project',
  version: 1,
  loadCases: [{ id: 'w', pressure: 700000 }],
  soils: [{ id: 's', bearing: 150000 }],
  nodes: [
    { id: 'a', x: 0, y: 0, elevation: 100 },
    { id: 'b', x: 10, y: 0, elevation: 100 },
  ],
  pipes: [{ id: 'p', from: 'a', to: 'b', outsideDiameter: 0.222, insideDiameter: 0.2 }],
});

const problems = (data: unknown) => {
  const r = parseProject(data);
  return r.ok ? [] : r.problems.map(problemText);
};

describe('reading a project file', () => {
  it('fills the documented defaults (project-format.md)', () => {
    const r = parseProject(good());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.project.units).toBe('si');
    expect(r.project.water.density).toBe(998.2);
    expect(r.project.design).toMatchObject({
      thrustArea: 'outside',
      bearingSafetyFactor: 1.5,
      concreteUnitWeight: 23600,
      groundwaterElevation: null,
    });
    expect(r.project.nodes[0]).toMatchObject({ cover: 1.2, end: 'cap', valve: false });
    expect(r.project.loadCases[0]?.flowFactor).toBe(1);
  });

  it('names the path of a bad value and what was expected', () => {
    const d = good();
    d.pipes[0]!.outsideDiameter = -1;
    expect(problems(d)).toContain('pipes[0].outsideDiameter: must be at least 0.01 m');
    const e = good() as Record<string, unknown>;
    (e.nodes as Record<string, unknown>[])[1]!.x = 'east';
    expect(problems(e)).toContain('nodes[1].x: expected a number, got the text "east"');
    (e.nodes as Record<string, unknown>[])[1]!.x = { metres: 10 };
    expect(problems(e)).toContain('nodes[1].x: expected a number, got an object');
    // the schema holds a label to 80 characters (projectSchema.ts); the refusal says so in words
    const f = good() as Record<string, unknown>;
    (f.nodes as Record<string, unknown>[])[0]!.label = 'x'.repeat(95);
    expect(problems(f)).toEqual(['nodes[0].label: must be at most 80 characters long; got 95']);
  });

  it('refuses unknown fields, naming each', () => {
    const d = good() as Record<string, unknown>;
    (d.nodes as Record<string, unknown>[])[0]!.colour = 'red';
    expect(problems(d)).toEqual(['nodes[0].colour: unknown field (not part of the project format)']);
  });

  it('checks ids, references, pipe ends and diameters across fields', () => {
    const d = good();
    d.nodes[1]!.id = 'a';
    d.pipes[0]!.insideDiameter = 0.3;
    const all = problems(d);
    expect(all).toContain('nodes[1].id: duplicate id "a" (already used by nodes[0])');
    expect(all).toContain('pipes[0].insideDiameter: must be less than outsideDiameter (0.222 m)');
    const e = good();
    e.pipes[0]!.to = 'zz';
    expect(problems(e)).toContain('pipes[0].to: must name a node in "nodes" (no node "zz")');
    const f = { ...good(), defaultSoil: 'clay' };
    expect(problems(f)).toContain('defaultSoil: must name a soil in "soils" (no soil "clay")');
    const g = { ...good(), loadCases: [] };
    expect(problems(g)).toContain('loadCases: must have at least one load case');
  });

  it('refuses two load cases of one name, which would make "governed by" ambiguous', () => {
    const d = good() as unknown as { loadCases: Record<string, unknown>[] };
    d.loadCases = [
      { id: 'working', label: 'Field test', kind: 'working', pressure: 6e5 },
      { id: 'test', label: 'Field test', kind: 'test', pressure: 9e5, flowFactor: 0 },
      { id: 'surge', kind: 'surge', pressure: 9e5 },
      { id: 'other', label: 'surge', pressure: 7e5 },
    ];
    expect(problems(d)).toEqual([
      'loadCases[1].label: "Field test" already names loadCases[0]: give each case a name of its own',
      'loadCases[3].label: "surge" already names loadCases[2]: give each case a name of its own',
    ]);
  });

  it('refuses a pipe whose two ends are at the same point', () => {
    const d = good();
    d.nodes[1]!.x = 0;
    expect(problems(d)).toContain('pipes[0].to: must be at another point than "from" (nodes a and b coincide)');
  });

  it('names the line and column of broken JSON', () => {
    const r = parseProjectText('{\n  "format": "mainbrace-project",\n  "version": 1,,\n}');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems[0]?.message).toMatch(/^not valid JSON at line 3, column \d+/);
  });

  it('refuses a file of another format or version', () => {
    expect(problems({ ...good(), format: 'other' })).toContain('format: must be exactly "mainbrace-project"');
    expect(problems({ ...good(), version: 2 })).toContain('version: must be 1 (the only version this program reads)');
  });
});

/** Every value of `stored` is found unchanged at the same path of `read`. */
function keeps(stored: unknown, read: unknown, path = '$'): string[] {
  if (stored === null || typeof stored !== 'object') return Object.is(stored, read) ? [] : [path];
  if (read === null || typeof read !== 'object') return [path];
  return Object.entries(stored).flatMap(([k, v]) => keeps(v, (read as Record<string, unknown>)[k], `${path}.${k}`));
}

describe('files written before soil classes and laying length', () => {
  it('open with every stored value unchanged, soils read as stored values, only defaults added', () => {
    // A file as an earlier version saved it: a soil copied from the old library under its old id and
    // source text, a pipe with a trench type and encasement, and no laying length.
    const old = {
      ...good(),
      design: { bearingSafetyFactor: 2, blockDepth: 0.5, trenchWidth: null, dimensionStep: 0.05 },
      soils: [
        {
          id: 'dipra-sandy-silt',
          label: 'Sandy silt',
          bearing: 143641.3,
          unitWeight: 18000,
          frictionAngle: 30,
          cohesion: 0,
          source: 'Horizontal bearing strength table, DIPRA (use with SF 1.5); γ, φ, c typical values',
        },
        {
          id: 'pvc-sand',
          label: 'Sand',
          bearing: 95760.5,
          unitWeight: 18500,
          frictionAngle: 32,
          cohesion: 0,
          minCover: 0.6096,
          source: 'Safe bearing load, PVC pipe literature (AWWA M23 / Uni-Bell lineage, unverified)',
        },
      ],
      defaultSoil: 'pvc-sand',
      pipes: [{ ...good().pipes[0]!, trenchType: 4, encasement: 'polyethylene' }],
    };
    const r = parseProject(structuredClone(old));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(keeps(old, r.project)).toEqual([]);
    expect(r.project.soils).toEqual(old.soils);
    expect(r.project.design.layingLength).toBe(6); // the documented default
  });
});

describe('the site-plan underlay (project-format.md, optional)', () => {
  // A 1×1 PNG, base64 of a real file: enough for the pattern check.
  const PNG =
    'data:image/png;base64,iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8DwHwAFBQIAX8jx0gAAAABJRU5ErkJggg==';
  const underlay = {
    name: 'site.png',
    mediaType: 'image/png',
    width: 800,
    height: 600,
    x: 10,
    y: 20,
    metresPerPixel: 0.05,
  };

  it('is optional: a file without it reads with no underlay', () => {
    const r = parseProject(good());
    expect(r.ok && r.project.underlay).toBe(undefined);
  });

  it('reads an inline image with its placement and fills opacity, rotation and lock', () => {
    const r = parseProject({ ...good(), underlay: { ...underlay, dataUrl: PNG } });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.project.underlay).toMatchObject({ ...underlay, dataUrl: PNG, rotation: 0, opacity: 0.5, locked: false });
  });

  it('reads an image kept in browser storage by its key', () => {
    const r = parseProject({ ...good(), underlay: { ...underlay, storageKey: 'mainbrace.underlay.1' } });
    expect(r.ok).toBe(true);
  });

  it('needs exactly one of the image or its storage key, and only PNG or JPEG data', () => {
    expect(problems({ ...good(), underlay })).toEqual([
      'underlay.dataUrl: give exactly one of dataUrl (the image in the file) or storageKey (the image in browser storage)',
    ]);
    expect(problems({ ...good(), underlay: { ...underlay, dataUrl: 'data:image/gif;base64,R0lGOD' } })).toEqual([
      'underlay.dataUrl: must be a data URL of a PNG or JPEG image (data:image/png;base64,...)',
    ]);
    expect(problems({ ...good(), underlay: { ...underlay, dataUrl: PNG, metresPerPixel: 0 } })).toEqual([
      'underlay.metresPerPixel: must be more than 0',
    ]);
  });
});
