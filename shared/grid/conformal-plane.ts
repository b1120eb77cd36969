/**
 * Spherical conformal projections onto a plane whose origin is the cone apex (or the pole):
 *   x = ρ sin θ,  y = −ρ cos θ,  θ = n (λ − λ0),
 * which is Snyder's (1987) eqs. 14-1 and 14-2 with ρ0 moved into the grid's own offset.
 * Lambert conformal conic and polar stereographic share this form (north polar stereographic is
 * the n = 1 cone, south polar the n = −1 cone), so one forward/inverse pair serves both.
 * ρ carries the sign of n, as in Snyder's southern-hemisphere convention.
 */
import { DEG_TO_RAD, RAD_TO_DEG, wrapLongitudeDegrees } from "./earth-constants.ts";

export interface ConformalPlane {
  /** Cone constant n: sin φ0 of the cone, +1 for north polar stereographic, −1 for south. */
  readonly n: number;
  readonly radius: number;
  /** Central meridian λ0 in degrees. */
  readonly centralLonDeg: number;
  /** Signed ρ (m) at latitude φ (radians). */
  rhoAtLatitude(latRad: number): number;
  /** Latitude (radians) at signed ρ (m). */
  latitudeAtRho(rho: number): number;
  /** Scale factor (map factor m) at latitude φ (radians). */
  mapFactorAtLatitude(latRad: number): number;
}

/** Mutable output for plane coordinates, reused by callers to avoid allocating per point. */
export interface PlanePoint {
  x: number;
  y: number;
}

/** Mutable output for geographic coordinates in degrees. */
export interface GeoPoint {
  lat: number;
  lon: number;
}

const QUARTER_PI = Math.PI / 4;

/**
 * Lambert conformal conic on a sphere, tangent (φ1 = φ2) or secant.
 * Snyder (1987) eqs. 15-3 (n), 15-2 (F), 15-1 (ρ), 15-4 (scale k = ρ n / (R cos φ)); the inverse
 * latitude is the sphere inverse of ch. 15, φ = 2 arctan[(RF/ρ)^(1/n)] − π/2.
 */
export function lambertPlane(latin1Deg: number, latin2Deg: number, centralLonDeg: number, radius: number): ConformalPlane {
  const phi1 = latin1Deg * DEG_TO_RAD;
  const phi2 = latin2Deg * DEG_TO_RAD;
  const n =
    Math.abs(phi1 - phi2) < 1e-10
      ? Math.sin(phi1)
      : Math.log(Math.cos(phi1) / Math.cos(phi2)) /
        Math.log(Math.tan(QUARTER_PI + phi2 / 2) / Math.tan(QUARTER_PI + phi1 / 2));
  if (!Number.isFinite(n) || Math.abs(n) < 1e-9) {
    throw new RangeError(`Lambert standard parallels ${latin1Deg}°/${latin2Deg}° give no cone (n = ${n})`);
  }
  const radiusTimesF = (radius * Math.cos(phi1) * Math.pow(Math.tan(QUARTER_PI + phi1 / 2), n)) / n;
  return {
    n,
    radius,
    centralLonDeg,
    rhoAtLatitude: (latRad) => radiusTimesF / Math.pow(Math.tan(QUARTER_PI + latRad / 2), n),
    latitudeAtRho: (rho) =>
      rho === 0 ? Math.sign(n) * (Math.PI / 2) : 2 * Math.atan(Math.pow(radiusTimesF / rho, 1 / n)) - Math.PI / 2,
    mapFactorAtLatitude: (latRad) =>
      ((radiusTimesF / Math.pow(Math.tan(QUARTER_PI + latRad / 2), n)) * n) / (radius * Math.cos(latRad)),
  };
}

/**
 * Polar stereographic on a sphere, true scale at latitude φc.
 * Snyder (1987), ch. 21, polar aspect of the sphere: ρ = 2 R k0 tan(π/4 ∓ φ/2), k = 2 k0 / (1 ± sin φ),
 * inverse φ = ±(π/2 − 2 arctan(ρ / 2 R k0)); k0 = (1 + sin|φc|) / 2 so that k = 1 at φc.
 */
export function polarStereographicPlane(
  latTrueDeg: number,
  centralLonDeg: number,
  radius: number,
  southPole: boolean,
): ConformalPlane {
  const k0 = (1 + Math.sin(Math.abs(latTrueDeg) * DEG_TO_RAD)) / 2;
  const twoRk0 = 2 * radius * k0;
  if (!southPole) {
    return {
      n: 1,
      radius,
      centralLonDeg,
      rhoAtLatitude: (latRad) => twoRk0 * Math.tan(QUARTER_PI - latRad / 2),
      latitudeAtRho: (rho) => Math.PI / 2 - 2 * Math.atan(rho / twoRk0),
      mapFactorAtLatitude: (latRad) => (2 * k0) / (1 + Math.sin(latRad)),
    };
  }
  return {
    n: -1,
    radius,
    centralLonDeg,
    rhoAtLatitude: (latRad) => -twoRk0 * Math.tan(QUARTER_PI + latRad / 2),
    latitudeAtRho: (rho) => 2 * Math.atan(-rho / twoRk0) - Math.PI / 2,
    mapFactorAtLatitude: (latRad) => (2 * k0) / (1 - Math.sin(latRad)),
  };
}

/** Geographic (degrees) → plane (m, apex at the origin). Writes into `out` and returns it. */
export function planeForward(plane: ConformalPlane, latDeg: number, lonDeg: number, out: PlanePoint): PlanePoint {
  const rho = plane.rhoAtLatitude(latDeg * DEG_TO_RAD);
  const theta = plane.n * wrapLongitudeDegrees(lonDeg - plane.centralLonDeg) * DEG_TO_RAD;
  out.x = rho * Math.sin(theta);
  out.y = -rho * Math.cos(theta);
  return out;
}

/** Plane (m, apex at the origin) → geographic (degrees), Snyder (1987) eqs. 14-10, 14-11 with ρ0 = 0. */
export function planeInverse(plane: ConformalPlane, x: number, y: number, out: GeoPoint): GeoPoint {
  const sign = plane.n < 0 ? -1 : 1;
  const rho = sign * Math.hypot(x, y);
  const theta = rho === 0 ? 0 : Math.atan2(sign * x, -sign * y);
  out.lat = plane.latitudeAtRho(rho) * RAD_TO_DEG;
  out.lon = wrapLongitudeDegrees(plane.centralLonDeg + (theta / plane.n) * RAD_TO_DEG);
  return out;
}
