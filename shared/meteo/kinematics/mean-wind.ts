import { intervalContaining, windAtHeight, WindVector, type WindProfile } from "./wind-profile.ts";

const start = new WindVector();
const end = new WindVector();

/**
 * Height-weighted (non-pressure-weighted) mean wind over [bottom, top] m AGL: (1/Δz) ∫ V dz by trapezoids
 * with interpolated end points, which is exact for a wind linear in height between levels
 * (Bunkers et al. 2000 use the non-pressure-weighted 0-6 km mean). Writes NaN when the layer leaves the profile.
 */
export function meanWind(profile: WindProfile, bottom: number, top: number, out: WindVector): WindVector {
  const first = intervalContaining(profile, bottom);
  const last = intervalContaining(profile, top);
  if (first < 0 || last < 0 || !(top > bottom)) return out.set(Number.NaN, Number.NaN);
  const z = profile.height;
  windAtHeight(profile, bottom, start);
  windAtHeight(profile, top, end);
  let sumU = 0;
  let sumV = 0;
  let zPrev = bottom;
  let uPrev = start.u;
  let vPrev = start.v;
  for (let k = first + 1; k <= last; k++) {
    const zk = z[k];
    if (zk <= zPrev) continue;
    sumU += 0.5 * (zk - zPrev) * (uPrev + profile.u[k]);
    sumV += 0.5 * (zk - zPrev) * (vPrev + profile.v[k]);
    zPrev = zk;
    uPrev = profile.u[k];
    vPrev = profile.v[k];
  }
  sumU += 0.5 * (top - zPrev) * (uPrev + end.u);
  sumV += 0.5 * (top - zPrev) * (vPrev + end.v);
  const depth = top - bottom;
  return out.set(sumU / depth, sumV / depth);
}
