import { MOLAR_MASS_RATIO } from "../constants.ts";
import { saturationVaporPressure } from "./saturation-vapor-pressure.ts";

const EPS = MOLAR_MASS_RATIO;

/** Mixing ratio (kg kg⁻¹) from vapour pressure and total pressure (Pa): r = ε e / (p − e) (ideal-gas mixture definition). */
export function mixingRatioFromVaporPressure(vaporPressure: number, pressure: number): number {
  return (EPS * vaporPressure) / (pressure - vaporPressure);
}

/** Vapour pressure (Pa) from mixing ratio (kg kg⁻¹) and pressure (Pa): e = r p / (ε + r), inverse of the definition above. */
export function vaporPressureFromMixingRatio(mixingRatio: number, pressure: number): number {
  return (mixingRatio * pressure) / (EPS + mixingRatio);
}

/** Specific humidity (kg kg⁻¹) from mixing ratio: q = r / (1 + r) (definition). */
export function specificHumidityFromMixingRatio(mixingRatio: number): number {
  return mixingRatio / (1 + mixingRatio);
}

/** Vapour pressure (Pa) from specific humidity (kg kg⁻¹) and pressure (Pa): e = q p / (ε + (1 − ε) q) (definition). */
export function vaporPressureFromSpecificHumidity(specificHumidity: number, pressure: number): number {
  return (specificHumidity * pressure) / (EPS + (1 - EPS) * specificHumidity);
}

/** Saturation mixing ratio (kg kg⁻¹) over liquid water at temperature (K) and pressure (Pa), with es from Bolton (1980), eq. 10. */
export function saturationMixingRatio(temperature: number, pressure: number): number {
  return mixingRatioFromVaporPressure(saturationVaporPressure(temperature), pressure);
}

/** Vapour pressure (Pa) from relative humidity (fraction, WMO definition RH = e / es(T)) and temperature (K). */
export function vaporPressureFromRelativeHumidity(relativeHumidity: number, temperature: number): number {
  return relativeHumidity * saturationVaporPressure(temperature);
}
