import { DEG_TO_RAD } from "../grid/earth-constants.ts";

/** Mean radius of the Earth, R₁ = (2a + b)/3 of GRS80, in km: Moritz (2000), Geodetic Reference System 1980, J. Geodesy 74, 128–133. */
export const MEAN_EARTH_RADIUS_KM = 6371.0088;

/** Kilometres per degree of latitude on that sphere (2πR / 360). */
export const KM_PER_DEGREE = MEAN_EARTH_RADIUS_KM * DEG_TO_RAD;

/**
 * Great-circle distance (km) between two points given in degrees, by the haversine formula
 * (Sinnott 1984, "Virtues of the haversine", Sky and Telescope 68(2), 159), which stays accurate
 * for the short distances report matching works with.
 */
export function greatCircleKm(lat1: number, lon1: number, lat2: number, lon2: number): number {
  const dLat = (lat2 - lat1) * DEG_TO_RAD;
  const dLon = (lon2 - lon1) * DEG_TO_RAD;
  const s = Math.sin(dLat / 2) ** 2 + Math.cos(lat1 * DEG_TO_RAD) * Math.cos(lat2 * DEG_TO_RAD) * Math.sin(dLon / 2) ** 2;
  return 2 * MEAN_EARTH_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(s)));
}
