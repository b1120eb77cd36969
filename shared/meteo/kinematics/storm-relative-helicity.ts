import { intervalContaining, windAtHeight, WindVector, type WindProfile } from "./wind-profile.ts";

const start = new WindVector();
const end = new WindVector();

/**
 * Storm-relative helicity (m² s⁻²) over [bottom, top] m AGL for storm motion (cx, cy), in the discrete form of
 * Davies-Jones et al. (1990): Σ (u_{n+1} − cx)(v_n − cy) − (u_n − cx)(v_{n+1} − cy) over the levels in the
 * layer with interpolated end points. Exact for a piecewise-linear hodograph; positive for clockwise turning.
 * NaN when the layer leaves the profile or the storm motion is undefined.
 */
export function stormRelativeHelicity(profile: WindProfile, bottom: number, top: number, cx: number, cy: number): number {
  const first = intervalContaining(profile, bottom);
  const last = intervalContaining(profile, top);
  if (first < 0 || last < 0) return Number.NaN;
  if (!(top > bottom)) return 0;
  const z = profile.height;
  windAtHeight(profile, bottom, start);
  windAtHeight(profile, top, end);
  let sum = 0;
  let uPrev = start.u - cx;
  let vPrev = start.v - cy;
  for (let k = first + 1; k <= last; k++) {
    if (z[k] <= bottom || z[k] >= top) continue;
    const uk = profile.u[k] - cx;
    const vk = profile.v[k] - cy;
    sum += uk * vPrev - uPrev * vk;
    uPrev = uk;
    vPrev = vk;
  }
  const uEnd = end.u - cx;
  const vEnd = end.v - cy;
  sum += uEnd * vPrev - uPrev * vEnd;
  return sum;
}
