/**
 * Public surface of the column-diagnostics library (pure TypeScript, no I/O, SI units).
 * Everything not re-exported here is internal.
 */
export * from "./constants.ts";
export { InvalidProfileError, GridShapeError } from "./errors.ts";

export { saturationVaporPressure, dewpointFromVaporPressure } from "./thermo/saturation-vapor-pressure.ts";
export {
  mixingRatioFromVaporPressure,
  vaporPressureFromMixingRatio,
  specificHumidityFromMixingRatio,
  vaporPressureFromSpecificHumidity,
  vaporPressureFromRelativeHumidity,
  saturationMixingRatio,
} from "./thermo/humidity.ts";
export { virtualTemperature, potentialTemperature, temperatureFromPotentialTemperature } from "./thermo/temperature.ts";
export { equivalentPotentialTemperature } from "./thermo/equivalent-potential-temperature.ts";
export { lclTemperature, lclPressure } from "./thermo/lcl.ts";
export {
  pseudoAdiabaticSlope,
  integratePseudoAdiabat,
  wetBulbPotentialTemperatureOnPseudoAdiabat,
  MAX_LN_PRESSURE_STEP,
} from "./thermo/pseudo-adiabat.ts";
export { PseudoAdiabatTable, getPseudoAdiabatTable, DEFAULT_TABLE_SPEC, type PseudoAdiabatTableSpec } from "./thermo/pseudo-adiabat-table.ts";

export { analyzeBuoyancy, runningBuoyancyIntegral, BuoyancyResult } from "./parcel/buoyancy-bookkeeping.ts";
export type { PseudoAdiabatMethod } from "./parcel/lift-parcel.ts";

export { WindVector, windAtHeight, type WindProfile } from "./kinematics/wind-profile.ts";
export { bulkWindDifference } from "./kinematics/bulk-shear.ts";
export { meanWind } from "./kinematics/mean-wind.ts";
export { bunkersStormMotion, BUNKERS_DEVIATION } from "./kinematics/bunkers-motion.ts";
export { stormRelativeHelicity } from "./kinematics/storm-relative-helicity.ts";

export * from "./composites.ts";

export type { ColumnOptions, Hemisphere } from "./column/column-options.ts";
export type { ColumnProfile } from "./column/column-profile.ts";
export { diagnoseColumn, type ColumnDiagnostics, type ColumnDiagnosticsMeta } from "./column/diagnose-column.ts";
export {
  allocateColumnGridOutput,
  validateColumnGrid,
  type ColumnGrid,
  type ColumnGridOutput,
  type HumidityField,
  type HumidityKind,
} from "./column/column-grid.ts";
export { diagnoseColumnGrid, type PointRange } from "./column/diagnose-grid.ts";
export { buildSoundingReport, type SoundingReport, type ParcelTrace } from "./sounding-report.ts";
