import type { FixedSurface } from "./levels.ts";

/** What a field holds, named for listings; units are the SI units GRIB2 stores the field in. */
export interface ParameterInfo {
  shortName: string;
  name: string;
  unit: string;
}

/**
 * The parameters a model's pressure-level and near-surface output carries, keyed "discipline/category/number"
 * (WMO-No. 306, GRIB2 Code Table 4.2). Short names follow the usual GRIB conventions.
 */
const PARAMETERS: Record<string, ParameterInfo> = {
  "0/0/0": { shortName: "t", name: "Temperature", unit: "K" },
  "0/0/6": { shortName: "dpt", name: "Dew point temperature", unit: "K" },
  "0/1/0": { shortName: "q", name: "Specific humidity", unit: "kg kg-1" },
  "0/1/1": { shortName: "r", name: "Relative humidity", unit: "%" },
  "0/1/3": { shortName: "pwat", name: "Precipitable water", unit: "kg m-2" },
  "0/1/8": { shortName: "tp", name: "Total precipitation", unit: "kg m-2" },
  "0/2/2": { shortName: "u", name: "U component of wind", unit: "m s-1" },
  "0/2/3": { shortName: "v", name: "V component of wind", unit: "m s-1" },
  "0/2/8": { shortName: "w", name: "Vertical velocity (pressure)", unit: "Pa s-1" },
  "0/3/0": { shortName: "pres", name: "Pressure", unit: "Pa" },
  "0/3/1": { shortName: "prmsl", name: "Pressure reduced to mean sea level", unit: "Pa" },
  "0/3/4": { shortName: "z", name: "Geopotential", unit: "m2 s-2" },
  "0/3/5": { shortName: "gh", name: "Geopotential height", unit: "m" },
  "0/7/6": { shortName: "cape", name: "Convective available potential energy", unit: "J kg-1" },
  "0/7/7": { shortName: "cin", name: "Convective inhibition", unit: "J kg-1" },
  "2/0/0": { shortName: "lsm", name: "Land cover (land = 1, sea = 0)", unit: "1" },
  "2/0/7": { shortName: "mterh", name: "Model terrain height", unit: "m" },
};

/** Fields whose usual name depends on the surface: 2 m and 10 m screen-level fields, surface pressure, terrain. */
interface SurfaceSpecific {
  key: string;
  typeCode: number;
  level?: number;
  info: ParameterInfo;
}

const SURFACE_SPECIFIC: readonly SurfaceSpecific[] = [
  { key: "0/0/0", typeCode: 103, level: 2, info: { shortName: "2t", name: "2 metre temperature", unit: "K" } },
  { key: "0/0/6", typeCode: 103, level: 2, info: { shortName: "2d", name: "2 metre dew point temperature", unit: "K" } },
  { key: "0/1/0", typeCode: 103, level: 2, info: { shortName: "2sh", name: "2 metre specific humidity", unit: "kg kg-1" } },
  { key: "0/1/1", typeCode: 103, level: 2, info: { shortName: "2r", name: "2 metre relative humidity", unit: "%" } },
  { key: "0/2/2", typeCode: 103, level: 10, info: { shortName: "10u", name: "10 metre U wind component", unit: "m s-1" } },
  { key: "0/2/3", typeCode: 103, level: 10, info: { shortName: "10v", name: "10 metre V wind component", unit: "m s-1" } },
  { key: "0/3/0", typeCode: 1, info: { shortName: "sp", name: "Surface pressure", unit: "Pa" } },
  { key: "0/3/0", typeCode: 101, info: { shortName: "msl", name: "Mean sea level pressure", unit: "Pa" } },
  { key: "0/3/5", typeCode: 1, info: { shortName: "orog", name: "Orography (surface height)", unit: "m" } },
  { key: "0/3/4", typeCode: 1, info: { shortName: "zsfc", name: "Surface geopotential", unit: "m2 s-2" } },
];

export function parameterInfo(
  discipline: number,
  category: number,
  number: number,
  surface: FixedSurface | null,
): ParameterInfo {
  const key = `${discipline}/${category}/${number}`;
  if (surface) {
    for (const entry of SURFACE_SPECIFIC) {
      if (entry.key === key && entry.typeCode === surface.typeCode && (entry.level === undefined || entry.level === surface.level)) {
        return entry.info;
      }
    }
  }
  return PARAMETERS[key] ?? { shortName: `unknown-${discipline}-${category}-${number}`, name: "Unknown parameter", unit: "unknown" };
}
