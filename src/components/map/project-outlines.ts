import type { GridGeometry } from "@shared/grid/geometry-types.ts";
import { projectionForGeometry, type GridPoint } from "@shared/grid/projection.ts";

/**
 * Map outlines (coastlines, borders) carried into a grid's own index space, so they can be drawn
 * over a field with the same transform as the field itself. Each vertex goes through the grid's
 * projection (latLonToGrid); a segment is kept only when both of its ends lie on the grid's drawn
 * area, so lines stop at the edge instead of streaking across the map.
 */

/** Polylines in fractional grid coordinates: line k is points[2·starts[k] .. 2·starts[k+1]) as (i, j) pairs. */
export interface GridPolylines {
  points: Float32Array;
  /** Vertex index where each line starts, plus one final entry equal to the vertex count. */
  starts: Uint32Array;
}

export type LonLat = readonly [number, number] | readonly number[];

/** A vertex more than this many grid lengths from the previous one is a wrap (antimeridian), not a line. */
function maxStep(geometry: GridGeometry): number {
  return Math.max(geometry.nx, geometry.ny) / 2;
}

/** Projects lines of [longitude, latitude] vertices (degrees) onto the grid. */
export function projectOutlines(geometry: GridGeometry, lines: readonly (readonly LonLat[])[]): GridPolylines {
  // Every vertex is projected: about 83 000 of them took 53 ms for a 1799 × 1059 grid here, while a
  // latitude–longitude box to skip far-away ones first cost about a second on the same grid.
  const projection = projectionForGeometry(geometry);
  const iMax = geometry.nx - 0.5;
  const jMax = geometry.ny - 0.5;
  const step = maxStep(geometry);
  const point: GridPoint = { i: 0, j: 0 };
  const points: number[] = [];
  const starts: number[] = [];

  for (const line of lines) {
    let runLength = 0;
    let prevI = Number.NaN;
    let prevJ = Number.NaN;
    let prevInside = false;
    for (const vertex of line) {
      const lon = vertex[0]!;
      const lat = vertex[1]!;
      projection.latLonToGrid(lat, lon, point);
      // NaN (a point the projection cannot place, such as the far pole) fails these tests too.
      const inside = point.i >= -0.5 && point.i <= iMax && point.j >= -0.5 && point.j <= jMax;
      const joins = inside && prevInside && Math.abs(point.i - prevI) <= step && Math.abs(point.j - prevJ) <= step;
      if (joins) {
        if (runLength === 0) {
          starts.push(points.length / 2);
          points.push(prevI, prevJ);
          runLength = 1;
        }
        points.push(point.i, point.j);
        runLength++;
      } else {
        runLength = 0;
      }
      prevInside = inside;
      prevI = inside ? point.i : Number.NaN;
      prevJ = inside ? point.j : Number.NaN;
    }
  }
  starts.push(points.length / 2);
  return { points: Float32Array.from(points), starts: Uint32Array.from(starts) };
}

/** Number of polylines held. */
export function polylineCount(lines: GridPolylines): number {
  return lines.starts.length - 1;
}
