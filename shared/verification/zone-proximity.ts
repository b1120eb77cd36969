import { polygonsOf, ringsContain, type ZoneGeometry } from "../zones/zone-geometry.ts";
import { DEG_TO_RAD } from "../grid/earth-constants.ts";
import { KM_PER_DEGREE } from "./great-circle.ts";

/**
 * Distance (km) from a point to the segment a–b in a local equidistant cylindrical projection
 * centred on the point (Snyder 1987, Map Projections — A Working Manual, ch. 12, with the standard
 * parallel at the point's latitude). Over the tens of kilometres that matter here its error is a
 * small fraction of a kilometre.
 */
function segmentDistanceKm(lat: number, lon: number, cosLat: number, a: readonly number[], b: readonly number[]): number {
  const ax = (a[0]! - lon) * cosLat * KM_PER_DEGREE;
  const ay = (a[1]! - lat) * KM_PER_DEGREE;
  const bx = (b[0]! - lon) * cosLat * KM_PER_DEGREE;
  const by = (b[1]! - lat) * KM_PER_DEGREE;
  const dx = bx - ax;
  const dy = by - ay;
  const lengthSquared = dx * dx + dy * dy;
  // Parameter of the closest point on the segment to the origin (the report), clamped to its ends.
  const t = lengthSquared > 0 ? Math.min(1, Math.max(0, -(ax * dx + ay * dy) / lengthSquared)) : 0;
  return Math.hypot(ax + t * dx, ay + t * dy);
}

/** Shortest distance (km) from a point to any edge of the zone (outer rings and holes). */
export function distanceToZoneEdgeKm(geometry: ZoneGeometry, lat: number, lon: number): number {
  const cosLat = Math.cos(lat * DEG_TO_RAD);
  let best = Infinity;
  for (const polygon of polygonsOf(geometry)) {
    for (const ring of polygon) {
      for (let k = 0; k + 1 < ring.length; k++) best = Math.min(best, segmentDistanceKm(lat, lon, cosLat, ring[k]!, ring[k + 1]!));
    }
  }
  return best;
}

/**
 * How far a point lies outside a zone: 0 inside, otherwise the distance to the nearest edge.
 * A point within `edgeToleranceKm` of an edge counts as on the edge (distance 0), so a report
 * placed exactly on a border shared by two zones belongs to both, whatever rounding the
 * point-in-polygon test meets there.
 */
export function distanceOutsideZoneKm(geometry: ZoneGeometry, lat: number, lon: number, edgeToleranceKm: number): number {
  for (const polygon of polygonsOf(geometry)) if (ringsContain(polygon, lon, lat)) return 0;
  const edge = distanceToZoneEdgeKm(geometry, lat, lon);
  return edge <= edgeToleranceKm ? 0 : edge;
}
