import {
  dewpointFromVaporPressure,
  integratePseudoAdiabat,
  temperatureFromPotentialTemperature,
  vaporPressureFromMixingRatio,
} from "@shared/meteo/index.ts";
import type { ThermoPoint } from "./skew-t-geometry.ts";

/** One background line of the diagram: the quantity it holds constant and its points from the bottom up. */
export interface ReferenceLine {
  value: number;
  points: ThermoPoint[];
}

const K = 273.15;
const P_1000 = 100000;

/** Pressures (Pa) from `bottom` up to `top` in equal steps of `step`, both ends included. */
export function pressureLadder(bottom: number, top: number, step: number): number[] {
  const out: number[] = [];
  for (let p = bottom; p > top; p -= step) out.push(p);
  out.push(top);
  return out;
}

/** Dry adiabats: T = θ (p/p00)^κ along each potential temperature θ (K), Poisson's equation. */
export function dryAdiabats(thetas: readonly number[], pressures: readonly number[]): ReferenceLine[] {
  return thetas.map((theta) => ({
    value: theta,
    points: pressures.map((pressure) => ({ pressure, temperature: temperatureFromPotentialTemperature(theta, pressure) })),
  }));
}

/**
 * Pseudo-adiabats labelled by wet-bulb potential temperature θw (K, their temperature at 1000 hPa), integrated
 * with the library's RK4 pseudo-adiabat (the same one the parcels use) up and down from 1000 hPa.
 */
export function moistAdiabats(wetBulbThetas: readonly number[], pressures: readonly number[]): ReferenceLine[] {
  const ln1000 = Math.log(P_1000);
  return wetBulbThetas.map((thetaW) => {
    const points: ThermoPoint[] = [];
    let t = thetaW;
    let lnFrom = ln1000;
    // Walk outward from 1000 hPa in both directions so each step continues from the previous one.
    const below = pressures.filter((p) => p > P_1000).sort((a, b) => a - b);
    const above = pressures.filter((p) => p <= P_1000).sort((a, b) => b - a);
    for (const p of below) {
      t = integratePseudoAdiabat(t, lnFrom, Math.log(p));
      lnFrom = Math.log(p);
      points.unshift({ pressure: p, temperature: t });
    }
    t = thetaW;
    lnFrom = ln1000;
    for (const p of above) {
      t = integratePseudoAdiabat(t, lnFrom, Math.log(p));
      lnFrom = Math.log(p);
      points.push({ pressure: p, temperature: t });
    }
    return { value: thetaW, points };
  });
}

/**
 * Lines of constant saturation mixing ratio (kg/kg): the temperature at which air at pressure p holds exactly
 * r, i.e. the dewpoint of vapour pressure e = r p / (ε + r) (inverse of Bolton 1980, eq. 10).
 */
export function mixingRatioLines(mixingRatios: readonly number[], pressures: readonly number[]): ReferenceLine[] {
  return mixingRatios.map((r) => ({
    value: r,
    points: pressures.map((pressure) => ({ pressure, temperature: dewpointFromVaporPressure(vaporPressureFromMixingRatio(r, pressure)) })),
  }));
}

/** Evenly spaced values from `from` to `to` inclusive. */
export function steps(from: number, to: number, step: number): number[] {
  const out: number[] = [];
  for (let v = from; v <= to + 1e-9; v += step) out.push(v);
  return out;
}

/** The background line sets the Bellwether diagram draws (values chosen for legibility, not by any standard). */
export function defaultReferenceLines(bottomPressure: number, topPressure: number) {
  const tall = pressureLadder(bottomPressure, topPressure, 2500);
  return {
    dry: dryAdiabats(steps(250, 470, 10), tall),
    moist: moistAdiabats(steps(-16 + K, 36 + K, 4), pressureLadder(bottomPressure, Math.max(topPressure, 20000), 2500)),
    mixing: mixingRatioLines([0.002, 0.004, 0.008, 0.012, 0.016, 0.02, 0.024], pressureLadder(bottomPressure, 60000, 2500)),
  };
}
