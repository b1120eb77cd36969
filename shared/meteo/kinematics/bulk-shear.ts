import { windAtHeight, WindVector, type WindProfile } from "./wind-profile.ts";

const lower = new WindVector();
const upper = new WindVector();

/** Bulk wind difference |V(z2) − V(z1)| (m s⁻¹) between two heights AGL; NaN if either is outside the profile. */
export function bulkWindDifference(profile: WindProfile, bottom: number, top: number): number {
  windAtHeight(profile, bottom, lower);
  windAtHeight(profile, top, upper);
  return Math.hypot(upper.u - lower.u, upper.v - lower.v);
}
