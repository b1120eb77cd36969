/**
 * Forward and inverse mapping between latitude/longitude (degrees) and fractional grid
 * indices (i eastward, j northward, (0, 0) at the south-west corner) for every geometry kind.
 * Outputs are written into caller-owned objects so loops over millions of points allocate nothing.
 */
import type { GridGeometry, LambertGeometry, LatLonGeometry, PolarStereographicGeometry } from "./geometry-types.ts";
import {
  lambertPlane,
  planeForward,
  planeInverse,
  polarStereographicPlane,
  type ConformalPlane,
  type GeoPoint,
  type PlanePoint,
} from "./conformal-plane.ts";
import { wrapLongitudeDegrees } from "./earth-constants.ts";

export type { GeoPoint, PlanePoint } from "./conformal-plane.ts";

/** Mutable output for fractional grid indices. */
export interface GridPoint {
  i: number;
  j: number;
}

export interface GridProjection {
  readonly geometry: GridGeometry;
  /** The conformal plane behind a projected grid; null for latitude–longitude grids. */
  readonly plane: ConformalPlane | null;
  /** Latitude/longitude (degrees) → fractional (i, j). Points off the grid give indices outside [0, n-1]. */
  latLonToGrid(latDeg: number, lonDeg: number, out: GridPoint): GridPoint;
  /** Fractional (i, j) → latitude/longitude (degrees, longitude in (−180, 180]). */
  gridToLatLon(i: number, j: number, out: GeoPoint): GeoPoint;
}

/** Builds the projection for a geometry; cheap, but callers in loops should build it once. */
export function projectionForGeometry(geometry: GridGeometry): GridProjection {
  switch (geometry.kind) {
    case "latlon":
      return latLonProjection(geometry);
    case "lambert":
      return planeProjection(geometry, lambertPlaneFor(geometry));
    case "polar":
      return planeProjection(geometry, polarPlaneFor(geometry));
  }
}

export function lambertPlaneFor(geometry: LambertGeometry): ConformalPlane {
  return lambertPlane(geometry.latin1, geometry.latin2, geometry.lonV, geometry.earthRadius);
}

export function polarPlaneFor(geometry: PolarStereographicGeometry): ConformalPlane {
  return polarStereographicPlane(geometry.latTrue, geometry.lonV, geometry.earthRadius, geometry.southPole);
}

function planeProjection(geometry: LambertGeometry | PolarStereographicGeometry, plane: ConformalPlane): GridProjection {
  // The grid's first point fixes the offset between plane coordinates and indices.
  const origin = planeForward(plane, geometry.lat0, geometry.lon0, { x: 0, y: 0 });
  const x0 = origin.x;
  const y0 = origin.y;
  const { dx, dy } = geometry;
  const scratch: PlanePoint = { x: 0, y: 0 };
  return {
    geometry,
    plane,
    latLonToGrid(latDeg, lonDeg, out) {
      planeForward(plane, latDeg, lonDeg, scratch);
      out.i = (scratch.x - x0) / dx;
      out.j = (scratch.y - y0) / dy;
      return out;
    },
    gridToLatLon(i, j, out) {
      return planeInverse(plane, x0 + i * dx, y0 + j * dy, out);
    },
  };
}

function latLonProjection(geometry: LatLonGeometry): GridProjection {
  const { lat0, lon0, dlat, dlon, nx } = geometry;
  // Longitudes are unwrapped around the grid's middle meridian, so a point just west of a
  // regional grid gets a small negative i rather than one near 360/dlon.
  const halfSpan = ((nx - 1) * dlon) / 2;
  const middleLon = lon0 + halfSpan;
  return {
    geometry,
    plane: null,
    latLonToGrid(latDeg, lonDeg, out) {
      out.i = (wrapLongitudeDegrees(lonDeg - middleLon) + halfSpan) / dlon;
      out.j = (latDeg - lat0) / dlat;
      return out;
    },
    gridToLatLon(i, j, out) {
      out.lat = lat0 + j * dlat;
      out.lon = wrapLongitudeDegrees(lon0 + i * dlon);
      return out;
    },
  };
}
