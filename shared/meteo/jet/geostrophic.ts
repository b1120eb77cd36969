/**
 * Geostrophic and ageostrophic wind on an isobaric surface, in the grid's own axes.
 */
import { STANDARD_GRAVITY } from "../constants.ts";
import type { HorizontalGrid } from "./horizontal-grid.ts";
import { fillBorderNaN } from "./operators.ts";

/**
 * Geostrophic wind from geopotential height Z (gpm) with the Coriolis parameter of each point:
 * u_g = −(g/f) ∂Z/∂y, v_g = (g/f) ∂Z/∂x, with ∂/∂x = (1/hx) ∂/∂i (Holton and Hakim 2013, ch. 3; on a
 * conformal map ∂/∂x = m ∂/∂X, on latitude–longitude (1/(a cos φ)) ∂/∂λ). NaN where the grid masks it
 * (within 10° of the equator, f = 0, the border).
 */
export function geostrophicWind(
  grid: HorizontalGrid,
  height: ArrayLike<number>,
  outU: Float32Array = new Float32Array(grid.nx * grid.ny),
  outV: Float32Array = new Float32Array(grid.nx * grid.ny),
): { u: Float32Array; v: Float32Array } {
  const { nx, ny, hx, hy, coriolis, geostrophicValid } = grid;
  fillBorderNaN(nx, ny, outU);
  fillBorderNaN(nx, ny, outV);
  for (let j = 1; j < ny - 1; j++) {
    for (let k = j * nx + 1, end = j * nx + nx - 1; k < end; k++) {
      if (geostrophicValid[k] === 0) {
        outU[k] = Number.NaN;
        outV[k] = Number.NaN;
        continue;
      }
      const gOverF = STANDARD_GRAVITY / coriolis[k];
      outU[k] = (-gOverF * (height[k + nx] - height[k - nx])) / (2 * hy[k]);
      outV[k] = (gOverF * (height[k + 1] - height[k - 1])) / (2 * hx[k]);
    }
  }
  return { u: outU, v: outV };
}

/** Ageostrophic wind V − V_g, component by component (both in the same basis); Holton and Hakim (2013), ch. 3. */
export function ageostrophicWind(
  u: ArrayLike<number>,
  v: ArrayLike<number>,
  geostrophicU: ArrayLike<number>,
  geostrophicV: ArrayLike<number>,
  outU: Float32Array = new Float32Array(u.length),
  outV: Float32Array = new Float32Array(u.length),
): { u: Float32Array; v: Float32Array } {
  for (let k = 0; k < u.length; k++) {
    outU[k] = u[k] - geostrophicU[k];
    outV[k] = v[k] - geostrophicV[k];
  }
  return { u: outU, v: outV };
}
