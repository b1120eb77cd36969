import { GAS_CONSTANT_DRY_AIR } from "../constants.ts";

/** Where the parcel's levels lie along its node list, as fractional node positions (NaN when undefined). */
export class BuoyancyResult {
  lfcPosition = Number.NaN;
  elPosition = Number.NaN;
  elCapped = false;
  /** J kg⁻¹, ≥ 0. */
  cape = 0;
  /** J kg⁻¹, ≤ 0; NaN when there is no LFC. */
  cin = Number.NaN;

  reset(): void {
    this.lfcPosition = Number.NaN;
    this.elPosition = Number.NaN;
    this.elCapped = false;
    this.cape = 0;
    this.cin = Number.NaN;
  }
}

/**
 * Finds the EL, the LFC, CAPE and CIN of one parcel from its buoyancy nodes.
 *
 * Input: nodes ordered upward from the parcel origin, `lnPressure[k]` strictly decreasing (equal
 * neighbours are tolerated and contribute nothing) and `delta[k]` = Tv_parcel − Tv_env (K); the LCL is node
 * `lclNode`. Δ is piecewise linear in ln p, so ∫ B dz = Rd ∫ Δ d(ln p) is integrated exactly, with
 * trapezoids split at zero crossings (hydrostatic identity; Doswell and Rasmussen 1994 for the use of Tv).
 *
 * Conventions (Bellwether's; the literature differs):
 * - EL: highest crossing from Δ > 0 to Δ ≤ 0; if Δ > 0 at the top node, the EL is the top and is capped.
 * - LFC candidates: crossings from Δ ≤ 0 to Δ > 0 at or above the LCL and below the EL, plus the LCL
 *   itself when Δ(LCL) > 0. The LFC is the candidate with the smallest running net integral E (ties: lowest),
 *   so a shallow buoyant bubble under a strong cap does not hide the cap.
 * - CAPE: positive area between LFC and EL; CIN: negative area between origin and LFC.
 * - No LFC: CAPE = 0 and CIN, LFC, EL undefined.
 * Allocates nothing.
 */
export function analyzeBuoyancy(
  lnPressure: ArrayLike<number>,
  delta: ArrayLike<number>,
  count: number,
  lclNode: number,
  out: BuoyancyResult,
): void {
  out.reset();
  if (count < 2) return;

  // Equilibrium level: scan down from the top for the highest positive-to-non-positive crossing.
  let elPosition = Number.NaN;
  let elInterval = -1;
  if (delta[count - 1] > 0) {
    elPosition = count - 1;
    elInterval = count - 1;
    out.elCapped = true;
  } else {
    for (let k = count - 2; k >= 0; k--) {
      const a = delta[k];
      if (a > 0) {
        elPosition = k + a / (a - delta[k + 1]);
        elInterval = k;
        break;
      }
    }
  }
  if (elInterval < 0) return;

  let net = 0;
  let negative = 0;
  let positive = 0;
  let bestNet = Number.POSITIVE_INFINITY;
  let bestPosition = Number.NaN;
  let bestNegative = 0;
  let bestPositive = 0;
  let positiveAtEl = 0;

  for (let k = 0; k < count - 1 || k === elInterval; k++) {
    const a = delta[k];
    if (k === lclNode && a > 0 && k < elPosition && net < bestNet) {
      bestNet = net;
      bestPosition = k;
      bestNegative = negative;
      bestPositive = positive;
    }
    if (k === count - 1) {
      positiveAtEl = positive; // capped EL at the top node
      break;
    }
    const b = delta[k + 1];
    const h = lnPressure[k] - lnPressure[k + 1];
    if (a <= 0 && b <= 0) {
      const area = 0.5 * h * (a + b);
      net += area;
      negative += area;
    } else if (a > 0 && b > 0) {
      const area = 0.5 * h * (a + b);
      net += area;
      positive += area;
    } else if (a <= 0) {
      // Rising through zero: a candidate LFC if at or above the LCL and below the EL.
      const f = -a / (b - a);
      const below = 0.5 * f * h * a;
      net += below;
      negative += below;
      const position = k + f;
      if (k >= lclNode && position < elPosition && net < bestNet) {
        bestNet = net;
        bestPosition = position;
        bestNegative = negative;
        bestPositive = positive;
      }
      const above = 0.5 * (1 - f) * h * b;
      net += above;
      positive += above;
    } else {
      // Falling through zero.
      const f = a / (a - b);
      const above = 0.5 * f * h * a;
      net += above;
      positive += above;
      if (k === elInterval) {
        positiveAtEl = positive;
        break;
      }
      const below = 0.5 * (1 - f) * h * b;
      net += below;
      negative += below;
    }
  }

  if (Number.isNaN(bestPosition)) return;
  out.lfcPosition = bestPosition;
  out.elPosition = elPosition;
  out.cape = GAS_CONSTANT_DRY_AIR * (positiveAtEl - bestPositive);
  out.cin = GAS_CONSTANT_DRY_AIR * bestNegative;
}

/** Linear interpolation of a node quantity at a fractional node position (NaN in, NaN out). */
export function valueAtPosition(values: ArrayLike<number>, position: number): number {
  if (Number.isNaN(position)) return Number.NaN;
  const k = Math.floor(position);
  const f = position - k;
  if (f === 0) return values[k];
  return values[k] + f * (values[k + 1] - values[k]);
}

/**
 * Running net buoyancy integral E at every node, E(k) = Rd ∫ Δ d(ln p) from the origin (J kg⁻¹), with the same
 * exact piecewise-linear integration as analyzeBuoyancy (for energy plots and checks).
 */
export function runningBuoyancyIntegral(lnPressure: ArrayLike<number>, delta: ArrayLike<number>, count: number, out: Float64Array): void {
  if (count < 1) return;
  out[0] = 0;
  for (let k = 0; k < count - 1; k++) {
    out[k + 1] = out[k] + GAS_CONSTANT_DRY_AIR * 0.5 * (lnPressure[k] - lnPressure[k + 1]) * (delta[k] + delta[k + 1]);
  }
}
