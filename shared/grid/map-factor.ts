/**
 * Map factors, physical grid lengths and the Coriolis parameter for every point of a grid,
 * in the canonical layout. Horizontal derivative operators take these arrays as inputs.
 */
import type { GridGeometry } from "./geometry-types.ts";
import { gridCoordinates } from "./grid-coordinates.ts";
import { lambertPlaneFor, polarPlaneFor } from "./projection.ts";
import type { ConformalPlane } from "./conformal-plane.ts";
import { DEG_TO_RAD, EARTH_ANGULAR_VELOCITY } from "./earth-constants.ts";

/** Coriolis parameter f = 2 Ω sin φ (s⁻¹), Holton and Hakim (2013), ch. 2. */
export function coriolisParameter(latDeg: number): number {
  return 2 * EARTH_ANGULAR_VELOCITY * Math.sin(latDeg * DEG_TO_RAD);
}

/** f = 2 Ω sin φ at every grid point (s⁻¹). */
export function coriolisArray(geometry: GridGeometry): Float32Array {
  const { lat } = gridCoordinates(geometry);
  const f = new Float32Array(lat.length);
  const twoOmega = 2 * EARTH_ANGULAR_VELOCITY;
  for (let k = 0; k < lat.length; k++) f[k] = twoOmega * Math.sin(lat[k] * DEG_TO_RAD);
  return f;
}

function conformalPlaneOf(geometry: GridGeometry): ConformalPlane | null {
  if (geometry.kind === "lambert") return lambertPlaneFor(geometry);
  if (geometry.kind === "polar") return polarPlaneFor(geometry);
  return null;
}

/**
 * Map factor m at a latitude (degrees): Lambert m = ρ n / (a cos φ) (Snyder 1987, eq. 15-4),
 * polar stereographic m = 2 k0 / (1 ± sin φ) (Snyder 1987, ch. 21). A latitude–longitude grid is
 * not a conformal map of constant nominal spacing, so it returns 1 and its lengths come from
 * `gridSpacingArrays` instead.
 */
export function mapFactorAtLatitude(geometry: GridGeometry, latDeg: number): number {
  const plane = conformalPlaneOf(geometry);
  return plane ? plane.mapFactorAtLatitude(latDeg * DEG_TO_RAD) : 1;
}

/** Map factor m at every grid point (1 everywhere on a latitude–longitude grid). */
export function mapFactorArray(geometry: GridGeometry): Float32Array {
  const { lat } = gridCoordinates(geometry);
  const m = new Float32Array(lat.length);
  const plane = conformalPlaneOf(geometry);
  if (!plane) return m.fill(1);
  for (let k = 0; k < lat.length; k++) m[k] = plane.mapFactorAtLatitude(lat[k] * DEG_TO_RAD);
  return m;
}

export interface GridSpacing {
  /** Physical distance (m) between a point and its east/west (i ± 1) neighbour. */
  dx: Float32Array;
  /** Physical distance (m) between a point and its north/south (j ± 1) neighbour. */
  dy: Float32Array;
}

/**
 * Physical grid lengths at every point. Projected grids: nominal length / m. Latitude–longitude:
 * dx = a cos φ Δλ and dy = a Δφ (Holton and Hakim 2013, spherical coordinates); dx → 0 at the poles.
 */
export function gridSpacingArrays(geometry: GridGeometry): GridSpacing {
  const { lat } = gridCoordinates(geometry);
  const dx = new Float32Array(lat.length);
  const dy = new Float32Array(lat.length);
  if (geometry.kind === "latlon") {
    const dLambda = geometry.dlon * DEG_TO_RAD;
    const dPhiLength = geometry.earthRadius * geometry.dlat * DEG_TO_RAD;
    for (let k = 0; k < lat.length; k++) {
      dx[k] = geometry.earthRadius * Math.cos(lat[k] * DEG_TO_RAD) * dLambda;
      dy[k] = dPhiLength;
    }
    return { dx, dy };
  }
  const plane = conformalPlaneOf(geometry)!;
  for (let k = 0; k < lat.length; k++) {
    const m = plane.mapFactorAtLatitude(lat[k] * DEG_TO_RAD);
    dx[k] = geometry.dx / m;
    dy[k] = geometry.dy / m;
  }
  return { dx, dy };
}
