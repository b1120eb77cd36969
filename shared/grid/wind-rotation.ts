/**
 * Rotation between grid-relative (along i, j) and Earth-relative (east, north) wind components.
 * On a conformal cone the grid's y axis points to the apex, so local north is turned from it by
 * θ = n (λ − λ0) (Snyder 1987, eq. 14-4, θ being the polar angle of the meridian on the map).
 * Polar stereographic is the n = ±1 cone; latitude–longitude grids need no rotation (θ = 0).
 */
import type { GridGeometry } from "./geometry-types.ts";
import { gridCoordinates } from "./grid-coordinates.ts";
import { lambertPlaneFor, polarPlaneFor } from "./projection.ts";
import { DEG_TO_RAD, wrapLongitudeDegrees } from "./earth-constants.ts";

/** Cone constant n: Lambert n, +1 north polar stereographic, −1 south, 0 latitude–longitude. */
export function coneConstant(geometry: GridGeometry): number {
  if (geometry.kind === "lambert") return lambertPlaneFor(geometry).n;
  if (geometry.kind === "polar") return polarPlaneFor(geometry).n;
  return 0;
}

/** Rotation angle θ = n (λ − λ0) in radians at longitude λ (degrees), λ − λ0 wrapped to (−180°, 180°]. */
export function rotationAngle(geometry: GridGeometry, lonDeg: number): number {
  if (geometry.kind === "latlon") return 0;
  return coneConstant(geometry) * wrapLongitudeDegrees(lonDeg - geometry.lonV) * DEG_TO_RAD;
}

/** θ (radians) at every grid point, canonical layout. */
export function rotationAngleArray(geometry: GridGeometry): Float32Array {
  const { lon } = gridCoordinates(geometry);
  const theta = new Float32Array(lon.length);
  if (geometry.kind === "latlon") return theta;
  const n = coneConstant(geometry);
  for (let k = 0; k < lon.length; k++) theta[k] = n * wrapLongitudeDegrees(lon[k] - geometry.lonV) * DEG_TO_RAD;
  return theta;
}

function checkLengths(u: Float32Array, v: Float32Array, theta: Float32Array): void {
  if (u.length !== v.length || u.length !== theta.length) {
    throw new RangeError(`wind rotation needs equal lengths: u ${u.length}, v ${v.length}, angles ${theta.length}`);
  }
}

/** Grid-relative → Earth-relative, in place: u_e = u_g cos θ + v_g sin θ, v_e = −u_g sin θ + v_g cos θ. */
export function rotateGridToEarth(u: Float32Array, v: Float32Array, theta: Float32Array): void {
  checkLengths(u, v, theta);
  for (let k = 0; k < u.length; k++) {
    const c = Math.cos(theta[k]);
    const s = Math.sin(theta[k]);
    const ug = u[k];
    const vg = v[k];
    u[k] = ug * c + vg * s;
    v[k] = -ug * s + vg * c;
  }
}

/** Earth-relative → grid-relative, in place: u_g = u_e cos θ − v_e sin θ, v_g = u_e sin θ + v_e cos θ. */
export function rotateEarthToGrid(u: Float32Array, v: Float32Array, theta: Float32Array): void {
  checkLengths(u, v, theta);
  for (let k = 0; k < u.length; k++) {
    const c = Math.cos(theta[k]);
    const s = Math.sin(theta[k]);
    const ue = u[k];
    const ve = v[k];
    u[k] = ue * c - ve * s;
    v[k] = ue * s + ve * c;
  }
}
