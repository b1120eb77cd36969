import proj4 from "proj4";
import type { GridGeometry } from "../../../../shared/grid/geometry-types.ts";

/**
 * Fractional canonical grid coordinates (i eastward, j northward from the south-west point) of a latitude and
 * longitude, computed from a decoded geometry alone. For projected grids proj4 (a general-purpose projection
 * library) maps both the point and the corner onto the projection plane.
 */
export function gridPosition(geometry: GridGeometry, lat: number, lon: number): { i: number; j: number } {
  if (geometry.kind === "latlon") {
    const east = (((lon - geometry.lon0) % 360) + 360) % 360;
    // Points a hair west of lon0 wrap to just under 360; bring them back.
    const i = (east > 360 - 1e-6 ? east - 360 : east) / geometry.dlon;
    return { i, j: (lat - geometry.lat0) / geometry.dlat };
  }
  const plane =
    geometry.kind === "lambert"
      ? `+proj=lcc +lat_1=${geometry.latin1} +lat_2=${geometry.latin2} +lat_0=${geometry.latin1} +lon_0=${geometry.lonV} +R=${geometry.earthRadius} +units=m +no_defs`
      : `+proj=stere +lat_0=${geometry.southPole ? -90 : 90} +lat_ts=${geometry.latTrue} +lon_0=${geometry.lonV} +R=${geometry.earthRadius} +units=m +no_defs`;
  const converter = proj4(`+proj=longlat +R=${geometry.earthRadius} +no_defs`, plane);
  const [x0, y0] = converter.forward([geometry.lon0, geometry.lat0]);
  const [x, y] = converter.forward([lon, lat]);
  return { i: (x - x0) / geometry.dx, j: (y - y0) / geometry.dy };
}
