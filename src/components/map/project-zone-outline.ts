import type { GridGeometry } from "@shared/grid/geometry-types.ts";
import { projectionForGeometry, type GridPoint } from "@shared/grid/projection.ts";
import { polygonsOf, type ZoneGeometry } from "@shared/zones/zone-geometry.ts";
import type { GridPolylines } from "./project-outlines.ts";

/**
 * A forecast zone's rings carried into a grid's index space, to be stroked over the field with the
 * same transform as everything else. A zone's mask treats each edge as straight in longitude and
 * latitude, which a projected grid bends slightly; long edges are therefore cut into pieces of at
 * most MAX_EDGE_STEP_DEG so the drawn outline follows the cells the mask holds.
 */
export const MAX_EDGE_STEP_DEG = 0.25;

export function projectZoneOutline(geometry: GridGeometry, zone: ZoneGeometry): GridPolylines {
  const projection = projectionForGeometry(geometry);
  const at: GridPoint = { i: 0, j: 0 };
  const points: number[] = [];
  const starts: number[] = [];
  const add = (lon: number, lat: number) => {
    projection.latLonToGrid(lat, lon, at);
    points.push(at.i, at.j);
  };
  for (const polygon of polygonsOf(zone)) {
    for (const ring of polygon) {
      if (ring.length < 2) continue;
      starts.push(points.length / 2);
      for (let k = 0; k + 1 < ring.length; k++) {
        const [lon0, lat0] = ring[k] as [number, number];
        const [lon1, lat1] = ring[k + 1] as [number, number];
        const pieces = Math.max(1, Math.ceil(Math.max(Math.abs(lon1 - lon0), Math.abs(lat1 - lat0)) / MAX_EDGE_STEP_DEG));
        for (let p = 0; p < pieces; p++) add(lon0 + ((lon1 - lon0) * p) / pieces, lat0 + ((lat1 - lat0) * p) / pieces);
      }
      // GeoJSON rings repeat their first position last: ending there closes the drawn line.
      const [lonEnd, latEnd] = ring[ring.length - 1] as [number, number];
      add(lonEnd, latEnd);
    }
  }
  starts.push(points.length / 2);
  return { points: Float32Array.from(points), starts: Uint32Array.from(starts) };
}
