/**
 * Natural-coordinate quantities of a horizontal wind (Holton and Hakim 2013, ch. 3):
 * t̂ = (u, v)/S along the flow, n̂ = k̂ × t̂ = (−v, u)/S to its left.
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";
import { allocateVelocityGradient, gradient, velocityGradient, type VelocityGradient } from "./operators.ts";
import { GridScratch } from "./grid-scratch.ts";

/** Below this speed (m s⁻¹) the flow has no usable direction: curvature and along/cross derivatives are NaN. */
export const CALM_SPEED = 0.1;

export interface NaturalCoordinateFields {
  /** S = √(u² + v²) (m s⁻¹). */
  readonly speed: Float32Array;
  /** ∂S/∂s = t̂·∇S (s⁻¹): > 0 air speeding up (entrance), < 0 slowing down (exit). */
  readonly alongSpeedChange: Float32Array;
  /** V·∇S = S ∂S/∂s (m s⁻²). */
  readonly alongAcceleration: Float32Array;
  /** ∂S/∂n = n̂·∇S (s⁻¹): < 0 on the left flank of a jet, > 0 on the right flank. */
  readonly crossSpeedGradient: Float32Array;
  /** Streamline curvature K_s (m⁻¹), > 0 counter-clockwise. */
  readonly curvature: Float32Array;
}

export function allocateNaturalCoordinateFields(pointCount: number): NaturalCoordinateFields {
  return {
    speed: new Float32Array(pointCount),
    alongSpeedChange: new Float32Array(pointCount),
    alongAcceleration: new Float32Array(pointCount),
    crossSpeedGradient: new Float32Array(pointCount),
    curvature: new Float32Array(pointCount),
  };
}

/** Wind speed S = √(u² + v²) at every point. */
export function windSpeed(u: ArrayLike<number>, v: ArrayLike<number>, out: Float32Array = new Float32Array(u.length)): Float32Array {
  for (let k = 0; k < u.length; k++) out[k] = Math.sqrt(u[k] * u[k] + v[k] * v[k]);
  return out;
}

/**
 * Speed, along-stream and cross-stream speed derivatives and streamline curvature
 * K_s = t̂·∇α (α the wind direction) = (u² v_x − v² u_y − u v (u_x − v_y)) / S³ (derived from that definition). ∇S is the centred difference of
 * S itself, so the identity ζ = S K_s − ∂S/∂n (curvature plus shear vorticity) holds to truncation error,
 * which the tests check. Winds in the grid's own axes.
 */
export function naturalCoordinates(
  grid: HorizontalGrid,
  u: Float32Array,
  v: Float32Array,
  out: NaturalCoordinateFields = allocateNaturalCoordinateFields(grid.nx * grid.ny),
  tensor: VelocityGradient = velocityGradient(grid, u, v, allocateVelocityGradient(grid.nx * grid.ny)),
  scratch: GridScratch = new GridScratch(),
): NaturalCoordinateFields {
  const { speed, alongSpeedChange, alongAcceleration, crossSpeedGradient, curvature } = out;
  windSpeed(u, v, speed);
  const n = speed.length;
  const speedGradient = gradient(grid, speed, scratch.float32("gradientX", n), scratch.float32("gradientY", n));
  const sx = speedGradient.x;
  const sy = speedGradient.y;
  const { ux, uy, vx, vy } = tensor;
  for (let k = 0; k < speed.length; k++) {
    const s = speed[k];
    if (!(s >= CALM_SPEED)) {
      alongSpeedChange[k] = alongAcceleration[k] = crossSpeedGradient[k] = curvature[k] = Number.NaN;
      continue;
    }
    const uk = u[k];
    const vk = v[k];
    const along = (uk * sx[k] + vk * sy[k]) / s;
    alongSpeedChange[k] = along;
    alongAcceleration[k] = s * along;
    crossSpeedGradient[k] = (-vk * sx[k] + uk * sy[k]) / s;
    curvature[k] = (uk * uk * vx[k] - vk * vk * uy[k] - uk * vk * (ux[k] - vy[k])) / (s * s * s);
  }
  return out;
}
