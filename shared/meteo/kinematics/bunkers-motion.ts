import { meanWind } from "./mean-wind.ts";
import { WindVector, type WindProfile } from "./wind-profile.ts";

/** Deviation of supercell motion from the 0-6 km mean wind (m s⁻¹); Bunkers et al. (2000). */
export const BUNKERS_DEVIATION = 7.5;
/** Below this shear-vector length (m s⁻¹) the direction is meaningless and the motions are undefined. */
export const MINIMUM_BUNKERS_SHEAR = 0.1;

const lowMean = new WindVector();
const highMean = new WindVector();

/**
 * Bunkers et al. (2000) supercell motion: V_RM,LM = V̄(0-6 km) ± D (Ŝh × k̂), Sh = V̄(5.5-6 km) − V̄(0-0.5 km),
 * D = 7.5 m s⁻¹, (Shx, Shy) × k̂ = (Shy, −Shx) so the right mover lies right of the shear.
 * Writes NaN into all three vectors when the profile is shorter than 6 km or the shear is under 0.1 m s⁻¹.
 */
export function bunkersStormMotion(profile: WindProfile, mean: WindVector, rightMover: WindVector, leftMover: WindVector): void {
  meanWind(profile, 0, 6000, mean);
  meanWind(profile, 0, 500, lowMean);
  meanWind(profile, 5500, 6000, highMean);
  const shearU = highMean.u - lowMean.u;
  const shearV = highMean.v - lowMean.v;
  const length = Math.hypot(shearU, shearV);
  if (!(length >= MINIMUM_BUNKERS_SHEAR)) {
    rightMover.set(Number.NaN, Number.NaN);
    leftMover.set(Number.NaN, Number.NaN);
    return;
  }
  const du = (BUNKERS_DEVIATION * shearV) / length;
  const dv = (-BUNKERS_DEVIATION * shearU) / length;
  rightMover.set(mean.u + du, mean.v + dv);
  leftMover.set(mean.u - du, mean.v - dv);
}
