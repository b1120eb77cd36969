/**
 * Latitude/longitude of every grid point (computed once per geometry and cached), nearest
 * grid point lookup and the grid's bounding box.
 */
import type { GridGeometry } from "./geometry-types.ts";
import { geometryKey } from "./geometry-key.ts";
import { BoundedCache } from "./bounded-cache.ts";
import { projectionForGeometry, type GeoPoint, type GridPoint, type GridProjection } from "./projection.ts";
import { wrapLongitudeDegrees } from "./earth-constants.ts";

export { geometryKey } from "./geometry-key.ts";

export interface GridCoordinates {
  /** Degrees north, canonical layout (index = j * nx + i). Shared from the cache: do not modify. */
  readonly lat: Float32Array;
  /** Degrees east in (−180, 180], canonical layout. Shared from the cache: do not modify. */
  readonly lon: Float32Array;
}

const coordinateCache = new BoundedCache<GridCoordinates>(16);
// Projections are cheap but not free (cone constants, the grid origin); lookups repeat them.
const projectionCache = new BoundedCache<GridProjection>(16);

/** Lat/lon arrays for a geometry, computed on first use and then served from a small cache. */
export function gridCoordinates(geometry: GridGeometry): GridCoordinates {
  return coordinateCache.getOrBuild(geometryKey(geometry), () => computeGridCoordinates(geometry));
}

function computeGridCoordinates(geometry: GridGeometry): GridCoordinates {
  const { nx, ny } = geometry;
  const lat = new Float32Array(nx * ny);
  const lon = new Float32Array(nx * ny);
  const projection = projectionForGeometry(geometry);
  const point: GeoPoint = { lat: 0, lon: 0 };
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      projection.gridToLatLon(i, j, point);
      const index = j * nx + i;
      lat[index] = point.lat;
      lon[index] = point.lon;
    }
  }
  return { lat, lon };
}

/** True when a latitude–longitude grid closes on itself in longitude (its last column neighbours the first). */
export function isGlobalInLongitude(geometry: GridGeometry): boolean {
  return geometry.kind === "latlon" && Math.abs(geometry.nx * geometry.dlon - 360) < 1e-6 * 360;
}

export interface NearestGridPoint {
  i: number;
  j: number;
  index: number;
}

/**
 * Nearest grid point to a latitude/longitude (degrees): inverse-project, then round.
 * Returns null when the point lies more than half a grid length outside the grid.
 * On a global latitude–longitude grid the column index wraps around.
 */
export function nearestGridPoint(geometry: GridGeometry, latDeg: number, lonDeg: number): NearestGridPoint | null {
  if (!Number.isFinite(latDeg) || !Number.isFinite(lonDeg)) return null;
  const projection = projectionCache.getOrBuild(geometryKey(geometry), () => projectionForGeometry(geometry));
  const fractional: GridPoint = projection.latLonToGrid(latDeg, lonDeg, { i: 0, j: 0 });
  if (!Number.isFinite(fractional.i) || !Number.isFinite(fractional.j)) return null;
  let i = Math.round(fractional.i);
  const j = Math.round(fractional.j);
  if (isGlobalInLongitude(geometry)) i = ((i % geometry.nx) + geometry.nx) % geometry.nx;
  if (i < 0 || i >= geometry.nx || j < 0 || j >= geometry.ny) return null;
  return { i, j, index: j * geometry.nx + i };
}

export interface BoundingBox {
  south: number;
  north: number;
  /** Western and eastern limits in (−180, 180]; west > east when the grid crosses the antimeridian. */
  west: number;
  east: number;
}

/**
 * Latitude/longitude box that holds every grid point. Longitudes are measured relative to the
 * grid's centre point so a grid across the antimeridian gets a tight box, not a world-wide one.
 */
export function boundingBox(geometry: GridGeometry): BoundingBox {
  const { lat, lon } = gridCoordinates(geometry);
  // A grid around a pole (or a global one) spans every longitude.
  if (isGlobalInLongitude(geometry) || containsPole(geometry, 90) || containsPole(geometry, -90)) {
    const south = containsPole(geometry, -90) ? -90 : minOf(lat);
    const north = containsPole(geometry, 90) ? 90 : maxOf(lat);
    return { south, north, west: -180, east: 180 };
  }
  const centre = lon[Math.floor(geometry.ny / 2) * geometry.nx + Math.floor(geometry.nx / 2)];
  let west = Infinity;
  let east = -Infinity;
  for (let k = 0; k < lon.length; k++) {
    const offset = wrapLongitudeDegrees(lon[k] - centre);
    if (offset < west) west = offset;
    if (offset > east) east = offset;
  }
  if (east - west >= 360) return { south: minOf(lat), north: maxOf(lat), west: -180, east: 180 };
  return {
    south: minOf(lat),
    north: maxOf(lat),
    west: wrapLongitudeDegrees(centre + west),
    east: wrapLongitudeDegrees(centre + east),
  };
}

/** Whether the pole at `poleLat` lies within the grid's rectangle in projection space. */
function containsPole(geometry: GridGeometry, poleLat: number): boolean {
  if (geometry.kind === "latlon") return false;
  const at = projectionForGeometry(geometry).latLonToGrid(poleLat, 0, { i: 0, j: 0 });
  return at.i >= 0 && at.i <= geometry.nx - 1 && at.j >= 0 && at.j <= geometry.ny - 1;
}

function minOf(values: Float32Array): number {
  let min = Infinity;
  for (let k = 0; k < values.length; k++) if (values[k] < min) min = values[k];
  return min;
}

function maxOf(values: Float32Array): number {
  let max = -Infinity;
  for (let k = 0; k < values.length; k++) if (values[k] > max) max = values[k];
  return max;
}
