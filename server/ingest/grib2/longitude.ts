/** GRIB2 writes longitudes east of Greenwich in [0, 360); every decoded longitude is brought into that range. */
export function wrapLongitude(degrees: number): number {
  const wrapped = degrees % 360;
  const positive = wrapped < 0 ? wrapped + 360 : wrapped;
  // Rounding can land exactly on 360 (e.g. -1e-15 + 360).
  return positive >= 360 ? positive - 360 : positive;
}
