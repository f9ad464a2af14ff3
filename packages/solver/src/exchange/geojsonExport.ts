import type { Project } from '../model/projectSchema.js';
import { analyse } from '../analysis/analyse.js';
import { scheduleOf } from '../schedule/scheduleOf.js';
import { elementName } from '../schedule/restraintElements.js';
import { settingOut } from '../schedule/settingOut.js';
import { CAUTIONS } from '../schedule/cautions.js';
import { projectionOf } from './localProjection.js';

/** GeoJSON numbers: degrees to 9 places (under a millimetre), levels and sizes to the millimetre. */
const deg = (v: number) => Math.round(v * 1e9) / 1e9;
const mm = (v: number) => Math.round(v * 1000) / 1000;
const r3 = (v: number) => Math.round(v * 1000) / 1000;

type Position = [number, number, number];
interface Feature {
  type: 'Feature';
  geometry: { type: 'Point'; coordinates: Position } | { type: 'LineString'; coordinates: Position[] };
  properties: Record<string, unknown>;
}

/** Why a design was not exported: no georeference (a drawn project), or one proj4 cannot use. */
export type ExportRefusal = 'not-placed' | 'bad-projection';

export type ExportResult =
  { ok: true; text: string; features: number } | { ok: false; reason: ExportRefusal; message: string };

/**
 * The design as an RFC 7946 FeatureCollection in WGS 84 longitude/latitude, back through the project's
 * georeference (routes.md, "Export"): pipes, fittings with their thrust, blocks, anchors and
 * restrained zones with their results; levels as the third coordinate (pipe centreline, m). SI values,
 * each property named with its unit.
 */
export function designGeoJson(project: Project): ExportResult {
  if (!project.georeference)
    return {
      ok: false,
      reason: 'not-placed',
      message:
        'the project has no georeference: it was not imported from GeoJSON and no proj4 definition was given, so its plan cannot be placed on the earth (import the route from GeoJSON, or a CSV survey with --proj4)',
    };
  let proj;
  try {
    proj = projectionOf(project.georeference.proj4);
  } catch (e) {
    return {
      ok: false,
      reason: 'bad-projection',
      message: `georeference.proj4 is not a projection proj4 can use: ${(e as Error).message}`,
    };
  }
  const at = (x: number, y: number, z: number): Position => {
    const [lon, lat] = proj.inverse([x, y]);
    return [deg(lon), deg(lat), mm(z)];
  };
  const analysis = analyse(project);
  const schedule = scheduleOf(analysis);
  const nodes = new Map(project.nodes.map((n) => [n.id, n]));
  const features: Feature[] = [];
  const point = (p: Position, properties: Record<string, unknown>) =>
    features.push({ type: 'Feature', geometry: { type: 'Point', coordinates: p }, properties });

  for (const pipe of project.pipes) {
    const a = nodes.get(pipe.from)!;
    const b = nodes.get(pipe.to)!;
    features.push({
      type: 'Feature',
      geometry: { type: 'LineString', coordinates: [at(a.x, a.y, a.elevation), at(b.x, b.y, b.elevation)] },
      properties: {
        layer: 'pipe',
        id: pipe.id,
        label: pipe.label ?? null,
        material: pipe.material,
        series: pipe.series ?? null,
        size: pipe.nominal ?? null,
        outsideDiameter_m: pipe.outsideDiameter,
        insideDiameter_m: pipe.insideDiameter,
      },
    });
  }
  for (const f of schedule.fittings) {
    const node = nodes.get(f.node)!;
    const fa = analysis.byNode.get(f.node)!;
    const adequate = !fa.diagnostics.some((d) => d.severity === 'error');
    point(at(node.x, node.y, node.elevation), {
      layer: 'fitting',
      mark: f.mark,
      node: f.node,
      kind: f.kind,
      deflection_deg: f.deflection === null ? null : r3(f.deflection),
      governingCase: f.governingCase,
      designPressure_Pa: Math.round(f.designPressure),
      horizontalThrust_N: Math.round(f.horizontalThrust),
      upwardThrust_N: Math.round(f.upwardThrust),
      downwardThrust_N: Math.round(f.downwardThrust),
      bearingDirection_deg: f.bearingDirection === null ? null : r3(f.bearingDirection),
      restraint: node.restraint,
      adequate,
      warnings: f.warnings,
    });
    // The block's middle as the schedule sets it out (settingOut.ts): one convention for every output.
    const place = settingOut(f, analysis.project.design.dimensionStep);
    for (const [kind, block, set] of [
      ['block', f.restraint.block, place.block],
      ['reverseBlock', f.restraint.reverseBlock, place.reverseBlock],
    ] as const) {
      if (!block || !set) continue;
      point(at(set.east, set.north, node.elevation), {
        layer: 'thrust-block',
        name: elementName(f.mark, kind),
        mark: f.mark,
        bearingArea_m2: r3(block.bearingArea),
        faceWidth_m: mm(block.faceWidth),
        faceHeight_m: mm(block.faceHeight),
        thickness_m: mm(block.depth),
        concreteVolume_m3: r3(block.concreteVolume),
        bearsToward_deg: r3(((Math.atan2(block.direction[0], block.direction[1]) * 180) / Math.PI + 360) % 360),
        adequate,
      });
    }
    if (f.restraint.anchor)
      point(at(node.x, node.y, node.elevation), {
        layer: 'gravity-anchor',
        name: elementName(f.mark, 'anchor'),
        mark: f.mark,
        side_m: mm(f.restraint.anchor.side),
        concreteVolume_m3: r3(f.restraint.anchor.concreteVolume),
        submerged: f.restraint.anchor.submerged,
        adequate,
      });
    for (const leg of f.restraint.restrainedLegs) {
      const pipe = project.pipes.find((p) => p.id === leg.pipe)!;
      const far = nodes.get(pipe.from === f.node ? pipe.to : pipe.from)!;
      const full = Math.hypot(far.x - node.x, far.y - node.y, far.elevation - node.elevation);
      const t = Math.min(1, leg.length / full);
      features.push({
        type: 'Feature',
        geometry: {
          type: 'LineString',
          coordinates: [
            at(node.x, node.y, node.elevation),
            at(
              node.x + t * (far.x - node.x),
              node.y + t * (far.y - node.y),
              node.elevation + t * (far.elevation - node.elevation),
            ),
          ],
        },
        properties: {
          layer: 'restrained-zone',
          name: elementName(f.mark, 'joints'),
          mark: f.mark,
          pipe: leg.pipe,
          toward: leg.toward,
          length_m: mm(leg.length),
          joints: leg.joints,
          beyondPipe: leg.length > full,
          adequate,
        },
      });
    }
  }
  const collection = {
    type: 'FeatureCollection',
    // Foreign members (RFC 7946 §6.1): what the file is and the cautions that go with every result.
    name: project.name,
    cautions: CAUTIONS,
    features,
  };
  return { ok: true, text: JSON.stringify(collection, null, 1) + '\n', features: features.length };
}
