import { POISSON_EXPONENT, REFERENCE_PRESSURE } from "../constants.ts";
import { vaporPressureFromMixingRatio } from "./humidity.ts";
import { dewpointFromVaporPressure } from "./saturation-vapor-pressure.ts";
import { lclTemperature } from "./lcl.ts";

/**
 * Equivalent potential temperature (K) from temperature (K), pressure (Pa) and mixing ratio (kg kg⁻¹).
 * Bolton (1980), eqs. 24 and 39 with T_L from eq. 15; Davies-Jones (2009) rates eq. 39 the most accurate
 * of the non-iterative forms.
 */
export function equivalentPotentialTemperature(temperature: number, pressure: number, mixingRatio: number): number {
  const vaporPressure = vaporPressureFromMixingRatio(mixingRatio, pressure);
  const lclTemp = lclTemperature(temperature, dewpointFromVaporPressure(vaporPressure));
  return equivalentPotentialTemperatureWithLcl(temperature, pressure, mixingRatio, vaporPressure, lclTemp);
}

/**
 * Bolton (1980), eqs. 24 and 39, when e and T_L are already known (saves a logarithm in the column code).
 * θ_DL = T (p00 / (p − e))^κ (T / T_L)^(0.28 r);  θe = θ_DL exp[(3036 / T_L − 1.78) r (1 + 0.448 r)].
 */
export function equivalentPotentialTemperatureWithLcl(
  temperature: number,
  pressure: number,
  mixingRatio: number,
  vaporPressure: number,
  lclTemp: number,
): number {
  const thetaDL =
    temperature *
    Math.pow(REFERENCE_PRESSURE / (pressure - vaporPressure), POISSON_EXPONENT) *
    Math.pow(temperature / lclTemp, 0.28 * mixingRatio);
  return thetaDL * Math.exp((3036 / lclTemp - 1.78) * mixingRatio * (1 + 0.448 * mixingRatio));
}
