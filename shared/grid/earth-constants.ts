/**
 * Earth constants the grid geometry needs. Kept beside the geometry code so `shared/grid`
 * has no dependency on the thermodynamics modules.
 */

/** Sphere radius (m) of WMO GRIB2 Code Table 3.2, shape of the Earth code figure 6; the default when a file declares none. */
export const DEFAULT_EARTH_RADIUS_M = 6_371_229;

/** Angular velocity of the Earth's rotation (rad s⁻¹), GRS80 (Moritz 1980). */
export const EARTH_ANGULAR_VELOCITY = 7.292115e-5;

export const DEG_TO_RAD = Math.PI / 180;
export const RAD_TO_DEG = 180 / Math.PI;

/** Wraps an angle in degrees to (-180, 180]. */
export function wrapLongitudeDegrees(lonDeg: number): number {
  let wrapped = lonDeg - 360 * Math.floor((lonDeg + 180) / 360);
  if (wrapped === -180) wrapped = 180;
  return wrapped;
}
