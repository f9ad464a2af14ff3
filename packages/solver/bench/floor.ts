import type { Project } from '../src/model/projectSchema.js';

/**
 * The floor of the in-process schedule: the least a program can do to get the same numbers, written
 * as plainly as possible with typed arrays — index the nodes, turn every pipe into two legs and add
 * up each node's Σ A·n and Σ Q²/a·n, find the fittings (a dead end, a branch, a bend over 0.5°), then
 * per fitting and case the pressure and the thrust, the envelope (largest total, horizontal, up,
 * down), and the bearing block: the area SF·T/σ, a face rounded up to the step, its volume, and the
 * Rankine passive resistance of the face. No marks, no words, no objects per fitting: a bound the
 * real schedule is measured against in the same run, never a replacement for it.
 *
 * Returns a checksum so that the work cannot be optimised away.
 */
export function floorSchedule(p: Project): number {
  const n = p.nodes.length;
  const index = new Map<string, number>();
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  const z = new Float64Array(n);
  const cover = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const node = p.nodes[i]!;
    index.set(node.id, i);
    x[i] = node.x;
    y[i] = node.y;
    z[i] = node.elevation;
    cover[i] = node.cover;
  }
  const degree = new Int32Array(n);
  const area = new Float64Array(3 * n);
  const flux = new Float64Array(3 * n);
  const od = new Float64Array(n);
  // The first two directions at each node, for the deflection of a two-pipe joint.
  const first = new Float64Array(6 * n);
  const outside = p.design.thrustArea === 'outside';
  for (const pipe of p.pipes) {
    const a = index.get(pipe.from)!;
    const b = index.get(pipe.to)!;
    const dx = x[b]! - x[a]!;
    const dy = y[b]! - y[a]!;
    const dz = z[b]! - z[a]!;
    const len = Math.sqrt(dx * dx + dy * dy + dz * dz);
    const d = outside ? pipe.outsideDiameter : pipe.insideDiameter;
    const A = (Math.PI * d * d) / 4;
    const a2 = (Math.PI * pipe.insideDiameter * pipe.insideDiameter) / 4;
    const k = (pipe.flow * pipe.flow) / a2;
    for (let end = 0; end < 2; end++) {
      const i = end === 0 ? a : b;
      const s = end === 0 ? 1 / len : -1 / len;
      const ux = dx * s,
        uy = dy * s,
        uz = dz * s;
      area[3 * i] = area[3 * i]! - A * ux;
      area[3 * i + 1] = area[3 * i + 1]! - A * uy;
      area[3 * i + 2] = area[3 * i + 2]! - A * uz;
      flux[3 * i] = flux[3 * i]! - k * ux;
      flux[3 * i + 1] = flux[3 * i + 1]! - k * uy;
      flux[3 * i + 2] = flux[3 * i + 2]! - k * uz;
      if (degree[i]! < 2) {
        first[6 * i + 3 * degree[i]!] = ux;
        first[6 * i + 3 * degree[i]! + 1] = uy;
        first[6 * i + 3 * degree[i]! + 2] = uz;
      }
      degree[i]!++;
      if (pipe.outsideDiameter > od[i]!) od[i] = pipe.outsideDiameter;
    }
  }
  const rho = p.water.density;
  const g = 9.80665;
  const cases = p.loadCases;
  const soil = p.soils[0]!;
  const sf = p.design.bearingSafetyFactor;
  const step = p.design.dimensionStep;
  const kp = Math.tan(((45 + soil.frictionAngle / 2) * Math.PI) / 180) ** 2;
  const up = (v: number) => Math.ceil(v / step - 1e-9) * step;
  const straight = Math.cos((0.5 * Math.PI) / 180);
  let check = 0;
  for (let i = 0; i < n; i++) {
    const deg = degree[i]!;
    if (deg === 0 || (deg === 1 && p.nodes[i]!.end === 'tie-in')) continue;
    if (deg === 2) {
      const c = -(
        first[6 * i]! * first[6 * i + 3]! +
        first[6 * i + 1]! * first[6 * i + 4]! +
        first[6 * i + 2]! * first[6 * i + 5]!
      );
      const sx = area[3 * i]!,
        sy = area[3 * i + 1]!,
        sz = area[3 * i + 2]!;
      if (c > straight && sx * sx + sy * sy + sz * sz < 1e-18) continue;
    }
    let largest = 0,
      horizontal = 0,
      upward = 0,
      downward = 0;
    for (const lc of cases) {
      const pr = Math.max(-101325, lc.pressure + rho * g * ((lc.datumElevation ?? z[i]!) - z[i]!));
      const m = rho * lc.flowFactor * lc.flowFactor;
      const tx = pr * area[3 * i]! + m * flux[3 * i]!;
      const ty = pr * area[3 * i + 1]! + m * flux[3 * i + 1]!;
      const tz = pr * area[3 * i + 2]! + m * flux[3 * i + 2]!;
      const h = Math.sqrt(tx * tx + ty * ty);
      const t = Math.sqrt(tx * tx + ty * ty + tz * tz);
      if (t > largest) largest = t;
      if (h > horizontal) horizontal = h;
      if (tz > upward) upward = tz;
      if (-tz > downward) downward = -tz;
    }
    const bearingArea = (sf * horizontal) / soil.bearing;
    const centre = cover[i]! + od[i]! / 2;
    const height = Math.max(
      up(od[i]!),
      Math.min(up(Math.sqrt(bearingArea)), Math.floor((2 * centre) / 3 / step) * step),
    );
    const width = Math.max(up(bearingArea / height), up(od[i]!));
    const top = centre - height / 2;
    const bottom = centre + height / 2;
    const passive =
      width *
      (0.5 * soil.unitWeight * kp * (bottom * bottom - top * top) + 2 * soil.cohesion * Math.sqrt(kp) * (bottom - top));
    const volume = width * height * p.design.blockDepth;
    check += largest + upward + downward + volume + passive / horizontal;
  }
  return check;
}
