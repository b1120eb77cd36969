/**
 * Interprets a raw NetCDF dataset under the CF conventions: finds the gridded variables, their
 * horizontal grid, vertical levels, valid and reference times, and unpacks every (time, level)
 * slice to SI values in Bellwether's canonical layout.
 */
import type { GridGeometry } from "../../../shared/grid/geometry-types.ts";
import { geometryKey } from "../../../shared/grid/geometry-key.ts";
import { NetcdfDecodeError } from "./errors.ts";
import { elementCount, textAttribute, type RawDataset, type RawVariable } from "./raw-dataset.ts";
import { auxiliaryCoordinateNames, axisRole, coordinateVariable, dataVariableNames, gridMappingName, isLatitude, isLongitude, type AxisRole } from "./cf-axes.ts";
import { horizontalGrid, type HorizontalGrid } from "./cf-geometry.ts";
import { referenceTimeOf, timesOf, verticalLevels } from "./cf-vertical-time.ts";
import { siConversion } from "./cf-units.ts";
import { valueTransform } from "./cf-packing.ts";
import { extractCanonicalSlice, rowMajorStrides, type SliceLayout } from "./canonical-layout.ts";
import type { NetcdfDataset, NetcdfVariable, SkippedVariable } from "./netcdf-types.ts";

// Standard names of wind components along the grid's own axes (CF standard name table).
const GRID_RELATIVE_WIND_NAMES = new Set(["x_wind", "y_wind", "grid_eastward_wind", "grid_northward_wind"]);

interface VariablePlan {
  xAxis: number;
  yAxis: number;
  timeAxis: number;
  levelAxis: number;
  levelCoordinate?: RawVariable;
  timeCoordinate?: RawVariable;
  referenceCoordinate?: RawVariable;
  latitude2d?: RawVariable;
  longitude2d?: RawVariable;
}

class SkipVariable extends Error {}

export function interpretCfDataset(dataset: RawDataset): NetcdfDataset {
  const grids = new Map<string, HorizontalGrid>();
  const fallbackRunTime = datasetReferenceTime(dataset);
  const variables: NetcdfVariable[] = [];
  const skipped: SkippedVariable[] = [];
  let firstUnplaced: NetcdfDecodeError | undefined;
  for (const name of dataVariableNames(dataset)) {
    const variable = dataset.variables.get(name)!;
    try {
      variables.push(decodeVariable(dataset, variable, grids, fallbackRunTime));
    } catch (error) {
      // A side variable with no horizontal coordinates (a station series, say) should not sink the
      // file; it only becomes an error when nothing in the file can be placed on a grid.
      const unplaced = error instanceof NetcdfDecodeError && error.code === "missing-coordinates";
      if (!(error instanceof SkipVariable) && !unplaced) throw error;
      if (unplaced) firstUnplaced ??= error;
      skipped.push({ name, reason: error.message });
    }
  }
  if (variables.length === 0 && firstUnplaced) throw firstUnplaced;
  shareGeometries(variables);
  return { format: dataset.format, globalAttributes: Object.fromEntries(dataset.attributes), variables, skipped };
}

/**
 * Variables on the same grid share one geometry object. A projected grid that carries
 * grid-relative wind components (x_wind, y_wind) gets uvRelativeToGrid = true, as a GRIB2 grid
 * definition would; frame assembly then rotates those winds to east/north.
 */
function shareGeometries(variables: NetcdfVariable[]): void {
  const shared = new Map<string, GridGeometry>();
  for (const variable of variables) {
    const key = geometryKey(variable.geometry);
    const gridRelative =
      variable.geometry.kind !== "latlon" && variable.standardName !== null && GRID_RELATIVE_WIND_NAMES.has(variable.standardName);
    const existing = shared.get(key);
    if (!existing) shared.set(key, { ...variable.geometry, uvRelativeToGrid: gridRelative });
    else if (gridRelative && !existing.uvRelativeToGrid) shared.set(key, { ...existing, uvRelativeToGrid: true });
  }
  for (const variable of variables) variable.geometry = shared.get(geometryKey(variable.geometry))!;
}

function decodeVariable(
  dataset: RawDataset,
  variable: RawVariable,
  grids: Map<string, HorizontalGrid>,
  fallbackRunTime: string | null,
): NetcdfVariable {
  const plan = planVariable(dataset, variable);
  const nx = variable.shape[plan.xAxis];
  const ny = variable.shape[plan.yAxis];
  const grid = gridFor(dataset, variable, plan, nx, ny, grids);
  const standardName = textAttribute(variable.attributes, "standard_name") ?? null;

  const vertical = verticalLevels(plan.levelCoordinate);
  if ("unsupported" in vertical) throw new SkipVariable(vertical.unsupported);
  const times = plan.timeCoordinate ? timesOf(plan.timeCoordinate) : [null];
  const runTime = plan.referenceCoordinate ? referenceTimeOf(plan.referenceCoordinate) : fallbackRunTime;

  const sourceUnits = textAttribute(variable.attributes, "units") ?? null;
  const conversion = siConversion(sourceUnits ?? undefined, standardName ?? undefined);
  const transform = valueTransform(variable, conversion);
  const raw = variable.readNumeric();
  if (raw.length !== elementCount(variable.shape)) {
    throw new NetcdfDecodeError("shape-mismatch", `holds ${raw.length} values but its shape (${variable.shape.join(" × ")}) needs ${elementCount(variable.shape)}`, variable.name);
  }
  const layout: SliceLayout = {
    strides: rowMajorStrides(variable.shape),
    xAxis: plan.xAxis,
    yAxis: plan.yAxis,
    timeAxis: plan.timeAxis,
    levelAxis: plan.levelAxis,
    nx,
    ny,
    flipX: grid.flipX,
    flipY: grid.flipY,
  };
  const timeCount = plan.timeAxis >= 0 ? variable.shape[plan.timeAxis] : 1;
  const levelCount = plan.levelAxis >= 0 ? variable.shape[plan.levelAxis] : 1;
  let missingCount = 0;
  const values: Float32Array[][] = [];
  for (let t = 0; t < timeCount; t++) {
    const row: Float32Array[] = [];
    for (let z = 0; z < levelCount; z++) {
      const slice = new Float32Array(nx * ny);
      missingCount += extractCanonicalSlice(raw, layout, t, z, transform, slice);
      row.push(slice);
    }
    values.push(row);
  }
  return {
    name: variable.name,
    standardName,
    longName: textAttribute(variable.attributes, "long_name") ?? null,
    units: conversion.unit,
    sourceUnits,
    dims: [...variable.dimensions],
    geometry: grid.geometry,
    levelType: vertical.levelType,
    levels: vertical.levels,
    times,
    runTime,
    values,
    missingCount,
  };
}

/** Assigns each dimension of the variable to x, y, time or level, and finds its scalar coordinates. */
function planVariable(dataset: RawDataset, variable: RawVariable): VariablePlan {
  const plan: VariablePlan = { xAxis: -1, yAxis: -1, timeAxis: -1, levelAxis: -1 };
  for (const name of auxiliaryCoordinateNames(variable)) {
    const auxiliary = dataset.variables.get(name);
    if (!auxiliary) throw new NetcdfDecodeError("missing-coordinates", `lists coordinate "${name}", which the file does not contain`, variable.name);
    addAuxiliaryCoordinate(plan, auxiliary);
  }
  const roles: AxisRole[] = variable.dimensions.map((dimension) => {
    const coordinate = coordinateVariable(dataset, dimension);
    return coordinate ? axisRole(coordinate) : "unknown";
  });
  plan.xAxis = roles.indexOf("x");
  plan.yAxis = roles.indexOf("y");
  if ((plan.xAxis < 0 || plan.yAxis < 0) && plan.latitude2d) {
    plan.yAxis = variable.dimensions.indexOf(plan.latitude2d.dimensions[0]);
    plan.xAxis = variable.dimensions.indexOf(plan.latitude2d.dimensions[1]);
  }
  if (plan.xAxis < 0 || plan.yAxis < 0) {
    throw new NetcdfDecodeError(
      "missing-coordinates",
      `cannot tell which of its dimensions (${variable.dimensions.join(", ")}) are x and y: no latitude/longitude or projection coordinate variables, and no 2-D latitude/longitude in its coordinates attribute`,
      variable.name,
    );
  }
  checkAuxiliaryShape(variable, plan);
  variable.dimensions.forEach((dimension, axis) => {
    if (axis === plan.xAxis || axis === plan.yAxis) return;
    assignOtherAxis(dataset, variable, plan, axis, roles[axis]);
  });
  return plan;
}

function addAuxiliaryCoordinate(plan: VariablePlan, auxiliary: RawVariable): void {
  if (auxiliary.dimensions.length === 2 && isLatitude(auxiliary)) {
    plan.latitude2d = auxiliary;
    return;
  }
  if (auxiliary.dimensions.length === 2 && isLongitude(auxiliary)) {
    plan.longitude2d = auxiliary;
    return;
  }
  // Scalar coordinates (or length-1 ones) give a single level, valid time or run time.
  if (elementCount(auxiliary.shape) !== 1) return;
  const role = axisRole(auxiliary);
  if (role === "z") plan.levelCoordinate = auxiliary;
  else if (role === "t") plan.timeCoordinate = auxiliary;
  else if (role === "reference-time") plan.referenceCoordinate = auxiliary;
}

function checkAuxiliaryShape(variable: RawVariable, plan: VariablePlan): void {
  const expected = [variable.dimensions[plan.yAxis], variable.dimensions[plan.xAxis]];
  for (const auxiliary of [plan.latitude2d, plan.longitude2d]) {
    if (!auxiliary) continue;
    if (auxiliary.dimensions[0] !== expected[0] || auxiliary.dimensions[1] !== expected[1]) {
      throw new NetcdfDecodeError(
        "shape-mismatch",
        `its 2-D coordinate "${auxiliary.name}" has dimensions (${auxiliary.dimensions.join(", ")}) [${auxiliary.shape.join(" × ")}], but the variable's y, x dimensions are (${expected.join(", ")}) [${variable.shape[plan.yAxis]} × ${variable.shape[plan.xAxis]}]`,
        variable.name,
      );
    }
  }
}

function assignOtherAxis(dataset: RawDataset, variable: RawVariable, plan: VariablePlan, axis: number, role: AxisRole): void {
  const dimension = variable.dimensions[axis];
  const size = variable.shape[axis];
  const coordinate = coordinateVariable(dataset, dimension);
  if (role === "t" && plan.timeAxis < 0) {
    plan.timeAxis = axis;
    plan.timeCoordinate = coordinate;
  } else if (role === "z" && plan.levelAxis < 0) {
    plan.levelAxis = axis;
    plan.levelCoordinate = coordinate;
  } else if (role === "reference-time" && size === 1) {
    plan.referenceCoordinate = coordinate;
  } else if (size !== 1) {
    throw new SkipVariable(`dimension "${dimension}" (size ${size}) is not a time or vertical coordinate Bellwether reads`);
  }
}

function gridFor(dataset: RawDataset, variable: RawVariable, plan: VariablePlan, nx: number, ny: number, grids: Map<string, HorizontalGrid>): HorizontalGrid {
  const xDimension = variable.dimensions[plan.xAxis];
  const yDimension = variable.dimensions[plan.yAxis];
  const mappingName = gridMappingName(variable);
  const key = [xDimension, yDimension, mappingName ?? "", plan.latitude2d?.name ?? "", plan.longitude2d?.name ?? ""].join("|");
  const cached = grids.get(key);
  if (cached) return cached;
  let gridMapping: RawVariable | undefined;
  if (mappingName !== undefined) {
    gridMapping = dataset.variables.get(mappingName);
    if (!gridMapping) {
      throw new NetcdfDecodeError("unknown-grid-mapping", `names grid_mapping "${mappingName}", which the file does not contain`, variable.name);
    }
  }
  const grid = horizontalGrid({
    variable: variable.name,
    nx,
    ny,
    xCoordinate: coordinateVariable(dataset, xDimension),
    yCoordinate: coordinateVariable(dataset, yDimension),
    latitude2d: plan.latitude2d,
    longitude2d: plan.longitude2d,
    gridMapping,
  });
  grids.set(key, grid);
  return grid;
}

/** The file's model run when variables do not name one: a single forecast reference time variable. */
function datasetReferenceTime(dataset: RawDataset): string | null {
  for (const variable of dataset.variables.values()) {
    if (elementCount(variable.shape) === 1 && axisRole(variable) === "reference-time") return referenceTimeOf(variable);
  }
  return null;
}
