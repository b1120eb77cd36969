/**
 * Values between grid points, for the axis tracer and the curvature measure. Positions are fractional
 * indices (i, j).
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";

/** True when fractional (i, j) lies on the grid (inclusive of its edges). */
export function insideGrid(grid: HorizontalGrid, i: number, j: number): boolean {
  return i >= 0 && j >= 0 && i <= grid.nx - 1 && j <= grid.ny - 1;
}

/** Bilinear value of `field` at fractional (i, j), which must lie on the grid; NaN propagates. */
export function sampleBilinear(grid: HorizontalGrid, field: ArrayLike<number>, i: number, j: number): number {
  const { nx, ny } = grid;
  let i0 = Math.floor(i);
  let j0 = Math.floor(j);
  if (i0 >= nx - 1) i0 = nx - 2;
  if (j0 >= ny - 1) j0 = ny - 2;
  const fi = i - i0;
  const fj = j - j0;
  const k = j0 * nx + i0;
  const south = field[k] + fi * (field[k + 1] - field[k]);
  const north = field[k + nx] + fi * (field[k + nx + 1] - field[k + nx]);
  return south + fj * (north - south);
}

/** Keys (1981) cubic-convolution weight (a = −0.5) for a tap at distance t (in steps). */
function cubicWeight(t: number): number {
  const a = Math.abs(t);
  if (a <= 1) return (1.5 * a - 2.5) * a * a + 1;
  if (a < 2) return ((-0.5 * a + 2.5) * a - 4) * a + 2;
  return 0;
}

/**
 * Bicubic value of `field` at fractional (i, j) by cubic convolution (Keys 1981), taps clamped at the edges.
 * Unlike bilinear interpolation its gradient is continuous, so the maximum found along a line does not
 * snap toward grid lines; the axis tracer uses it for the speed ridge.
 */
export function sampleBicubic(grid: HorizontalGrid, field: ArrayLike<number>, i: number, j: number): number {
  const { nx, ny } = grid;
  const i0 = Math.floor(i);
  const j0 = Math.floor(j);
  const fi = i - i0;
  const fj = j - j0;
  let total = 0;
  for (let b = -1; b <= 2; b++) {
    const row = Math.min(ny - 1, Math.max(0, j0 + b)) * nx;
    const wj = cubicWeight(fj - b);
    let rowSum = 0;
    for (let a = -1; a <= 2; a++) {
      const column = Math.min(nx - 1, Math.max(0, i0 + a));
      rowSum += cubicWeight(fi - a) * field[row + column];
    }
    total += wj * rowSum;
  }
  return total;
}
