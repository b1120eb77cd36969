/**
 * A wind profile as parallel arrays: heights (m AGL, increasing) and Earth-relative components (m s⁻¹).
 * Winds vary linearly in height between levels (Bellwether's column convention).
 */
export interface WindProfile {
  readonly height: ArrayLike<number>;
  readonly u: ArrayLike<number>;
  readonly v: ArrayLike<number>;
  readonly count: number;
}

/** A reusable 2-D vector so kinematic helpers can return pairs without allocating. */
export class WindVector {
  u = Number.NaN;
  v = Number.NaN;
  set(u: number, v: number): this {
    this.u = u;
    this.v = v;
    return this;
  }
}

/**
 * Index k of the level interval [k, k+1] that contains `height`, or -1 when the height lies outside
 * the profile. A height equal to the top level maps to the last interval.
 */
export function intervalContaining(profile: WindProfile, height: number): number {
  const z = profile.height;
  const n = profile.count;
  if (n < 2 || !(height >= z[0]) || !(height <= z[n - 1])) return -1;
  let k = 0;
  while (k < n - 2 && z[k + 1] < height) k++;
  return k;
}

/** Wind at a height (linear in height between the bracketing levels); NaN outside the profile. */
export function windAtHeight(profile: WindProfile, height: number, out: WindVector): WindVector {
  const k = intervalContaining(profile, height);
  if (k < 0) return out.set(Number.NaN, Number.NaN);
  const z = profile.height;
  const dz = z[k + 1] - z[k];
  const f = dz > 0 ? (height - z[k]) / dz : 0;
  return out.set(profile.u[k] + f * (profile.u[k + 1] - profile.u[k]), profile.v[k] + f * (profile.v[k + 1] - profile.v[k]));
}

/** Any level value (e.g. temperature) at a height, with the same linear-in-height rule. */
export function valueAtHeight(profile: WindProfile, values: ArrayLike<number>, height: number): number {
  const k = intervalContaining(profile, height);
  if (k < 0) return Number.NaN;
  const z = profile.height;
  const dz = z[k + 1] - z[k];
  const f = dz > 0 ? (height - z[k]) / dz : 0;
  return values[k] + f * (values[k + 1] - values[k]);
}
