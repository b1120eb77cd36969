import { z } from "zod";

/**
 * Forecast-zone shapes as GeoJSON (RFC 7946) Polygon or MultiPolygon geometries, longitude first,
 * WGS 84 degrees. Validation refuses what would make a grid mask meaningless.
 */
const position = z.tuple([z.number().finite(), z.number().finite()]).rest(z.number().finite());
const ring = z.array(position);
export const polygonGeometry = z.object({ type: z.literal("Polygon"), coordinates: z.array(ring).min(1, "A polygon needs an outer ring") });
export const multiPolygonGeometry = z.object({
  type: z.literal("MultiPolygon"),
  coordinates: z.array(z.array(ring).min(1, "Each polygon needs an outer ring")).min(1, "A multipolygon needs at least one polygon"),
});
export const zoneGeometrySchema = z.discriminatedUnion("type", [polygonGeometry, multiPolygonGeometry], {
  error: "The zone geometry must be a GeoJSON Polygon or MultiPolygon",
});
export type ZoneGeometry = z.infer<typeof zoneGeometrySchema>;

/** Rings of every polygon: [polygon][ring][vertex] = [lon, lat]. */
export function polygonsOf(geometry: ZoneGeometry): number[][][][] {
  return geometry.type === "Polygon" ? [geometry.coordinates] : geometry.coordinates;
}

export const MAX_RING_VERTICES = 5000;

/** Where two edges (a, b) of one ring cross, or null. Segments sharing an end point do not count. */
function segmentsCross(p1: number[], p2: number[], p3: number[], p4: number[]): boolean {
  const d = (a: number[], b: number[], c: number[]) => (b[0]! - a[0]!) * (c[1]! - a[1]!) - (b[1]! - a[1]!) * (c[0]! - a[0]!);
  const d1 = d(p3, p4, p1);
  const d2 = d(p3, p4, p2);
  const d3 = d(p1, p2, p3);
  const d4 = d(p1, p2, p4);
  return ((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0));
}

/**
 * Every problem with a zone geometry, as plain sentences naming the polygon, ring and vertex:
 * unclosed rings, too few vertices, coordinates off the globe, rings that cross themselves.
 */
export function zoneGeometryProblems(geometry: ZoneGeometry): string[] {
  const problems: string[] = [];
  polygonsOf(geometry).forEach((polygon, p) => {
    polygon.forEach((r, k) => {
      const where = `${geometry.type === "MultiPolygon" ? `polygon ${p + 1}, ` : ""}${k === 0 ? "outer ring" : `hole ${k}`}`;
      if (r.length < 4) {
        problems.push(`${where}: a ring needs at least 4 positions (the last repeating the first), found ${r.length}`);
        return;
      }
      if (r.length > MAX_RING_VERTICES) {
        problems.push(`${where}: ${r.length} vertices is more than the ${MAX_RING_VERTICES} allowed; simplify the shape`);
        return;
      }
      const first = r[0]!;
      const last = r[r.length - 1]!;
      if (first[0] !== last[0] || first[1] !== last[1]) problems.push(`${where}: the ring is not closed (the last position must repeat the first)`);
      r.forEach(([lon, lat], v) => {
        if (lon! < -180 || lon! > 180 || lat! < -90 || lat! > 90) problems.push(`${where}, vertex ${v + 1}: [${lon}, ${lat}] is not a longitude/latitude in degrees`);
      });
      const edges = r.length - 1;
      outer: for (let a = 0; a < edges; a++) {
        for (let b = a + 2; b < edges; b++) {
          if (a === 0 && b === edges - 1) continue; // first and last edge share the closing vertex
          if (segmentsCross(r[a]!, r[a + 1]!, r[b]!, r[b + 1]!)) {
            problems.push(`${where}: the ring crosses itself between vertices ${a + 1}–${a + 2} and ${b + 1}–${b + 2}`);
            break outer;
          }
        }
      }
    });
  });
  return problems;
}

/**
 * Even–odd ray casting in longitude/latitude (Shimrat 1962; the crossing-number test). Zones are
 * small enough that treating degrees as planar coordinates is the usual choice for masks.
 */
export function ringsContain(rings: readonly (readonly number[])[][], lon: number, lat: number): boolean {
  let inside = false;
  for (const r of rings) {
    for (let a = 0, b = r.length - 1; a < r.length; b = a++) {
      const xa = r[a]![0]!;
      const ya = r[a]![1]!;
      const xb = r[b]![0]!;
      const yb = r[b]![1]!;
      if (ya > lat !== yb > lat && lon < ((xb - xa) * (lat - ya)) / (yb - ya) + xa) inside = !inside;
    }
  }
  return inside;
}

/** 1 where a grid point (lat/lon arrays, degrees) lies in the zone, else 0. */
export function zoneMask(geometry: ZoneGeometry, lat: ArrayLike<number>, lon: ArrayLike<number>): Uint8Array {
  const mask = new Uint8Array(lat.length);
  for (const polygon of polygonsOf(geometry)) {
    let west = Infinity;
    let east = -Infinity;
    let south = Infinity;
    let north = -Infinity;
    for (const [x, y] of polygon[0]!) {
      west = Math.min(west, x!);
      east = Math.max(east, x!);
      south = Math.min(south, y!);
      north = Math.max(north, y!);
    }
    for (let i = 0; i < mask.length; i++) {
      if (mask[i]) continue;
      const la = lat[i]!;
      const lo = lon[i]!;
      if (la < south || la > north || lo < west || lo > east) continue;
      if (ringsContain(polygon, lo, la)) mask[i] = 1;
    }
  }
  return mask;
}
