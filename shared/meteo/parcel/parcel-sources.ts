import { MOLAR_MASS_RATIO } from "../constants.ts";
import { dewpointFromVaporPressure } from "../thermo/saturation-vapor-pressure.ts";
import { equivalentPotentialTemperatureWithLcl } from "../thermo/equivalent-potential-temperature.ts";
import { lclTemperature } from "../thermo/lcl.ts";
import type { ColumnWorkspace } from "./column-workspace.ts";
import { liftParcel, type LiftSettings } from "./lift-parcel.ts";
import type { ParcelResult } from "./parcel-result.ts";

/** Depth of the mixed layer (Pa): 100 hPa, Craven et al. (2002). */
export const MIXED_LAYER_DEPTH = 10000;
/** Depth searched for the most-unstable parcel (Pa): the lowest 300 hPa, surface included. */
export const MOST_UNSTABLE_SEARCH_DEPTH = 30000;

/** Marks a parcel as not computable (e.g. the column is too shallow for its definition). */
export function clearParcel(result: ParcelResult): void {
  result.originLevel = -1;
  result.originPressure = Number.NaN;
  result.originHeight = Number.NaN;
  result.originTemperature = Number.NaN;
  result.originMixingRatio = Number.NaN;
  result.cape = Number.NaN;
  result.cin = Number.NaN;
  result.lclHeight = Number.NaN;
  result.lclPressure = Number.NaN;
  result.lclTemperature = Number.NaN;
  result.lfcHeight = Number.NaN;
  result.lfcPressure = Number.NaN;
  result.elHeight = Number.NaN;
  result.elPressure = Number.NaN;
  result.elCapped = false;
}

/** Lifts the parcel of column level `level` with that level's own temperature and humidity. */
export function liftLevelParcel(ws: ColumnWorkspace, settings: LiftSettings, level: number, result: ParcelResult): void {
  liftParcel(ws, settings, level, ws.temperature[level], ws.mixingRatio[level], ws.dewpoint[level], result);
}

/** Surface-based parcel: 2-m temperature and humidity at the surface pressure. */
export function liftSurfaceParcel(ws: ColumnWorkspace, settings: LiftSettings, result: ParcelResult): void {
  if (ws.count < 2) return clearParcel(result);
  liftLevelParcel(ws, settings, 0, result);
}

/**
 * Mixed-layer parcel (Craven et al. 2002): mass-weighted means of θ and r over p_sfc ≥ p ≥ p_sfc − 100 hPa
 * (trapezoid in p, top value interpolated linearly in ln p), started at the surface pressure.
 */
export function liftMixedLayerParcel(ws: ColumnWorkspace, settings: LiftSettings, result: ParcelResult): void {
  const count = ws.count;
  if (count < 2) return clearParcel(result);
  const p = ws.pressure;
  const top = p[0] - MIXED_LAYER_DEPTH;
  let thetaSum = 0;
  let mixingSum = 0;
  let k = 0;
  while (k + 1 < count && p[k + 1] > top) {
    const dp = p[k] - p[k + 1];
    thetaSum += 0.5 * dp * (ws.temperature[k] / ws.exner[k] + ws.temperature[k + 1] / ws.exner[k + 1]);
    mixingSum += 0.5 * dp * (ws.mixingRatio[k] + ws.mixingRatio[k + 1]);
    k++;
  }
  if (k + 1 >= count) return clearParcel(result);
  const f = (ws.lnPressure[k] - Math.log(top)) / (ws.lnPressure[k] - ws.lnPressure[k + 1]);
  const thetaK = ws.temperature[k] / ws.exner[k];
  const thetaTop = thetaK + f * (ws.temperature[k + 1] / ws.exner[k + 1] - thetaK);
  const mixingTop = ws.mixingRatio[k] + f * (ws.mixingRatio[k + 1] - ws.mixingRatio[k]);
  const dpTop = p[k] - top;
  thetaSum += 0.5 * dpTop * (thetaK + thetaTop);
  mixingSum += 0.5 * dpTop * (ws.mixingRatio[k] + mixingTop);
  const meanTheta = thetaSum / MIXED_LAYER_DEPTH;
  const meanMixing = mixingSum / MIXED_LAYER_DEPTH;
  const temperature = meanTheta * ws.exner[0];
  const e = (meanMixing * p[0]) / (MOLAR_MASS_RATIO + meanMixing);
  liftParcel(ws, settings, 0, temperature, meanMixing, dewpointFromVaporPressure(e), result);
}

/**
 * Level of the most-unstable parcel: largest θe (Bolton 1980, eq. 39) among levels with p ≥ p_sfc − 300 hPa,
 * surface included; ties go to the lowest level. Returns -1 for an empty column.
 */
export function mostUnstableLevel(ws: ColumnWorkspace): number {
  const count = ws.count;
  if (count < 1) return -1;
  const limit = ws.pressure[0] - MOST_UNSTABLE_SEARCH_DEPTH;
  let best = -1;
  let bestThetaE = Number.NEGATIVE_INFINITY;
  for (let k = 0; k < count && ws.pressure[k] >= limit; k++) {
    const t = ws.temperature[k];
    const thetaE = equivalentPotentialTemperatureWithLcl(t, ws.pressure[k], ws.mixingRatio[k], ws.vaporPressure[k], lclTemperature(t, ws.dewpoint[k]));
    if (thetaE > bestThetaE) {
      bestThetaE = thetaE;
      best = k;
    }
  }
  return best;
}

export function liftMostUnstableParcel(ws: ColumnWorkspace, settings: LiftSettings, result: ParcelResult): void {
  const level = mostUnstableLevel(ws);
  if (level < 0 || level >= ws.count - 1) return clearParcel(result);
  liftLevelParcel(ws, settings, level, result);
}
