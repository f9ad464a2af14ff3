import proj4 from 'proj4';

/**
 * A plane in metres about a route, from WGS 84 longitude/latitude (RFC 7946 §4), through proj4.
 * A transverse Mercator with its central meridian and origin at the route's middle and scale 1 keeps
 * the plane conformal (angles true) and its scale error below 1 part in 10⁵ within about 28 km of
 * the central meridian, 2.5 in 10⁵ at 45 km and 1 in 10⁴ at 90 km (scale k ≈ 1 + x²/2R², Snyder, "Map
 * Projections — A Working Manual", 1987, eq. 8-11), so lengths and bend angles read off the plane are
 * those on the ground.
 */
export interface PlanProjection {
  /** the proj4 definition the project stores (project-format.md, "Georeference") */
  proj4: string;
  /** [longitude, latitude] degrees → [east, north] metres */
  forward: (lonLat: readonly [number, number]) => [number, number];
  /** [east, north] metres → [longitude, latitude] degrees */
  inverse: (xy: readonly [number, number]) => [number, number];
}

/** The local transverse Mercator about a point: central meridian lon0, origin latitude lat0. */
export function localTransverseMercator(lon0: number, lat0: number): PlanProjection {
  const r = (v: number) => Math.round(v * 1e7) / 1e7;
  return projectionOf(
    `+proj=tmerc +lat_0=${r(lat0)} +lon_0=${r(lon0)} +k=1 +x_0=0 +y_0=0 +ellps=WGS84 +units=m +no_defs`,
  );
}

/** A projection of WGS 84 from its proj4 definition; throws with proj4's message when it is not one. */
export function projectionOf(definition: string): PlanProjection {
  let converter;
  try {
    converter = proj4('EPSG:4326', definition);
  } catch (e) {
    // proj4 throws a bare string for a definition it cannot parse
    throw new Error(e instanceof Error ? e.message : String(e), { cause: e });
  }
  return {
    proj4: definition,
    forward: ([lon, lat]) => {
      const [x, y] = converter.forward([lon, lat]);
      return [x!, y!];
    },
    inverse: ([x, y]) => {
      const [lon, lat] = converter.inverse([x, y]);
      return [lon!, lat!];
    },
  };
}

/**
 * The middle of the routes' extent, [lon, lat]: where the local plane is centred. A route spanning
 * more than 180° of longitude is taken to cross the 180th meridian (no water main goes half round
 * the earth): its longitudes are read east of 0 to 360, else its middle would lie on the far side of
 * the earth, where the plane is useless.
 */
export function extentMiddle(points: Iterable<readonly [number, number]>): [number, number] {
  let minLon = Infinity;
  let maxLon = -Infinity;
  let minEast = Infinity;
  let maxEast = -Infinity;
  let minLat = Infinity;
  let maxLat = -Infinity;
  for (const [lon, lat] of points) {
    minLon = Math.min(minLon, lon);
    maxLon = Math.max(maxLon, lon);
    const east = lon < 0 ? lon + 360 : lon;
    minEast = Math.min(minEast, east);
    maxEast = Math.max(maxEast, east);
    minLat = Math.min(minLat, lat);
    maxLat = Math.max(maxLat, lat);
  }
  const lat = (minLat + maxLat) / 2;
  if (maxLon - minLon <= 180) return [(minLon + maxLon) / 2, lat];
  const mid = (minEast + maxEast) / 2;
  return [mid > 180 ? mid - 360 : mid, lat];
}

/** m, the earth's mean radius (IUGG): the R of the scale error x²/2R² (Snyder 1987, eq. 8-11). */
const EARTH_RADIUS = 6_371_008.8;

/** The scale error of the local plane at `x` metres east or west of its central meridian, k − 1. */
export const scaleError = (x: number): number => (x * x) / (2 * EARTH_RADIUS * EARTH_RADIUS);
