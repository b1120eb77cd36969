/**
 * The metric of a horizontal grid, in the one form every upper-level operator uses: the physical length
 * of one index step along i (hx) and along j (hy) at every point. Both a conformal projection
 * (hx = Δx_nominal / m) and a latitude–longitude grid (hx = a cos φ Δλ, hy = a Δφ) are orthogonal
 * curvilinear coordinates, so one set of formulas with scale factors hx, hy serves both; with
 * hx = Δx/m it reduces to the map-factor form of Haltiner and Williams (1980), and with the spherical
 * scale factors to the spherical form of Holton and Hakim (2013).
 */
import type { GridGeometry } from "../../grid/geometry-types.ts";
import { geometryKey } from "../../grid/geometry-key.ts";
import { gridCoordinates } from "../../grid/grid-coordinates.ts";
import { coriolisArray, mapFactorArray } from "../../grid/map-factor.ts";
import { rotationAngleArray } from "../../grid/wind-rotation.ts";
import { DEG_TO_RAD } from "../../grid/earth-constants.ts";
import { GridShapeError } from "../errors.ts";

/**
 * A flat Cartesian grid with one Coriolis parameter (an f-plane): for analytic checks and idealised
 * cases. Same canonical layout as real grids (index = j·nx + i, i along +x, j along +y).
 */
export interface FPlaneGeometry {
  kind: "fplane";
  nx: number;
  ny: number;
  /** Grid lengths (m). */
  dx: number;
  dy: number;
  /** Coriolis parameter (s⁻¹); negative for a Southern Hemisphere case. */
  coriolis: number;
  /** Winds on an f-plane are always along the grid axes. */
  uvRelativeToGrid: true;
}

export type JetGeometry = GridGeometry | FPlaneGeometry;

/** Latitude–longitude grids: no derivatives poleward of this (degrees), where a cos φ Δλ vanishes. */
export const POLAR_DERIVATIVE_LIMIT_DEGREES = 89;
/** No geostrophic wind equatorward of this latitude (degrees), where f → 0; common practice (no source). */
export const GEOSTROPHIC_LATITUDE_LIMIT_DEGREES = 10;

export interface HorizontalGrid {
  readonly geometry: JetGeometry;
  readonly nx: number;
  readonly ny: number;
  /** Physical length (m) of one step in i, at every point. */
  readonly hx: Float64Array;
  /** Physical length (m) of one step in j, at every point. */
  readonly hy: Float64Array;
  /**
   * (1/(hx hy)) ∂hx/∂j and (1/(hx hy)) ∂hy/∂i (m⁻¹): how fast the local axes turn along the grid lines.
   * They are the metric terms of the velocity-gradient tensor and of the geodesic turning of a curve.
   */
  readonly turnOfX: Float64Array;
  readonly turnOfY: Float64Array;
  /** Coriolis parameter f (s⁻¹) at every point. */
  readonly coriolis: Float64Array;
  /** 1 where centred derivatives are defined: not the outermost row/column, not poleward of 89° on lat–lon. */
  readonly derivativeValid: Uint8Array;
  /** 1 where the geostrophic wind is defined (derivatives defined and |φ| ≥ 10°, f ≠ 0). */
  readonly geostrophicValid: Uint8Array;
  /** cos θ, sin θ of the grid ↔ Earth wind rotation; null where grid axes already point east and north. */
  readonly rotationCos: Float32Array | null;
  readonly rotationSin: Float32Array | null;
}

const MAX_CACHED = 8;
const cache = new Map<string, HorizontalGrid>();

function keyOf(geometry: JetGeometry): string {
  if (geometry.kind === "fplane") return `fplane:${geometry.nx}x${geometry.ny}:${geometry.dx},${geometry.dy}:f${geometry.coriolis}`;
  return geometryKey(geometry);
}

/** The metric of a geometry, built on first use and then served from a small cache (read-only arrays). */
export function horizontalGridFor(geometry: JetGeometry): HorizontalGrid {
  const key = keyOf(geometry);
  const cached = cache.get(key);
  if (cached) {
    cache.delete(key);
    cache.set(key, cached);
    return cached;
  }
  const built = buildHorizontalGrid(geometry);
  cache.set(key, built);
  if (cache.size > MAX_CACHED) {
    const oldest = cache.keys().next().value;
    if (oldest !== undefined) cache.delete(oldest);
  }
  return built;
}

function checkShape(geometry: JetGeometry): void {
  const { nx, ny } = geometry;
  if (!Number.isInteger(nx) || !Number.isInteger(ny) || nx < 3 || ny < 3) {
    throw new GridShapeError(`geometry: expected integer nx, ny ≥ 3 for horizontal derivatives, received ${nx} × ${ny}`);
  }
  if (geometry.kind === "fplane") {
    if (!(geometry.dx > 0) || !(geometry.dy > 0)) {
      throw new GridShapeError(`geometry: f-plane grid lengths must be positive, received dx ${geometry.dx}, dy ${geometry.dy}`);
    }
    if (!Number.isFinite(geometry.coriolis)) throw new GridShapeError(`geometry: f-plane coriolis must be a number, received ${geometry.coriolis}`);
  }
}

function buildHorizontalGrid(geometry: JetGeometry): HorizontalGrid {
  checkShape(geometry);
  const { nx, ny } = geometry;
  const n = nx * ny;
  const hx = new Float64Array(n);
  const hy = new Float64Array(n);
  const coriolis = new Float64Array(n);
  const derivativeValid = new Uint8Array(n);
  const geostrophicValid = new Uint8Array(n);
  let latitude: Float32Array | null = null;
  let rotationCos: Float32Array | null = null;
  let rotationSin: Float32Array | null = null;

  if (geometry.kind === "fplane") {
    hx.fill(geometry.dx);
    hy.fill(geometry.dy);
    coriolis.fill(geometry.coriolis);
  } else {
    latitude = gridCoordinates(geometry).lat;
    coriolis.set(coriolisArray(geometry));
    if (geometry.kind === "latlon") {
      const dLambda = geometry.dlon * DEG_TO_RAD;
      const dPhiLength = geometry.earthRadius * geometry.dlat * DEG_TO_RAD;
      for (let j = 0; j < ny; j++) {
        // Exact row latitude in float64 (the cached coordinates are float32).
        const cosLat = Math.cos((geometry.lat0 + j * geometry.dlat) * DEG_TO_RAD);
        const rowHx = geometry.earthRadius * Math.max(cosLat, 0) * dLambda;
        hx.fill(rowHx, j * nx, (j + 1) * nx);
        hy.fill(dPhiLength, j * nx, (j + 1) * nx);
      }
    } else {
      const m = mapFactorArray(geometry);
      for (let k = 0; k < n; k++) {
        hx[k] = geometry.dx / m[k];
        hy[k] = geometry.dy / m[k];
      }
      const theta = rotationAngleArray(geometry);
      rotationCos = new Float32Array(n);
      rotationSin = new Float32Array(n);
      for (let k = 0; k < n; k++) {
        rotationCos[k] = Math.cos(theta[k]);
        rotationSin[k] = Math.sin(theta[k]);
      }
    }
  }

  const polarLimited = geometry.kind === "latlon";
  for (let j = 1; j < ny - 1; j++) {
    for (let i = 1; i < nx - 1; i++) {
      const k = j * nx + i;
      const absLat = latitude ? Math.abs(latitude[k]) : 45;
      const ok = !polarLimited || absLat <= POLAR_DERIVATIVE_LIMIT_DEGREES;
      derivativeValid[k] = ok ? 1 : 0;
      const geostrophicLatitudeOk = latitude === null || absLat >= GEOSTROPHIC_LATITUDE_LIMIT_DEGREES;
      geostrophicValid[k] = ok && geostrophicLatitudeOk && coriolis[k] !== 0 ? 1 : 0;
    }
  }

  const { turnOfX, turnOfY } = metricTurning(nx, ny, hx, hy);
  return { geometry, nx, ny, hx, hy, turnOfX, turnOfY, coriolis, derivativeValid, geostrophicValid, rotationCos, rotationSin };
}

/** Centred differences of the scale factors (one-sided on the border, so curve tracing near an edge stays finite). */
function metricTurning(nx: number, ny: number, hx: Float64Array, hy: Float64Array): { turnOfX: Float64Array; turnOfY: Float64Array } {
  const n = nx * ny;
  const turnOfX = new Float64Array(n);
  const turnOfY = new Float64Array(n);
  for (let j = 0; j < ny; j++) {
    const jm = j > 0 ? j - 1 : j;
    const jp = j < ny - 1 ? j + 1 : j;
    for (let i = 0; i < nx; i++) {
      const im = i > 0 ? i - 1 : i;
      const ip = i < nx - 1 ? i + 1 : i;
      const k = j * nx + i;
      const area = hx[k] * hy[k];
      if (!(area > 0)) continue;
      turnOfX[k] = (hx[jp * nx + i] - hx[jm * nx + i]) / ((jp - jm) * area);
      turnOfY[k] = (hy[j * nx + ip] - hy[j * nx + im]) / ((ip - im) * area);
    }
  }
  return { turnOfX, turnOfY };
}

/** Throws GridShapeError unless `array` holds one value per grid point. */
export function expectGridLength(name: string, array: ArrayLike<number> | undefined, grid: { nx: number; ny: number }): void {
  const expected = grid.nx * grid.ny;
  if (!array || array.length !== expected) {
    throw new GridShapeError(`${name}: expected ${expected} values (${grid.nx} × ${grid.ny}), received ${array ? array.length : "nothing"}`);
  }
}
