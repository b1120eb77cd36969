import { ICE_POINT } from "../constants.ts";

// Bolton (1980), eq. 10 coefficients: es = 611.2 exp(17.67 t / (t + 243.5)), t in °C, es in Pa.
const BOLTON_ES0 = 611.2;
const BOLTON_A = 17.67;
const BOLTON_B = 243.5;

/**
 * Saturation vapour pressure over liquid water (Pa) at temperature (K).
 * Bolton (1980), eq. 10. Liquid water is assumed at every temperature (no ice phase in v1);
 * about 0.1 % accurate from −30 to 35 °C.
 */
export function saturationVaporPressure(temperature: number): number {
  const celsius = temperature - ICE_POINT;
  return BOLTON_ES0 * Math.exp((BOLTON_A * celsius) / (celsius + BOLTON_B));
}

/**
 * Dewpoint (K) from vapour pressure (Pa): the exact inverse of Bolton (1980), eq. 10 (Bolton's eq. 11).
 * Returns NaN for non-positive vapour pressure.
 */
export function dewpointFromVaporPressure(vaporPressure: number): number {
  if (!(vaporPressure > 0)) return Number.NaN;
  const x = Math.log(vaporPressure / BOLTON_ES0);
  return ICE_POINT + (BOLTON_B * x) / (BOLTON_A - x);
}
