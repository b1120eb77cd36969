/**
 * Petterssen two-dimensional frontogenesis on an isobaric surface.
 */
import { POISSON_EXPONENT, REFERENCE_PRESSURE } from "../constants.ts";
import type { HorizontalGrid } from "./horizontal-grid.ts";
import { allocateVelocityGradient, gradient, velocityGradient, type VelocityGradient } from "./operators.ts";
import { GridScratch } from "./grid-scratch.ts";

/** K m⁻¹ s⁻¹ → K (100 km)⁻¹ (3 h)⁻¹: 10⁵ m × 10 800 s. */
export const FRONTOGENESIS_DISPLAY_FACTOR = 1e5 * 3 * 3600;

/** Below this |∇θ| (K m⁻¹) the isentropes have no direction and frontogenesis is set to 0. */
export const FRONTOGENESIS_MIN_GRADIENT = 1e-7;

/** θ = T (p00/p)^κ on one pressure level, in place or into `out` (Poisson's equation; κ from Bolton 1980). */
export function potentialTemperatureOnLevel(
  temperature: Float32Array,
  pressure: number,
  out: Float32Array = new Float32Array(temperature.length),
): Float32Array {
  const factor = Math.pow(REFERENCE_PRESSURE / pressure, POISSON_EXPONENT);
  for (let k = 0; k < temperature.length; k++) out[k] = temperature[k] * factor;
  return out;
}

/**
 * F = d|∇θ|/dt for horizontal adiabatic motion, in the component form
 *   F = −(1/|∇θ|) [θx (ux θx + vx θy) + θy (uy θx + vy θy)]
 * (Petterssen 1936; Bluestein 1993, Vol. I), equal to ½|∇θ|(D cos 2β − δ). Written in K (100 km)⁻¹ (3 h)⁻¹.
 * Winds in the grid's own axes; the tensor carries the metric terms (operators.ts). Pass `tensor` to reuse
 * one already computed from the same winds.
 */
export function petterssenFrontogenesis(
  grid: HorizontalGrid,
  theta: Float32Array,
  u: Float32Array,
  v: Float32Array,
  out: Float32Array = new Float32Array(grid.nx * grid.ny),
  tensor: VelocityGradient = velocityGradient(grid, u, v, allocateVelocityGradient(grid.nx * grid.ny)),
  scratch: GridScratch = new GridScratch(),
): Float32Array {
  const thetaGradient = gradient(grid, theta, scratch.float32("gradientX", theta.length), scratch.float32("gradientY", theta.length));
  const tx = thetaGradient.x;
  const ty = thetaGradient.y;
  const { ux, uy, vx, vy } = tensor;
  for (let k = 0; k < out.length; k++) {
    const gx = tx[k];
    const gy = ty[k];
    const magnitude = Math.sqrt(gx * gx + gy * gy);
    if (!(magnitude >= FRONTOGENESIS_MIN_GRADIENT)) {
      out[k] = magnitude === magnitude && ux[k] === ux[k] ? 0 : Number.NaN;
      continue;
    }
    const stretching = gx * (ux[k] * gx + vx[k] * gy) + gy * (uy[k] * gx + vy[k] * gy);
    out[k] = (-stretching / magnitude) * FRONTOGENESIS_DISPLAY_FACTOR;
  }
  return out;
}
