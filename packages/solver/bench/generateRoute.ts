import type { ProjectInput } from '../src/model/projectSchema.js';

/**
 * A long generated main for benchmarks: a zig-zag of bends (±22.5°, ±45°) rising and falling,
 * with a capped branch at every fifth node (a tee and a dead end), three load cases. Deterministic.
 * Roughly `fittings` fittings need restraint.
 */
export function generateRoute(fittings: number): ProjectInput {
  const nodes: ProjectInput['nodes'] = [];
  const pipes: ProjectInput['pipes'] = [];
  let x = 0;
  let y = 0;
  let heading = 0;
  let count = 0;
  let i = 0;
  const node = (id: string, nx: number, ny: number, z: number, end?: 'tie-in') =>
    nodes.push({
      id,
      x: Math.round(nx * 100) / 100,
      y: Math.round(ny * 100) / 100,
      elevation: z,
      ...(end ? { end } : {}),
    });
  node('n0', 0, 0, 100, 'tie-in');
  while (count < fittings) {
    i++;
    const turn = [22.5, -22.5, 45, -45][i % 4]!;
    heading += (turn * Math.PI) / 180;
    x += 40 * Math.cos(heading);
    y += 40 * Math.sin(heading);
    const z = 100 + 3 * Math.sin(i / 7);
    node(`n${i}`, x, y, z);
    pipes.push({
      id: `p${i}`,
      from: `n${i - 1}`,
      to: `n${i}`,
      outsideDiameter: 0.326,
      insideDiameter: 0.3168,
      flow: 0.05,
    });
    count++;
    if (i % 5 === 0 && count < fittings) {
      const bx = x + 15 * Math.cos(heading + Math.PI / 2);
      const by = y + 15 * Math.sin(heading + Math.PI / 2);
      node(`b${i}`, bx, by, z);
      pipes.push({ id: `q${i}`, from: `n${i}`, to: `b${i}`, outsideDiameter: 0.17, insideDiameter: 0.164 });
      count++;
    }
  }
  return {
    format: 'mainbrace-project',
    version: 1,
    name: `Generated main, ${fittings} fittings`,
    loadCases: [
      { id: 'working', pressure: 620e3, datumElevation: 100, flowFactor: 1 },
      { id: 'surge', pressure: 930e3, datumElevation: 100, flowFactor: 1 },
      { id: 'test', pressure: 1035e3, datumElevation: 97, flowFactor: 0 },
    ],
    soils: [{ id: 'sand', bearing: 95761, unitWeight: 19000, frictionAngle: 34 }],
    nodes,
    pipes,
  };
}
