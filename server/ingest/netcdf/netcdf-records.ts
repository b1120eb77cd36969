/**
 * Flattens decoded NetCDF variables to one record per (variable, valid time, level), the same
 * shape of record a GRIB2 message gives, so frame assembly can treat both formats alike.
 */
import type { GridGeometry } from "../../../shared/grid/geometry-types.ts";
import type { NetcdfDataset, NetcdfLevelType } from "./netcdf-types.ts";

export interface NetcdfFieldRecord {
  /** CF standard_name when present, otherwise the variable name. */
  parameterKey: string;
  variableName: string;
  levelType: NetcdfLevelType;
  /** Pa (isobaric) or m above ground (heightAboveGround); null for surface fields. */
  level: number | null;
  unit: string;
  refTime: string | null;
  validTime: string | null;
  geometry: GridGeometry;
  /** Canonical layout; shared with the dataset, not copied. */
  values: Float32Array;
}

export function netcdfToRecords(dataset: NetcdfDataset): NetcdfFieldRecord[] {
  const records: NetcdfFieldRecord[] = [];
  for (const variable of dataset.variables) {
    variable.values.forEach((row, timeIndex) => {
      row.forEach((values, levelIndex) => {
        records.push({
          parameterKey: variable.standardName ?? variable.name,
          variableName: variable.name,
          levelType: variable.levelType,
          level: variable.levels === null ? null : variable.levels[levelIndex],
          unit: variable.units,
          refTime: variable.runTime,
          validTime: variable.times[timeIndex],
          geometry: variable.geometry,
          values,
        });
      });
    });
  }
  return records;
}
