import { MOLAR_MASS_RATIO, POISSON_EXPONENT, REFERENCE_PRESSURE } from "../constants.ts";

/**
 * Virtual temperature (K) of moist air at temperature (K) with mixing ratio (kg kg⁻¹):
 * Tv = T (1 + r/ε) / (1 + r), exact for an ideal mixture of dry air and vapour (Wallace and Hobbs 2006, ch. 3).
 */
export function virtualTemperature(temperature: number, mixingRatio: number): number {
  return (temperature * (1 + mixingRatio / MOLAR_MASS_RATIO)) / (1 + mixingRatio);
}

/** Potential temperature (K): θ = T (p00 / p)^κ (Poisson's equation; κ from Bolton 1980). */
export function potentialTemperature(temperature: number, pressure: number): number {
  return temperature * Math.pow(REFERENCE_PRESSURE / pressure, POISSON_EXPONENT);
}

/** Temperature (K) on the dry adiabat of potential temperature θ at pressure (Pa): inverse of Poisson's equation. */
export function temperatureFromPotentialTemperature(theta: number, pressure: number): number {
  return theta * Math.pow(pressure / REFERENCE_PRESSURE, POISSON_EXPONENT);
}
