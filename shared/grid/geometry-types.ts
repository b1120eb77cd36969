/**
 * Grid geometry shared by decoders, diagnostics and the map.
 *
 * Every decoder normalises values to one canonical layout so nothing downstream needs to know
 * about GRIB scanning modes or NetCDF dimension order:
 *   index = j * nx + i, with i increasing eastward (projection x increasing) and
 *   j increasing northward (projection y increasing); (i, j) = (0, 0) is the south-west corner.
 */
export interface GridGeometryBase {
  nx: number;
  ny: number;
  /** Sphere radius in metres used for projection maths (WMO GRIB2 Code Table 3.2). */
  earthRadius: number;
  /** True when u/v components are relative to the grid's x/y axes rather than east/north. */
  uvRelativeToGrid: boolean;
}

export interface LatLonGeometry extends GridGeometryBase {
  kind: "latlon";
  /** Latitude and longitude (degrees) of point (0, 0). */
  lat0: number;
  lon0: number;
  /** Positive increments in degrees. */
  dlat: number;
  dlon: number;
}

export interface LambertGeometry extends GridGeometryBase {
  kind: "lambert";
  lat0: number;
  lon0: number;
  /** Grid lengths in metres, true at the standard parallel(s). */
  dx: number;
  dy: number;
  /** Central meridian (LoV) and standard parallels, degrees. */
  lonV: number;
  latin1: number;
  latin2: number;
}

export interface PolarStereographicGeometry extends GridGeometryBase {
  kind: "polar";
  lat0: number;
  lon0: number;
  dx: number;
  dy: number;
  /** Orientation meridian (LoV) and the latitude where dx, dy are true (LaD), degrees. */
  lonV: number;
  latTrue: number;
  southPole: boolean;
}

export type GridGeometry = LatLonGeometry | LambertGeometry | PolarStereographicGeometry;
