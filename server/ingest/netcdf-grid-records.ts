import { STANDARD_GRAVITY } from "../../shared/meteo/constants.ts";
import type { GridRecord, LevelKind, ModelParameter } from "./grid-record.ts";
import { NetcdfDecodeError, type NetcdfDataset, type NetcdfVariable } from "./netcdf/index.ts";

/**
 * CF standard names (CF standard name table) → the quantity frame assembly knows, with the SI
 * unit the decoder must have produced for the mapping to hold.
 */
const PARAMETERS: Record<string, { parameter: ModelParameter; unit: string }> = {
  air_temperature: { parameter: "temperature", unit: "K" },
  dew_point_temperature: { parameter: "dewpoint", unit: "K" },
  relative_humidity: { parameter: "relative_humidity", unit: "%" },
  specific_humidity: { parameter: "specific_humidity", unit: "kg kg-1" },
  eastward_wind: { parameter: "u_wind", unit: "m s-1" },
  northward_wind: { parameter: "v_wind", unit: "m s-1" },
  x_wind: { parameter: "u_wind", unit: "m s-1" },
  y_wind: { parameter: "v_wind", unit: "m s-1" },
  grid_eastward_wind: { parameter: "u_wind", unit: "m s-1" },
  grid_northward_wind: { parameter: "v_wind", unit: "m s-1" },
  geopotential_height: { parameter: "geopotential_height", unit: "m" },
  geopotential: { parameter: "geopotential_height", unit: "m2 s-2" },
  surface_altitude: { parameter: "surface_height", unit: "m" },
  surface_air_pressure: { parameter: "pressure", unit: "Pa" },
};

const LEVEL_KINDS: Record<NetcdfVariable["levelType"], LevelKind> = {
  isobaric: "isobaric",
  surface: "surface",
  heightAboveGround: "height_above_ground",
};

function parameterOf(variable: NetcdfVariable): ModelParameter | null {
  const known = variable.standardName ? PARAMETERS[variable.standardName] : undefined;
  // Specific humidity is dimensionless in CF ("1"), which is the same as kg kg-1.
  const unitMatches = known && (variable.units === known.unit || (known.parameter === "specific_humidity" && variable.units === "1"));
  if (!known || !unitMatches) return null;
  if (known.parameter === "geopotential_height" && variable.levelType === "surface") return "surface_height";
  return known.parameter;
}

/** SI conversions frame assembly expects: RH as a fraction, geopotential as height. */
function frameValues(values: Float32Array, variable: NetcdfVariable): Float32Array {
  const scale = variable.standardName === "relative_humidity" ? 0.01 : variable.standardName === "geopotential" ? 1 / STANDARD_GRAVITY : 1;
  if (scale === 1) return values;
  const out = new Float32Array(values.length);
  for (let i = 0; i < out.length; i++) out[i] = values[i] * scale;
  return out;
}

function modelOf(dataset: NetcdfDataset): string {
  for (const key of ["source", "institution", "title"]) {
    const value = dataset.globalAttributes[key];
    if (typeof value === "string" && value.trim() !== "") return value.trim();
  }
  return "unnamed NetCDF model";
}

/**
 * The run a file belongs to. A file without a forecast reference time is taken as an analysis:
 * its run time is its earliest valid time.
 */
function fallbackRunTime(dataset: NetcdfDataset): string {
  const times = dataset.variables.flatMap((variable) => variable.times).filter((time): time is string => time !== null);
  if (times.length === 0) {
    throw new NetcdfDecodeError("bad-time", "the file gives neither a forecast reference time nor any valid time, so its fields cannot be placed in time");
  }
  return times.sort()[0];
}

/** Decoded NetCDF variables → format-neutral records, one per (variable, valid time, level). */
export function netcdfToGridRecords(dataset: NetcdfDataset): GridRecord[] {
  const model = modelOf(dataset);
  const records: GridRecord[] = [];
  let defaultRun: string | undefined;
  for (const variable of dataset.variables) {
    const parameter = parameterOf(variable);
    const runTime = variable.runTime ?? (defaultRun ??= fallbackRunTime(dataset));
    const sourceName = variable.standardName ? `${variable.name} (${variable.standardName}, ${variable.units})` : `${variable.name} (${variable.units})`;
    variable.values.forEach((row, timeIndex) => {
      row.forEach((values, levelIndex) => {
        records.push({
          parameter,
          sourceName,
          levelKind: LEVEL_KINDS[variable.levelType],
          level: variable.levels ? variable.levels[levelIndex] : 0,
          model,
          runTime,
          validTime: variable.times[timeIndex] ?? runTime,
          geometry: variable.geometry,
          values: parameter ? frameValues(values, variable) : values,
        });
      });
    });
  }
  return records;
}
