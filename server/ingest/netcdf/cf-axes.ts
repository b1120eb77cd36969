/**
 * Recognises what a coordinate variable measures (CF conventions, section 4: axis attribute,
 * standard_name, units, `positive`), and which variables of a file are coordinates or
 * metadata rather than data.
 */
import { textAttribute, type RawDataset, type RawVariable } from "./raw-dataset.ts";
import { isPressureUnit, normaliseUnit } from "./cf-units.ts";

export type AxisRole = "x" | "y" | "z" | "t" | "reference-time" | "unknown";

const LONGITUDE_UNITS = new Set(["degrees_east", "degree_east", "degree_e", "degrees_e", "degreee", "degreese"]);
const LATITUDE_UNITS = new Set(["degrees_north", "degree_north", "degree_n", "degrees_n", "degreen", "degreesn"]);

const X_STANDARD_NAMES = new Set(["longitude", "projection_x_coordinate", "grid_longitude"]);
const Y_STANDARD_NAMES = new Set(["latitude", "projection_y_coordinate", "grid_latitude"]);
const Z_STANDARD_NAMES = new Set(["air_pressure", "height", "altitude", "depth", "model_level_number", "geopotential_height"]);
const REFERENCE_TIME_NAMES = new Set(["reference_time", "forecast_reference_time", "reftime"]);

export function isLongitude(variable: RawVariable): boolean {
  const units = textAttribute(variable.attributes, "units");
  return textAttribute(variable.attributes, "standard_name") === "longitude" || (units !== undefined && LONGITUDE_UNITS.has(normaliseUnit(units)));
}

export function isLatitude(variable: RawVariable): boolean {
  const units = textAttribute(variable.attributes, "units");
  return textAttribute(variable.attributes, "standard_name") === "latitude" || (units !== undefined && LATITUDE_UNITS.has(normaliseUnit(units)));
}

/** What a (1-D or scalar) coordinate variable measures. */
export function axisRole(variable: RawVariable): AxisRole {
  const standardName = textAttribute(variable.attributes, "standard_name");
  if (standardName === "forecast_reference_time" || (standardName === undefined && REFERENCE_TIME_NAMES.has(variable.name))) {
    return "reference-time";
  }
  const axis = textAttribute(variable.attributes, "axis")?.trim().toUpperCase();
  if (axis === "X" || axis === "Y" || axis === "Z" || axis === "T") return axis.toLowerCase() as AxisRole;
  if (standardName !== undefined) {
    if (X_STANDARD_NAMES.has(standardName)) return "x";
    if (Y_STANDARD_NAMES.has(standardName)) return "y";
    if (standardName === "time") return "t";
    if (Z_STANDARD_NAMES.has(standardName) || standardName.startsWith("atmosphere_")) return "z";
  }
  if (isLongitude(variable)) return "x";
  if (isLatitude(variable)) return "y";
  const units = textAttribute(variable.attributes, "units");
  if (units !== undefined && /\bsince\b/i.test(units)) return "t";
  if (isPressureUnit(units) || textAttribute(variable.attributes, "positive") !== undefined) return "z";
  return "unknown";
}

/** The coordinate variable of a dimension (1-D, same name), if the file has one. */
export function coordinateVariable(dataset: RawDataset, dimension: string): RawVariable | undefined {
  const variable = dataset.variables.get(dimension);
  return variable && variable.dimensions.length === 1 && variable.dimensions[0] === dimension ? variable : undefined;
}

/** Names listed in a variable's `coordinates` attribute. */
export function auxiliaryCoordinateNames(variable: RawVariable): string[] {
  return (textAttribute(variable.attributes, "coordinates") ?? "").split(/\s+/).filter((name) => name.length > 0);
}

/** The grid mapping variable's name, from either `grid_mapping: "crs"` or the extended `"crs: x y"` form. */
export function gridMappingName(variable: RawVariable): string | undefined {
  const value = textAttribute(variable.attributes, "grid_mapping")?.trim();
  if (!value) return undefined;
  return value.split(":")[0].trim();
}

/**
 * Variables that hold gridded data: at least two dimensions, numeric, and neither a coordinate
 * variable nor something another variable points to (coordinates, bounds, grid mapping, ...).
 */
export function dataVariableNames(dataset: RawDataset): string[] {
  const referenced = new Set<string>();
  for (const variable of dataset.variables.values()) {
    for (const name of auxiliaryCoordinateNames(variable)) referenced.add(name);
    const mapping = gridMappingName(variable);
    if (mapping) referenced.add(mapping);
    for (const attribute of ["bounds", "climatology", "ancillary_variables"]) {
      for (const name of (textAttribute(variable.attributes, attribute) ?? "").split(/\s+/)) if (name) referenced.add(name);
    }
  }
  const names: string[] = [];
  for (const variable of dataset.variables.values()) {
    if (variable.dimensions.length < 2) continue;
    if (referenced.has(variable.name)) continue;
    if (variable.dataType === "char" || variable.dataType === "string" || variable.dataType === "other") continue;
    if (coordinateVariable(dataset, variable.name)) continue;
    names.push(variable.name);
  }
  return names;
}
