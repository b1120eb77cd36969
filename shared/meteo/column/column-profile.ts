import { InvalidProfileError } from "../errors.ts";

/**
 * One vertical profile for the per-column entry point, surface first, SI units.
 * Pressure strictly decreasing; heights are geopotential heights (m) whose first entry is the ground;
 * winds are Earth-relative with NaN where a level has no wind.
 */
export interface ColumnProfile {
  readonly pressure: ArrayLike<number>;
  readonly height: ArrayLike<number>;
  readonly temperature: ArrayLike<number>;
  readonly dewpoint: ArrayLike<number>;
  readonly u: ArrayLike<number>;
  readonly v: ArrayLike<number>;
}

/** Checks shape and physical sanity; throws InvalidProfileError naming the argument and level. */
export function validateColumnProfile(profile: ColumnProfile): void {
  const n = profile.pressure.length;
  if (n < 2) throw new InvalidProfileError(`profile.pressure: expected at least 2 levels, received ${n}`);
  for (const name of ["height", "temperature", "dewpoint", "u", "v"] as const) {
    if (profile[name].length !== n) {
      throw new InvalidProfileError(`profile.${name}: expected ${n} values (one per pressure level), received ${profile[name].length}`);
    }
  }
  for (let k = 0; k < n; k++) {
    const p = profile.pressure[k];
    if (!(p > 0)) throw new InvalidProfileError(`profile.pressure[${k}]: expected a positive pressure in Pa, received ${p}`);
    if (k > 0 && !(p < profile.pressure[k - 1])) {
      throw new InvalidProfileError(`profile.pressure[${k}]: pressure must decrease upward (${profile.pressure[k - 1]} Pa, then ${p} Pa)`);
    }
    if (k > 0 && !(profile.height[k] > profile.height[k - 1])) {
      throw new InvalidProfileError(`profile.height[${k}]: height must increase upward (${profile.height[k - 1]} m, then ${profile.height[k]} m)`);
    }
    if (!(profile.temperature[k] > 0)) throw new InvalidProfileError(`profile.temperature[${k}]: expected kelvin, received ${profile.temperature[k]}`);
    if (!(profile.dewpoint[k] > 0)) throw new InvalidProfileError(`profile.dewpoint[${k}]: expected kelvin, received ${profile.dewpoint[k]}`);
  }
}
