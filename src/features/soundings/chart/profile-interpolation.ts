import type { SoundingLevelDto } from "@shared/api/soundings.ts";
import { mixingRatioFromVaporPressure, saturationVaporPressure, virtualTemperature } from "@shared/meteo/index.ts";

/** The environment levels the charts read: the report's levels (SI units, surface first, pressure falling upward). */
export type ProfileLevel = SoundingLevelDto;

export interface EnvironmentSample {
  pressure: number;
  height: number;
  temperature: number;
  dewpoint: number;
}

/**
 * Parcel nodes come back as exp(ln p), a hair off the level they were taken at (98500 → 98500.00000000001):
 * pressures this close to the profile's ends count as the end itself.
 */
const END_TOLERANCE = 1e-9;

/** Index k such that levels[k] and levels[k+1] bracket the pressure, or -1 outside the profile. */
function bracketByPressure(levels: readonly ProfileLevel[], pressure: number): number {
  if (levels.length < 2) return -1;
  const bottom = levels[0].pressure;
  const top = levels[levels.length - 1].pressure;
  if (pressure > bottom * (1 + END_TOLERANCE) || pressure < top * (1 - END_TOLERANCE)) return -1;
  for (let k = 0; k < levels.length - 1; k++) if (pressure >= levels[k + 1].pressure) return k;
  return levels.length - 2;
}

/** T, Td and height at a pressure, each linear in ln p between levels (the library's column convention); null outside. */
export function environmentAt(levels: readonly ProfileLevel[], pressure: number): EnvironmentSample | null {
  const k = bracketByPressure(levels, pressure);
  if (k < 0) return null;
  const a = levels[k];
  const b = levels[k + 1];
  const f = Math.min(1, Math.max(0, (Math.log(a.pressure) - Math.log(pressure)) / (Math.log(a.pressure) - Math.log(b.pressure))));
  const mix = (x: number, y: number) => x + f * (y - x);
  return { pressure, height: mix(a.height, b.height), temperature: mix(a.temperature, b.temperature), dewpoint: mix(a.dewpoint, b.dewpoint) };
}

/**
 * The environment value a parcel is compared with: virtual temperature from T and the dewpoint's mixing ratio
 * (Doswell and Rasmussen 1994 apply the correction to both), or plain T when the correction is off. NaN outside.
 */
export function environmentBuoyancyTemperature(levels: readonly ProfileLevel[], pressure: number, virtual: boolean): number {
  const env = environmentAt(levels, pressure);
  if (!env) return Number.NaN;
  if (!virtual) return env.temperature;
  const r = mixingRatioFromVaporPressure(saturationVaporPressure(env.dewpoint), pressure);
  return virtualTemperature(env.temperature, r);
}

/** Pressure (Pa) at a height above ground, ln p linear in height between levels; null outside the profile. */
export function pressureAtHeight(levels: readonly ProfileLevel[], height: number): number | null {
  for (let k = 0; k < levels.length - 1; k++) {
    const a = levels[k];
    const b = levels[k + 1];
    if (height >= a.height && height <= b.height && b.height > a.height) {
      const f = (height - a.height) / (b.height - a.height);
      return Math.exp(Math.log(a.pressure) + f * (Math.log(b.pressure) - Math.log(a.pressure)));
    }
  }
  return null;
}

/** Height (m AGL) at a pressure, linear in ln p; null outside the profile. */
export function heightAtPressure(levels: readonly ProfileLevel[], pressure: number): number | null {
  return environmentAt(levels, pressure)?.height ?? null;
}

/** Temperature on a drawn path (points from the bottom up) at a pressure, linear in ln p; null outside the path. */
export function temperatureOnPath(points: ReadonlyArray<{ pressure: number; temperature: number }>, pressure: number): number | null {
  for (let k = 0; k < points.length - 1; k++) {
    const a = points[k];
    const b = points[k + 1];
    const inside = pressure <= a.pressure * (1 + END_TOLERANCE) && pressure >= b.pressure * (1 - END_TOLERANCE);
    if (inside && a.pressure > b.pressure) {
      const f = Math.min(1, Math.max(0, (Math.log(a.pressure) - Math.log(pressure)) / (Math.log(a.pressure) - Math.log(b.pressure))));
      return a.temperature + f * (b.temperature - a.temperature);
    }
  }
  return points.length === 1 && points[0].pressure === pressure ? points[0].temperature : null;
}
