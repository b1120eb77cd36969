import type {
  GridGeometry,
  LambertGeometry,
  LatLonGeometry,
  PolarStereographicGeometry,
} from "../../../shared/grid/geometry-types.ts";
import { isAllOnes, readSignedInt32, readUint16, readUint32 } from "./bytes.ts";
import { readEarthShape, type EarthShape } from "./earth-shape.ts";
import { Grib2DecodeError, type Grib2ErrorLocation } from "./errors.ts";
import { offsetGridPoint, type ProjectedGridParams } from "./grid-corner.ts";
import { wrapLongitude } from "./longitude.ts";
import { readScanMode, type ScanMode } from "./scan-mode.ts";
import type { SectionSpan } from "./sections.ts";

/** Section 3 decoded: the canonical geometry plus what is needed to reorder values into it. */
export interface GridDefinition {
  template: number;
  pointCount: number;
  scan: ScanMode;
  earth: EarthShape;
  /** Canonical geometry: (0, 0) is the south-west point, i eastward, j northward. */
  geometry: GridGeometry;
}

/** Octets of each supported template (WMO-No. 306, templates 3.0, 3.20 and 3.30). */
const TEMPLATE_LENGTH: Record<number, number> = { 0: 72, 20: 65, 30: 81 };
/** Flag Table 3.3, bit 5: u/v resolved relative to the grid's x/y directions. */
const UV_GRID_RELATIVE = 0x08;
/** Angles are stored in micro-degrees and lengths in millimetres; dividing keeps 38500000 -> 38.5 exact. */
const fromMicroDegrees = (value: number) => value / 1e6;
const fromMillimetres = (value: number) => value / 1e3;

export function readGridDefinition(bytes: Uint8Array, span: SectionSpan, messageNumber: number): GridDefinition {
  const o = span.offset;
  const where: Grib2ErrorLocation = { messageNumber, section: 3, byteOffset: o };
  if (bytes[o + 5] !== 0) {
    throw new Grib2DecodeError(where, `source of grid definition ${bytes[o + 5]} is not supported; only 0 (a template in section 3)`);
  }
  if (bytes[o + 10] !== 0) {
    throw new Grib2DecodeError(where, "quasi-regular grids (an optional list of row lengths) are not supported");
  }
  const template = readUint16(bytes, o + 12);
  const required = TEMPLATE_LENGTH[template];
  if (required === undefined) {
    throw new Grib2DecodeError(
      { ...where, byteOffset: o + 12 },
      `grid definition template 3.${template} is not supported (supported: 3.0 lat-lon, 3.20 polar stereographic, 3.30 Lambert conformal)`,
    );
  }
  if (span.length < required) {
    throw new Grib2DecodeError(where, `template 3.${template} needs ${required} octets but the section declares ${span.length}`);
  }
  const pointCount = readUint32(bytes, o + 6);
  const earth = readEarthShape(bytes, o, where);
  const parsed =
    template === 0 ? readLatLon(bytes, o, earth, where) : template === 30 ? readLambert(bytes, o, earth, where) : readPolar(bytes, o, earth, where);
  const { geometry } = parsed;
  if (geometry.nx * geometry.ny !== pointCount) {
    throw new Grib2DecodeError(where, `grid is ${geometry.nx} x ${geometry.ny} points but section 3 declares ${pointCount} data points`);
  }
  return { template, pointCount, scan: parsed.scan, earth, geometry };
}

interface ParsedGrid {
  scan: ScanMode;
  geometry: GridGeometry;
}

function readDimension(bytes: Uint8Array, at: number, label: string, where: Grib2ErrorLocation): number {
  const n = readUint32(bytes, at);
  if (n === 0 || isAllOnes(bytes, at, 4)) throw new Grib2DecodeError({ ...where, byteOffset: at }, `${label} is ${n === 0 ? "zero" : "missing"}`);
  return n;
}

/** Template 3.0 (regular latitude-longitude). */
function readLatLon(bytes: Uint8Array, o: number, earth: EarthShape, where: Grib2ErrorLocation): ParsedGrid {
  const nx = readDimension(bytes, o + 30, "Ni (points along a parallel)", where);
  const ny = readDimension(bytes, o + 34, "Nj (points along a meridian)", where);
  // Angles are in micro-degrees unless a basic angle and its subdivisions say otherwise (template 3.0 notes).
  const basicAngle = readUint32(bytes, o + 38);
  const subdivisions = readUint32(bytes, o + 42);
  const useBasic = basicAngle !== 0 && !isAllOnes(bytes, o + 38, 4) && subdivisions !== 0 && !isAllOnes(bytes, o + 42, 4);
  // Divide by the subdivisions per degree rather than multiply by their inverse, so values stay exact.
  const perDegree = useBasic ? subdivisions / basicAngle : 1e6;
  const la1 = readSignedInt32(bytes, o + 46);
  const lo1 = readSignedInt32(bytes, o + 50);
  const flags = bytes[o + 54];
  const la2 = readSignedInt32(bytes, o + 55);
  const lo2 = readSignedInt32(bytes, o + 59);
  const scan = readScanMode(bytes[o + 71], { ...where, byteOffset: o + 71 });
  const fullCircle = 360 * perDegree;

  // Increments may be omitted (flag bits 3 and 4 clear); then they follow from the first and last points.
  const hasDi = (flags & 0x20) !== 0 && !isAllOnes(bytes, o + 63, 4);
  const hasDj = (flags & 0x10) !== 0 && !isAllOnes(bytes, o + 67, 4);
  const lonSpan = (((scan.iNegative ? lo1 - lo2 : lo2 - lo1) % fullCircle) + fullCircle) % fullCircle;
  const di = hasDi ? readUint32(bytes, o + 63) : nx > 1 ? lonSpan / (nx - 1) : 0;
  const dj = hasDj ? readUint32(bytes, o + 67) : ny > 1 ? Math.abs(la2 - la1) / (ny - 1) : 0;

  const southLat = scan.jPositive ? la1 : la1 - (ny - 1) * dj;
  const westLon = scan.iNegative ? lo1 - (nx - 1) * di : lo1;
  const geometry: LatLonGeometry = {
    kind: "latlon",
    nx,
    ny,
    earthRadius: earth.sphereRadius,
    uvRelativeToGrid: (flags & UV_GRID_RELATIVE) !== 0,
    lat0: southLat / perDegree,
    lon0: wrapLongitude(westLon / perDegree),
    dlat: dj / perDegree,
    dlon: di / perDegree,
  };
  const northLat = geometry.lat0 + (ny - 1) * geometry.dlat;
  if (geometry.lat0 < -90 - 1e-6 || northLat > 90 + 1e-6) {
    throw new Grib2DecodeError(where, `latitudes run from ${geometry.lat0} by ${geometry.dlat} over ${ny} rows, beyond the poles`);
  }
  return { scan, geometry };
}

/** Template 3.30 (Lambert conformal). */
function readLambert(bytes: Uint8Array, o: number, earth: EarthShape, where: Grib2ErrorLocation): ParsedGrid {
  const nx = readDimension(bytes, o + 30, "Nx", where);
  const ny = readDimension(bytes, o + 34, "Ny", where);
  const lat1 = fromMicroDegrees(readSignedInt32(bytes, o + 38));
  const lon1 = fromMicroDegrees(readSignedInt32(bytes, o + 42));
  const flags = bytes[o + 46];
  const lonV = wrapLongitude(fromMicroDegrees(readSignedInt32(bytes, o + 51)));
  const dx = fromMillimetres(readUint32(bytes, o + 55));
  const dy = fromMillimetres(readUint32(bytes, o + 59));
  const centre = bytes[o + 63];
  const scan = readScanMode(bytes[o + 64], { ...where, byteOffset: o + 64 });
  const latin1 = fromMicroDegrees(readSignedInt32(bytes, o + 65));
  const latin2 = fromMicroDegrees(readSignedInt32(bytes, o + 69));
  if (centre & 0x40) throw new Grib2DecodeError(where, "bipolar Lambert projections (projection centre flag bit 2) are not supported");
  // LaD (octets 48-51, where Dx and Dy are given) is taken to be a standard parallel, as in the grids models
  // write, so Dx and Dy are used as lengths on the projection plane.
  const params: ProjectedGridParams = { kind: "lambert", latin1, latin2, lonV, earthRadius: earth.sphereRadius };
  const corner = southWestCorner(params, scan, lat1, lon1, nx, ny, dx, dy);
  const geometry: LambertGeometry = {
    kind: "lambert",
    nx,
    ny,
    earthRadius: earth.sphereRadius,
    uvRelativeToGrid: (flags & UV_GRID_RELATIVE) !== 0,
    lat0: corner.lat,
    lon0: corner.lon,
    dx,
    dy,
    lonV,
    latin1,
    latin2,
  };
  return { scan, geometry };
}

/** Template 3.20 (polar stereographic). */
function readPolar(bytes: Uint8Array, o: number, earth: EarthShape, where: Grib2ErrorLocation): ParsedGrid {
  const nx = readDimension(bytes, o + 30, "Nx", where);
  const ny = readDimension(bytes, o + 34, "Ny", where);
  const lat1 = fromMicroDegrees(readSignedInt32(bytes, o + 38));
  const lon1 = fromMicroDegrees(readSignedInt32(bytes, o + 42));
  const flags = bytes[o + 46];
  const latTrue = fromMicroDegrees(readSignedInt32(bytes, o + 47));
  const lonV = wrapLongitude(fromMicroDegrees(readSignedInt32(bytes, o + 51)));
  const dx = fromMillimetres(readUint32(bytes, o + 55));
  const dy = fromMillimetres(readUint32(bytes, o + 59));
  const centre = bytes[o + 63];
  const scan = readScanMode(bytes[o + 64], { ...where, byteOffset: o + 64 });
  if (centre & 0x40) throw new Grib2DecodeError(where, "bipolar projections (projection centre flag bit 2) are not supported");
  const southPole = (centre & 0x80) !== 0;
  const params: ProjectedGridParams = { kind: "polar", latTrue, lonV, southPole, earthRadius: earth.sphereRadius };
  const corner = southWestCorner(params, scan, lat1, lon1, nx, ny, dx, dy);
  const geometry: PolarStereographicGeometry = {
    kind: "polar",
    nx,
    ny,
    earthRadius: earth.sphereRadius,
    uvRelativeToGrid: (flags & UV_GRID_RELATIVE) !== 0,
    lat0: corner.lat,
    lon0: corner.lon,
    dx,
    dy,
    lonV,
    latTrue,
    southPole,
  };
  return { scan, geometry };
}

/** The first stored point is the south-west corner only for +i, +j scanning; otherwise step across the plane. */
function southWestCorner(
  params: ProjectedGridParams,
  scan: ScanMode,
  lat1: number,
  lon1: number,
  nx: number,
  ny: number,
  dx: number,
  dy: number,
): { lat: number; lon: number } {
  if (!scan.iNegative && scan.jPositive) return { lat: lat1, lon: wrapLongitude(lon1) };
  const offsetX = scan.iNegative ? -(nx - 1) * dx : 0;
  const offsetY = scan.jPositive ? 0 : -(ny - 1) * dy;
  return offsetGridPoint(params, lat1, lon1, offsetX, offsetY);
}
