import proj4 from "proj4";
import { wrapLongitude } from "./longitude.ts";

/** Projection parameters of a conformal grid, enough to move its corner from one grid point to another. */
export type ProjectedGridParams =
  | { kind: "lambert"; latin1: number; latin2: number; latD: number; lonV: number; earthRadius: number }
  | { kind: "polar"; latTrue: number; lonV: number; southPole: boolean; earthRadius: number };

function projectionDefinition(p: ProjectedGridParams): string {
  // Spherical forms of Snyder (1987): Lambert conformal conic (eqs. 15-1 to 15-4) and polar stereographic (21-1 on).
  if (p.kind === "lambert") {
    return `+proj=lcc +lat_1=${p.latin1} +lat_2=${p.latin2} +lat_0=${p.latD} +lon_0=${p.lonV} +R=${p.earthRadius} +units=m +no_defs`;
  }
  const pole = p.southPole ? -90 : 90;
  return `+proj=stere +lat_0=${pole} +lat_ts=${p.latTrue} +lon_0=${p.lonV} +R=${p.earthRadius} +units=m +no_defs`;
}

/**
 * Latitude and longitude of the grid point `stepsX` columns and `stepsY` rows away from a known point, on the
 * projection plane. Used only to find the south-west corner when a projected grid is not scanned from there.
 */
export function offsetGridPoint(
  params: ProjectedGridParams,
  lat: number,
  lon: number,
  offsetXMetres: number,
  offsetYMetres: number,
): { lat: number; lon: number } {
  // Same sphere on both sides, so proj4 applies no datum shift.
  const geographic = `+proj=longlat +R=${params.earthRadius} +no_defs`;
  const converter = proj4(geographic, projectionDefinition(params));
  const [x, y] = converter.forward([lon, lat]);
  const [lonOut, latOut] = converter.inverse([x + offsetXMetres, y + offsetYMetres]);
  return { lat: latOut, lon: wrapLongitude(lonOut) };
}
