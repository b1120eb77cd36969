import {
  lambertPlane,
  planeForward,
  planeInverse,
  polarStereographicPlane,
  type ConformalPlane,
} from "../../../shared/grid/conformal-plane.ts";
import { wrapLongitude } from "./longitude.ts";

/** Projection parameters of a conformal grid, enough to move its corner from one grid point to another. */
export type ProjectedGridParams =
  | { kind: "lambert"; latin1: number; latin2: number; lonV: number; earthRadius: number }
  | { kind: "polar"; latTrue: number; lonV: number; southPole: boolean; earthRadius: number };

function planeFor(p: ProjectedGridParams): ConformalPlane {
  return p.kind === "lambert"
    ? lambertPlane(p.latin1, p.latin2, p.lonV, p.earthRadius)
    : polarStereographicPlane(p.latTrue, p.lonV, p.earthRadius, p.southPole);
}

/**
 * Latitude and longitude of the point `offsetX`, `offsetY` metres away from a known point on the projection
 * plane. Used only to find the south-west corner when a projected grid is not stored from there. It uses the
 * same spherical projections as shared/grid, so the corner and every later grid-point position agree.
 */
export function offsetGridPoint(
  params: ProjectedGridParams,
  lat: number,
  lon: number,
  offsetXMetres: number,
  offsetYMetres: number,
): { lat: number; lon: number } {
  const plane = planeFor(params);
  const start = planeForward(plane, lat, lon, { x: 0, y: 0 });
  const moved = planeInverse(plane, start.x + offsetXMetres, start.y + offsetYMetres, { lat: 0, lon: 0 });
  return { lat: moved.lat, lon: wrapLongitude(moved.lon) };
}
