import { DEG_TO_RAD } from "../grid/earth-constants.ts";
import { greatCircleKm, KM_PER_DEGREE } from "./great-circle.ts";

/** The grid points where a rule matched, as parallel latitude/longitude arrays (degrees). */
export interface MatchedPoints {
  lat: Float32Array;
  lon: Float32Array;
}

/** Gathers the points a 0/1 mask marks; `lat` and `lon` are the grid's coordinate arrays. */
export function pointsOfMask(mask: ArrayLike<number>, lat: ArrayLike<number>, lon: ArrayLike<number>): MatchedPoints {
  let count = 0;
  for (let i = 0; i < mask.length; i++) if (mask[i]) count++;
  const out = { lat: new Float32Array(count), lon: new Float32Array(count) };
  for (let i = 0, k = 0; i < mask.length; i++) {
    if (!mask[i]) continue;
    out.lat[k] = lat[i]!;
    out.lon[k] = lon[i]!;
    k++;
  }
  return out;
}

/**
 * True when any point lies within `km` of (lat, lon), by great-circle distance (haversine). A
 * cheap latitude/longitude box is checked first so most points never reach the trigonometry.
 */
export function anyPointWithinKm(points: MatchedPoints, lat: number, lon: number, km: number): boolean {
  const dLat = km / KM_PER_DEGREE;
  const dLon = km / (KM_PER_DEGREE * Math.max(0.01, Math.cos(lat * DEG_TO_RAD)));
  for (let k = 0; k < points.lat.length; k++) {
    const pLat = points.lat[k]!;
    const pLon = points.lon[k]!;
    if (Math.abs(pLat - lat) > dLat || Math.abs(pLon - lon) > dLon) continue;
    if (greatCircleKm(lat, lon, pLat, pLon) <= km) return true;
  }
  return false;
}

/** True when a point of any of the sets lies within `km` (the sets are checked in turn, nothing is copied). */
export function anySetWithinKm(sets: readonly MatchedPoints[], lat: number, lon: number, km: number): boolean {
  return sets.some((points) => anyPointWithinKm(points, lat, lon, km));
}
