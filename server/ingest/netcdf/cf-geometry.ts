/**
 * Builds Bellwether's GridGeometry from CF coordinates and grid_mapping attributes (CF
 * conventions, section 5.6 and appendix F) and says which horizontal axes must be reversed to
 * reach the canonical layout (i eastward, j northward, (0, 0) south-west).
 */
import type { GridGeometry, LambertGeometry, LatLonGeometry, PolarStereographicGeometry } from "../../../shared/grid/geometry-types.ts";
import { lambertPlane, planeInverse, polarStereographicPlane, type ConformalPlane } from "../../../shared/grid/conformal-plane.ts";
import { DEFAULT_EARTH_RADIUS_M, wrapLongitudeDegrees } from "../../../shared/grid/earth-constants.ts";
import { projectionForGeometry } from "../../../shared/grid/projection.ts";
import { NetcdfDecodeError } from "./errors.ts";
import { numberAttribute, numbersAttribute, textAttribute, type RawVariable } from "./raw-dataset.ts";
import { isLatitude, isLongitude } from "./cf-axes.ts";
import { normaliseUnit } from "./cf-units.ts";

export interface HorizontalGrid {
  geometry: GridGeometry;
  /** Reverse the file's x (or y) order to reach the canonical layout. */
  flipX: boolean;
  flipY: boolean;
}

export interface HorizontalInputs {
  /** The data variable asking, for error messages. */
  variable: string;
  nx: number;
  ny: number;
  /** 1-D coordinate variables of the x and y dimensions, when the file has them. */
  xCoordinate?: RawVariable;
  yCoordinate?: RawVariable;
  /** 2-D latitude/longitude (dimensions y, x) named in the `coordinates` attribute, when present. */
  latitude2d?: RawVariable;
  longitude2d?: RawVariable;
  gridMapping?: RawVariable;
}

// Relative tolerance on uneven spacing: float32 coordinates carry about 1e-7 relative error of
// their magnitude, so 1e-3 of a step leaves room for that while catching genuinely uneven axes.
const SPACING_TOLERANCE = 1e-3;
// The 2-D latitude/longitude a file carries must land within this fraction of a grid length.
const GEOMETRY_TOLERANCE_GRID_LENGTHS = 0.1;

export function horizontalGrid(inputs: HorizontalInputs): HorizontalGrid {
  const mappingName = inputs.gridMapping ? textAttribute(inputs.gridMapping.attributes, "grid_mapping_name") : "latitude_longitude";
  let grid: HorizontalGrid;
  switch (mappingName) {
    case "latitude_longitude":
      grid = latLonGrid(inputs);
      break;
    case "lambert_conformal_conic":
      grid = projectedGrid(inputs, lambertFromMapping(inputs));
      break;
    case "polar_stereographic":
      grid = projectedGrid(inputs, polarFromMapping(inputs));
      break;
    default:
      throw new NetcdfDecodeError(
        "unknown-grid-mapping",
        `grid_mapping "${inputs.gridMapping?.name}" has grid_mapping_name "${mappingName ?? "(none)"}"; supported: latitude_longitude, lambert_conformal_conic, polar_stereographic`,
        inputs.variable,
      );
  }
  checkAgainst2dCoordinates(inputs, grid);
  return grid;
}

interface RegularAxis {
  first: number;
  step: number;
}

function regularAxis(values: ArrayLike<number>, what: string, variable: string): RegularAxis {
  if (values.length < 2) {
    throw new NetcdfDecodeError("irregular-grid", `${what} has ${values.length} point(s); a grid needs at least 2 to fix its spacing`, variable);
  }
  const step = (values[values.length - 1] - values[0]) / (values.length - 1);
  if (!(Math.abs(step) > 0)) throw new NetcdfDecodeError("irregular-grid", `${what} does not change from point to point`, variable);
  for (let k = 1; k < values.length; k++) {
    const gap = values[k] - values[k - 1];
    if (Math.abs(gap - step) > SPACING_TOLERANCE * Math.abs(step)) {
      throw new NetcdfDecodeError(
        "irregular-grid",
        `${what} is not evenly spaced: step ${gap} between points ${k - 1} and ${k}, expected ${step}`,
        variable,
      );
    }
  }
  return { first: values[0], step };
}

/** Longitudes made continuous (no 360° jumps) so spacing can be checked across 0° or 180°. */
function unwrapLongitudes(values: ArrayLike<number>): Float64Array {
  const out = Float64Array.from(values);
  for (let k = 1; k < out.length; k++) out[k] = out[k - 1] + wrapLongitudeDegrees(out[k] - out[k - 1]);
  return out;
}

function earthRadius(inputs: HorizontalInputs, projected: boolean): number {
  const mapping = inputs.gridMapping;
  if (!mapping) return DEFAULT_EARTH_RADIUS_M;
  const radius = numberAttribute(mapping.attributes, "earth_radius");
  if (radius !== undefined) return radius;
  const semiMajor = numberAttribute(mapping.attributes, "semi_major_axis");
  if (semiMajor === undefined) return DEFAULT_EARTH_RADIUS_M;
  const semiMinor = numberAttribute(mapping.attributes, "semi_minor_axis");
  const inverseFlattening = numberAttribute(mapping.attributes, "inverse_flattening");
  const spherical = (semiMinor === undefined || semiMinor === semiMajor) && (inverseFlattening === undefined || inverseFlattening === 0);
  if (!spherical && projected) {
    throw new NetcdfDecodeError(
      "bad-attribute",
      `grid mapping "${mapping.name}" describes an ellipsoid (semi_major_axis ${semiMajor}, semi_minor_axis ${semiMinor ?? "-"}, inverse_flattening ${inverseFlattening ?? "-"}); only spherical projections are supported`,
      inputs.variable,
    );
  }
  // On a latitude–longitude grid the radius only sets metre lengths, so the semi-major axis will do.
  return semiMajor;
}

function latLonGrid(inputs: HorizontalInputs): HorizontalGrid {
  let latitudes: Float64Array;
  let longitudes: Float64Array;
  if (inputs.xCoordinate && inputs.yCoordinate && isLongitude(inputs.xCoordinate) && isLatitude(inputs.yCoordinate)) {
    longitudes = Float64Array.from(inputs.xCoordinate.readNumeric());
    latitudes = Float64Array.from(inputs.yCoordinate.readNumeric());
  } else if (inputs.latitude2d && inputs.longitude2d) {
    ({ latitudes, longitudes } = separable2dCoordinates(inputs));
  } else {
    throw new NetcdfDecodeError(
      "missing-coordinates",
      "has no latitude/longitude coordinate variables and no grid_mapping to place its x/y dimensions",
      inputs.variable,
    );
  }
  const lon = regularAxis(unwrapLongitudes(longitudes), "longitude", inputs.variable);
  const lat = regularAxis(latitudes, "latitude", inputs.variable);
  const flipX = lon.step < 0;
  const flipY = lat.step < 0;
  const geometry: LatLonGeometry = {
    kind: "latlon",
    nx: inputs.nx,
    ny: inputs.ny,
    earthRadius: earthRadius(inputs, false),
    uvRelativeToGrid: false,
    lat0: flipY ? lat.first + lat.step * (inputs.ny - 1) : lat.first,
    lon0: wrapLongitudeDegrees(flipX ? lon.first + lon.step * (inputs.nx - 1) : lon.first),
    dlat: Math.abs(lat.step),
    dlon: Math.abs(lon.step),
  };
  return { geometry, flipX, flipY };
}

/** A 2-D lat/lon pair without a grid mapping is usable only when it is a plain lat–lon grid. */
function separable2dCoordinates(inputs: HorizontalInputs): { latitudes: Float64Array; longitudes: Float64Array } {
  const lat = inputs.latitude2d!.readNumeric();
  const lon = inputs.longitude2d!.readNumeric();
  const { nx, ny } = inputs;
  const latitudes = new Float64Array(ny);
  const longitudes = new Float64Array(nx);
  for (let j = 0; j < ny; j++) latitudes[j] = lat[j * nx];
  for (let i = 0; i < nx; i++) longitudes[i] = lon[i];
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const latOff = Math.abs(lat[j * nx + i] - latitudes[j]);
      const lonOff = Math.abs(wrapLongitudeDegrees(lon[j * nx + i] - longitudes[i]));
      if (latOff > 1e-4 || lonOff > 1e-4) {
        throw new NetcdfDecodeError(
          "missing-coordinates",
          "has 2-D latitude/longitude that do not form a regular latitude–longitude grid, and no grid_mapping to say which projection they come from",
          inputs.variable,
        );
      }
    }
  }
  return { latitudes, longitudes };
}

interface ProjectedMapping {
  plane: ConformalPlane;
  /** Plane coordinates relative to the cone apex = CF x/y (m) minus these offsets. */
  xOffset: number;
  yOffset: number;
  build(base: { nx: number; ny: number; earthRadius: number; lat0: number; lon0: number; dx: number; dy: number }): LambertGeometry | PolarStereographicGeometry;
}

function requiredNumber(inputs: HorizontalInputs, name: string): number {
  const value = numberAttribute(inputs.gridMapping!.attributes, name);
  if (value === undefined || !Number.isFinite(value)) {
    throw new NetcdfDecodeError("bad-attribute", `grid mapping "${inputs.gridMapping!.name}" lacks the numeric attribute ${name}`, inputs.variable);
  }
  return value;
}

function optionalNumber(inputs: HorizontalInputs, name: string, fallback: number): number {
  return numberAttribute(inputs.gridMapping!.attributes, name) ?? fallback;
}

/** CF lambert_conformal_conic: x = FE + ρ sin θ, y = FN + ρ0 − ρ cos θ (Snyder 1987, eqs. 14-1, 14-2). */
function lambertFromMapping(inputs: HorizontalInputs): ProjectedMapping {
  const parallels = numbersAttribute(inputs.gridMapping!.attributes, "standard_parallel");
  if (!parallels || parallels.length < 1 || parallels.length > 2) {
    throw new NetcdfDecodeError("bad-attribute", `grid mapping "${inputs.gridMapping!.name}" needs standard_parallel with one or two values`, inputs.variable);
  }
  const latin1 = parallels[0];
  const latin2 = parallels[parallels.length - 1];
  const lonV = wrapLongitudeDegrees(requiredNumber(inputs, "longitude_of_central_meridian"));
  const originLat = requiredNumber(inputs, "latitude_of_projection_origin");
  const radius = earthRadius(inputs, true);
  const plane = lambertPlane(latin1, latin2, lonV, radius);
  return {
    plane,
    xOffset: optionalNumber(inputs, "false_easting", 0),
    yOffset: optionalNumber(inputs, "false_northing", 0) + plane.rhoAtLatitude((originLat * Math.PI) / 180),
    build: (base) => ({ kind: "lambert", uvRelativeToGrid: false, ...base, lonV, latin1, latin2 }),
  };
}

/** CF polar_stereographic: pole at the plane origin, true scale from standard_parallel or k0 (Snyder 1987, ch. 21). */
function polarFromMapping(inputs: HorizontalInputs): ProjectedMapping {
  const originLat = requiredNumber(inputs, "latitude_of_projection_origin");
  if (Math.abs(Math.abs(originLat) - 90) > 1e-9) {
    throw new NetcdfDecodeError("bad-attribute", `polar_stereographic needs latitude_of_projection_origin ±90, got ${originLat}`, inputs.variable);
  }
  const southPole = originLat < 0;
  const lonV = wrapLongitudeDegrees(requiredNumber(inputs, "straight_vertical_longitude_from_pole"));
  const standardParallel = numberAttribute(inputs.gridMapping!.attributes, "standard_parallel");
  const k0 = numberAttribute(inputs.gridMapping!.attributes, "scale_factor_at_projection_origin");
  // k0 = (1 + sin|φc|)/2 on the sphere, so a scale factor maps back to the true-scale latitude.
  const latTrueMagnitude =
    standardParallel !== undefined ? Math.abs(standardParallel) : k0 !== undefined ? (Math.asin(Math.min(1, 2 * k0 - 1)) * 180) / Math.PI : 90;
  const latTrue = southPole ? -latTrueMagnitude : latTrueMagnitude;
  const radius = earthRadius(inputs, true);
  return {
    plane: polarStereographicPlane(latTrue, lonV, radius, southPole),
    xOffset: optionalNumber(inputs, "false_easting", 0),
    yOffset: optionalNumber(inputs, "false_northing", 0),
    build: (base) => ({ kind: "polar", uvRelativeToGrid: false, ...base, lonV, latTrue, southPole }),
  };
}

function metresPerUnit(coordinate: RawVariable, variable: string): number {
  const units = normaliseUnit(textAttribute(coordinate.attributes, "units") ?? "");
  if (units === "m" || units === "meter" || units === "meters" || units === "metre" || units === "metres") return 1;
  if (units === "km" || units === "kilometer" || units === "kilometers" || units === "kilometre" || units === "kilometres") return 1000;
  throw new NetcdfDecodeError(
    "bad-attribute",
    `projection coordinate "${coordinate.name}" has units "${textAttribute(coordinate.attributes, "units") ?? ""}"; expected m or km`,
    variable,
  );
}

function projectedGrid(inputs: HorizontalInputs, mapping: ProjectedMapping): HorizontalGrid {
  if (!inputs.xCoordinate || !inputs.yCoordinate) {
    throw new NetcdfDecodeError(
      "missing-coordinates",
      `uses grid mapping "${inputs.gridMapping!.name}" but its x/y dimensions have no projection_x_coordinate/projection_y_coordinate variables`,
      inputs.variable,
    );
  }
  const xScale = metresPerUnit(inputs.xCoordinate, inputs.variable);
  const yScale = metresPerUnit(inputs.yCoordinate, inputs.variable);
  const x = regularAxis(inputs.xCoordinate.readNumeric(), `x coordinate "${inputs.xCoordinate.name}"`, inputs.variable);
  const y = regularAxis(inputs.yCoordinate.readNumeric(), `y coordinate "${inputs.yCoordinate.name}"`, inputs.variable);
  const flipX = x.step < 0;
  const flipY = y.step < 0;
  const westX = (flipX ? x.first + x.step * (inputs.nx - 1) : x.first) * xScale;
  const southY = (flipY ? y.first + y.step * (inputs.ny - 1) : y.first) * yScale;
  const corner = planeInverse(mapping.plane, westX - mapping.xOffset, southY - mapping.yOffset, { lat: 0, lon: 0 });
  const geometry = mapping.build({
    nx: inputs.nx,
    ny: inputs.ny,
    earthRadius: mapping.plane.radius,
    lat0: corner.lat,
    lon0: corner.lon,
    dx: Math.abs(x.step) * xScale,
    dy: Math.abs(y.step) * yScale,
  });
  return { geometry, flipX, flipY };
}

/**
 * When the file also carries 2-D latitude/longitude, the geometry must reproduce them: a wrong
 * origin, radius or false easting would otherwise shift every diagnostic silently.
 */
function checkAgainst2dCoordinates(inputs: HorizontalInputs, grid: HorizontalGrid): void {
  if (!inputs.latitude2d || !inputs.longitude2d || grid.geometry.kind === "latlon") return;
  const lat = inputs.latitude2d.readNumeric();
  const lon = inputs.longitude2d.readNumeric();
  const { nx, ny } = inputs;
  const projection = projectionForGeometry(grid.geometry);
  const at = { i: 0, j: 0 };
  const samples: Array<[number, number]> = [
    [0, 0],
    [nx - 1, 0],
    [0, ny - 1],
    [nx - 1, ny - 1],
    [nx >> 1, ny >> 1],
  ];
  for (const [fileI, fileJ] of samples) {
    projection.latLonToGrid(lat[fileJ * nx + fileI], lon[fileJ * nx + fileI], at);
    const expectedI = grid.flipX ? nx - 1 - fileI : fileI;
    const expectedJ = grid.flipY ? ny - 1 - fileJ : fileJ;
    const miss = Math.hypot(at.i - expectedI, at.j - expectedJ);
    if (!(miss <= GEOMETRY_TOLERANCE_GRID_LENGTHS)) {
      throw new NetcdfDecodeError(
        "geometry-mismatch",
        `grid mapping "${inputs.gridMapping?.name}" and x/y put file point (${fileI}, ${fileJ}) ${miss.toFixed(2)} grid lengths away from its latitude/longitude (${lat[fileJ * nx + fileI]}, ${lon[fileJ * nx + fileI]})`,
        inputs.variable,
      );
    }
  }
}
