/**
 * Weisman and Klemp (1982) analytic sounding, built for the reference checks.
 * θ(z) = θ0 + (θtr − θ0)(z/ztr)^(5/4) below the tropopause, θtr exp[g (z − ztr)/(cpd Ttr)] above;
 * RH(z) = 1 − ¾ (z/ztr)^(5/4) below, 0.25 above; vapour capped at qv0 (RH applied as r/rs, common practice).
 * Pressure comes from hydrostatic balance with virtual temperature, d(ln p)/dz = −g/(Rd Tv), integrated
 * level by level with the trapezoid rule in Tv and a fixed-point iteration for the unknown upper state.
 */
import {
  GAS_CONSTANT_DRY_AIR,
  MOLAR_MASS_RATIO,
  POISSON_EXPONENT,
  REFERENCE_PRESSURE,
  SPECIFIC_HEAT_DRY_AIR,
  STANDARD_GRAVITY,
} from "../../shared/meteo/constants.ts";
import { saturationMixingRatio } from "../../shared/meteo/thermo/humidity.ts";
import { dewpointFromVaporPressure } from "../../shared/meteo/thermo/saturation-vapor-pressure.ts";
import { virtualTemperature } from "../../shared/meteo/thermo/temperature.ts";
import type { ColumnProfile } from "../../shared/meteo/column/column-profile.ts";

export interface WeismanKlempOptions {
  /** Boundary-layer vapour mixing ratio cap (kg kg⁻¹). */
  qv0: number;
  /** Level spacing (m). */
  dz: number;
  top: number;
  /** Wind as a function of height (m AGL); default calm. */
  wind?: (z: number) => [number, number];
}

const THETA0 = 300;
const THETA_TROP = 343;
const T_TROP = 213;
const Z_TROP = 12000;

function thetaAt(z: number): number {
  return z <= Z_TROP
    ? THETA0 + (THETA_TROP - THETA0) * Math.pow(z / Z_TROP, 1.25)
    : THETA_TROP * Math.exp((STANDARD_GRAVITY * (z - Z_TROP)) / (SPECIFIC_HEAT_DRY_AIR * T_TROP));
}

function relativeHumidityAt(z: number): number {
  return z <= Z_TROP ? 1 - 0.75 * Math.pow(z / Z_TROP, 1.25) : 0.25;
}

function stateAt(z: number, pressure: number, qv0: number): { t: number; r: number } {
  const t = thetaAt(z) * Math.pow(pressure / REFERENCE_PRESSURE, POISSON_EXPONENT);
  const r = Math.min(qv0, relativeHumidityAt(z) * saturationMixingRatio(t, pressure));
  return { t, r };
}

export function weismanKlempProfile(options: WeismanKlempOptions): ColumnProfile & { mixingRatio: Float64Array } {
  const n = Math.floor(options.top / options.dz + 1e-9) + 1;
  const pressure = new Float64Array(n);
  const height = new Float64Array(n);
  const temperature = new Float64Array(n);
  const dewpoint = new Float64Array(n);
  const mixingRatio = new Float64Array(n);
  const u = new Float64Array(n);
  const v = new Float64Array(n);
  let lnP = Math.log(100000);
  let state = stateAt(0, 100000, options.qv0);
  for (let i = 0; i < n; i++) {
    const z = i * options.dz;
    if (i > 0) {
      const tvBelow = virtualTemperature(state.t, state.r);
      let guess = lnP - (STANDARD_GRAVITY * options.dz) / (GAS_CONSTANT_DRY_AIR * tvBelow);
      let next = stateAt(z, Math.exp(guess), options.qv0);
      for (let iter = 0; iter < 20; iter++) {
        const tvMean = 0.5 * (tvBelow + virtualTemperature(next.t, next.r));
        const updated = lnP - (STANDARD_GRAVITY * options.dz) / (GAS_CONSTANT_DRY_AIR * tvMean);
        const converged = Math.abs(updated - guess) < 1e-13;
        guess = updated;
        next = stateAt(z, Math.exp(guess), options.qv0);
        if (converged) break;
      }
      lnP = guess;
      state = next;
    }
    const p = Math.exp(lnP);
    pressure[i] = p;
    height[i] = z;
    temperature[i] = state.t;
    mixingRatio[i] = state.r;
    dewpoint[i] = dewpointFromVaporPressure((state.r * p) / (MOLAR_MASS_RATIO + state.r));
    const [uz, vz] = options.wind ? options.wind(z) : [0, 0];
    u[i] = uz;
    v[i] = vz;
  }
  return { pressure, height, temperature, dewpoint, u, v, mixingRatio };
}

/** The straight-line hodograph of the analytic checks: u = 30 z / 6 km up to 6 km, 30 m s⁻¹ above; v = 0. */
export function straightHodograph(z: number): [number, number] {
  return [z < 6000 ? (30 * z) / 6000 : 30, 0];
}
