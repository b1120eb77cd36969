/**
 * Second-order centred horizontal derivatives on a grid with scale factors hx, hy (see horizontal-grid.ts).
 * Winds must be in the grid's own axes (wind-basis.ts). The outermost row and column, and points the grid
 * masks (poleward of 89° on latitude–longitude grids), are NaN. Outputs are caller-owned or allocated once
 * per call; nothing is allocated per point.
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";

/** Fills the outermost rows and columns with NaN. */
export function fillBorderNaN(nx: number, ny: number, out: Float32Array): void {
  out.fill(Number.NaN, 0, nx);
  out.fill(Number.NaN, (ny - 1) * nx, ny * nx);
  for (let j = 1; j < ny - 1; j++) {
    out[j * nx] = Number.NaN;
    out[j * nx + nx - 1] = Number.NaN;
  }
}

/**
 * Gradient of a scalar, ∂F/∂x = (1/hx) ∂F/∂i, ∂F/∂y = (1/hy) ∂F/∂j: on a conformal map this is
 * m ∂F/∂X (Haltiner and Williams 1980), on latitude–longitude (1/(a cos φ)) ∂F/∂λ and (1/a) ∂F/∂φ
 * (Holton and Hakim 2013).
 */
export function gradient(
  grid: HorizontalGrid,
  field: ArrayLike<number>,
  outX: Float32Array = new Float32Array(grid.nx * grid.ny),
  outY: Float32Array = new Float32Array(grid.nx * grid.ny),
): { x: Float32Array; y: Float32Array } {
  const { nx, ny, hx, hy, derivativeValid } = grid;
  fillBorderNaN(nx, ny, outX);
  fillBorderNaN(nx, ny, outY);
  for (let j = 1; j < ny - 1; j++) {
    for (let k = j * nx + 1, end = j * nx + nx - 1; k < end; k++) {
      if (derivativeValid[k] === 0) {
        outX[k] = Number.NaN;
        outY[k] = Number.NaN;
        continue;
      }
      outX[k] = (field[k + 1] - field[k - 1]) / (2 * hx[k]);
      outY[k] = (field[k + nx] - field[k - nx]) / (2 * hy[k]);
    }
  }
  return { x: outX, y: outY };
}

/**
 * Horizontal divergence in flux form, δ = (1/(hx hy)) [∂(hy u)/∂i + ∂(hx v)/∂j]: on a conformal map
 * δ = m² [∂(u/m)/∂X + ∂(v/m)/∂Y] (Haltiner and Williams 1980), on latitude–longitude
 * δ = (1/(a cos φ)) [∂u/∂λ + ∂(v cos φ)/∂φ] (Holton and Hakim 2013).
 */
export function divergence(
  grid: HorizontalGrid,
  u: ArrayLike<number>,
  v: ArrayLike<number>,
  out: Float32Array = new Float32Array(grid.nx * grid.ny),
): Float32Array {
  return fluxForm(grid, u, v, 1, out);
}

/**
 * Relative vorticity in circulation form, ζ = (1/(hx hy)) [∂(hy v)/∂i − ∂(hx u)/∂j]: on a conformal map
 * ζ = m² [∂(v/m)/∂X − ∂(u/m)/∂Y] (Haltiner and Williams 1980), on latitude–longitude
 * ζ = (1/(a cos φ)) [∂v/∂λ − ∂(u cos φ)/∂φ] (Holton and Hakim 2013).
 */
export function relativeVorticity(
  grid: HorizontalGrid,
  u: ArrayLike<number>,
  v: ArrayLike<number>,
  out: Float32Array = new Float32Array(grid.nx * grid.ny),
): Float32Array {
  return fluxForm(grid, v, u, -1, out);
}

/** (1/(hx hy)) [∂(hy a)/∂i + sign · ∂(hx b)/∂j] by centred differences: divergence and vorticity share it. */
function fluxForm(grid: HorizontalGrid, a: ArrayLike<number>, b: ArrayLike<number>, sign: 1 | -1, out: Float32Array): Float32Array {
  const { nx, ny, hx, hy, derivativeValid } = grid;
  fillBorderNaN(nx, ny, out);
  for (let j = 1; j < ny - 1; j++) {
    for (let k = j * nx + 1, end = j * nx + nx - 1; k < end; k++) {
      if (derivativeValid[k] === 0) {
        out[k] = Number.NaN;
        continue;
      }
      const alongI = hy[k + 1] * a[k + 1] - hy[k - 1] * a[k - 1];
      const alongJ = hx[k + nx] * b[k + nx] - hx[k - nx] * b[k - nx];
      out[k] = (alongI + sign * alongJ) / (2 * hx[k] * hy[k]);
    }
  }
  return out;
}

/** The four components of the horizontal velocity-gradient tensor in the local grid axes (s⁻¹). */
export interface VelocityGradient {
  readonly ux: Float32Array;
  readonly uy: Float32Array;
  readonly vx: Float32Array;
  readonly vy: Float32Array;
}

export function allocateVelocityGradient(pointCount: number): VelocityGradient {
  return {
    ux: new Float32Array(pointCount),
    uy: new Float32Array(pointCount),
    vx: new Float32Array(pointCount),
    vy: new Float32Array(pointCount),
  };
}

/**
 * Velocity-gradient tensor with the metric terms of orthogonal curvilinear coordinates:
 *   ux = (1/hx) ∂u/∂i + v T_x,  vy = (1/hy) ∂v/∂j + u T_y,
 *   vx = (1/hx) ∂v/∂i − u T_x,  uy = (1/hy) ∂u/∂j − v T_y,
 * with T_x = (1/(hx hy)) ∂hx/∂j, T_y = (1/(hx hy)) ∂hy/∂i. On latitude–longitude T_x = −tan φ / a, which
 * gives the familiar −v tan φ / a term of the spherical divergence (Holton and Hakim 2013). With these
 * terms ux + vy and vx − uy equal the divergence and vorticity above, and the streamline curvature built
 * from the tensor is the curvature on the Earth's surface rather than on the map.
 */
export function velocityGradient(
  grid: HorizontalGrid,
  u: ArrayLike<number>,
  v: ArrayLike<number>,
  out: VelocityGradient = allocateVelocityGradient(grid.nx * grid.ny),
): VelocityGradient {
  const { nx, ny, hx, hy, turnOfX, turnOfY, derivativeValid } = grid;
  const { ux, uy, vx, vy } = out;
  for (const a of [ux, uy, vx, vy]) fillBorderNaN(nx, ny, a);
  for (let j = 1; j < ny - 1; j++) {
    for (let k = j * nx + 1, end = j * nx + nx - 1; k < end; k++) {
      if (derivativeValid[k] === 0) {
        ux[k] = uy[k] = vx[k] = vy[k] = Number.NaN;
        continue;
      }
      const rx = 1 / (2 * hx[k]);
      const ry = 1 / (2 * hy[k]);
      const uk = u[k];
      const vk = v[k];
      ux[k] = (u[k + 1] - u[k - 1]) * rx + vk * turnOfX[k];
      vx[k] = (v[k + 1] - v[k - 1]) * rx - uk * turnOfX[k];
      uy[k] = (u[k + nx] - u[k - nx]) * ry - vk * turnOfY[k];
      vy[k] = (v[k + nx] - v[k - nx]) * ry + uk * turnOfY[k];
    }
  }
  return out;
}
