import { POISSON_EXPONENT, REFERENCE_PRESSURE } from "../constants.ts";

/**
 * Temperature at the lifting condensation level (K) from temperature and dewpoint (K).
 * Bolton (1980), eq. 15. A dewpoint at or above the temperature means the air is saturated,
 * so the LCL is the starting point itself (T_L = T).
 */
export function lclTemperature(temperature: number, dewpoint: number): number {
  if (dewpoint >= temperature) return temperature;
  return 1 / (1 / (dewpoint - 56) + Math.log(temperature / dewpoint) / 800) + 56;
}

/**
 * Pressure at the LCL (Pa) along the dry adiabat through (temperature, pressure), given the LCL temperature:
 * p_L = p00 (T_L / θ)^(1/κ) with κ held at its dry value (Bolton 1980, eq. 22 context).
 * Never returns more than the starting pressure.
 */
export function lclPressure(temperature: number, pressure: number, lclTemp: number): number {
  const theta = temperature * Math.pow(REFERENCE_PRESSURE / pressure, POISSON_EXPONENT);
  const pL = REFERENCE_PRESSURE * Math.pow(lclTemp / theta, 1 / POISSON_EXPONENT);
  return pL > pressure ? pressure : pL;
}
