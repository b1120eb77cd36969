import {
  GAS_CONSTANT_DRY_AIR,
  ICE_POINT,
  LATENT_HEAT_AT_ICE_POINT,
  LATENT_HEAT_SLOPE,
  MOLAR_MASS_RATIO,
  SPECIFIC_HEAT_DRY_AIR,
} from "../constants.ts";

const RD = GAS_CONSTANT_DRY_AIR;
const EPS = MOLAR_MASS_RATIO;
const CPD = SPECIFIC_HEAT_DRY_AIR;

/** Largest RK4 step in ln p; under 2e-6 K truncation error at 200 hPa against a 4000-step solution. */
export const MAX_LN_PRESSURE_STEP = 0.05;

/**
 * Pseudo-adiabatic lapse rate in pressure form, dT/d(ln p) (K), for a saturated parcel at temperature (K)
 * and ln(pressure in Pa). Condensate leaves at once, no ice, vapour heat capacity neglected:
 * dT/dlnp = (Rd T + Lv rs) / (cpd + Lv² rs ε / (Rd T²)), Lv from Bolton (1980), eq. 2, es from eq. 10
 * (the usual saturated-adiabatic lapse rate, cf. AMS Glossary "pseudoadiabatic lapse rate").
 * Written out in full (no helper calls) because it is the innermost function of every moist ascent.
 */
export function pseudoAdiabaticSlope(temperature: number, lnPressure: number): number {
  const celsius = temperature - ICE_POINT;
  const es = 611.2 * Math.exp((17.67 * celsius) / (celsius + 243.5));
  const pressure = Math.exp(lnPressure);
  const rs = (EPS * es) / (pressure - es);
  const latent = LATENT_HEAT_AT_ICE_POINT - LATENT_HEAT_SLOPE * celsius;
  return (RD * temperature + latent * rs) / (CPD + (latent * latent * rs * EPS) / (RD * temperature * temperature));
}

/**
 * Integrates the pseudo-adiabat from (temperature, lnPressureFrom) to lnPressureTo with classical RK4 in
 * x = ln p, using equal sub-steps no larger than MAX_LN_PRESSURE_STEP. Works upward or downward.
 * Returns the temperature (K) at lnPressureTo. This is the reference integrator.
 */
export function integratePseudoAdiabat(temperature: number, lnPressureFrom: number, lnPressureTo: number): number {
  const span = lnPressureTo - lnPressureFrom;
  if (span === 0) return temperature;
  const steps = Math.ceil(Math.abs(span) / MAX_LN_PRESSURE_STEP);
  const h = span / steps;
  let t = temperature;
  let x = lnPressureFrom;
  for (let i = 0; i < steps; i++) {
    const k1 = pseudoAdiabaticSlope(t, x);
    const k2 = pseudoAdiabaticSlope(t + 0.5 * h * k1, x + 0.5 * h);
    const k3 = pseudoAdiabaticSlope(t + 0.5 * h * k2, x + 0.5 * h);
    const k4 = pseudoAdiabaticSlope(t + h * k3, x + h);
    t += (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    x = lnPressureFrom + (i + 1) * h;
  }
  return t;
}

/** Wet-bulb potential temperature θw (K): the 1000-hPa temperature of the pseudo-adiabat through (temperature, pressure). */
export function wetBulbPotentialTemperatureOnPseudoAdiabat(temperature: number, pressure: number): number {
  return integratePseudoAdiabat(temperature, Math.log(pressure), Math.log(100000));
}
