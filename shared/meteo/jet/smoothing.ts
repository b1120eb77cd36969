/**
 * Gaussian smoothing with σ in physical metres, separable: one pass along i, one along j.
 *
 * Each grid line gets its own σ in grid steps from the physical spacing at the line's middle point
 * (on latitude–longitude grids a row's spacing is a cos φ Δλ, so high-latitude rows are smoothed over
 * more points; on projected grids the spacing changes only with the map factor). Lines with σ ≤ 4 steps
 * use a direct kernel truncated at 4σ and normalised to unit sum; longer kernels use the fourth-order
 * recursive filter of Deriche (1993) (recursive-gaussian.ts), whose cost does not grow with σ. Edges repeat the
 * outermost value. Where the input has NaN, the smoother divides the smoothed values by the smoothed
 * valid-point mask (normalised convolution) and keeps NaN at the missing points.
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";
import { RECURSIVE_COEFFICIENT_COUNT, recursiveGaussianCoefficients, recursiveGaussianLine } from "./recursive-gaussian.ts";

/** Kernels shorter than this σ (in grid steps) are applied directly. */
const DIRECT_SIGMA_LIMIT = 4;
/** Direct kernels reach ±4σ, as common Gaussian filter implementations do. */
const TRUNCATE_SIGMAS = 4;
/** Below this σ (grid steps) smoothing changes nothing worth the work: the line is copied. */
const NEGLIGIBLE_SIGMA = 0.2;

/** Reusable scratch space so repeated smoothing of same-sized fields allocates nothing. */
export interface SmoothingWorkspace {
  readonly work: Float64Array;
  readonly causal: Float64Array;
  readonly line: Float64Array;
  readonly rows: Float64Array;
}

export function createSmoothingWorkspace(nx: number, ny: number): SmoothingWorkspace {
  const padding = 2 * Math.ceil(TRUNCATE_SIGMAS * DIRECT_SIGMA_LIMIT) + 2;
  // line: one padded grid line; rows: per-column filter coefficients and four rolling rows.
  return {
    work: new Float64Array(nx * ny),
    causal: new Float64Array(nx * ny),
    line: new Float64Array(Math.max(nx, ny) + padding),
    rows: new Float64Array((RECURSIVE_COEFFICIENT_COUNT + 4) * nx),
  };
}

/**
 * Smooths `field` with a Gaussian of standard deviation `sigma` (m) into `out`.
 * A non-positive σ copies the field.
 */
export function gaussianSmooth(
  grid: HorizontalGrid,
  field: Float32Array,
  sigma: number,
  out: Float32Array = new Float32Array(field.length),
  workspace: SmoothingWorkspace = createSmoothingWorkspace(grid.nx, grid.ny),
): Float32Array {
  if (!(sigma > 0)) {
    out.set(field);
    return out;
  }
  if (!hasMissing(field)) {
    smoothComplete(grid, field, sigma, out, workspace);
    return out;
  }
  const values = new Float32Array(field.length);
  const valid = new Float32Array(field.length);
  for (let k = 0; k < field.length; k++) {
    const ok = field[k] === field[k];
    values[k] = ok ? field[k] : 0;
    valid[k] = ok ? 1 : 0;
  }
  const weight = new Float32Array(field.length);
  smoothComplete(grid, values, sigma, out, workspace);
  smoothComplete(grid, valid, sigma, weight, workspace);
  for (let k = 0; k < field.length; k++) {
    out[k] = valid[k] === 1 && weight[k] > 1e-6 ? out[k] / weight[k] : Number.NaN;
  }
  return out;
}

function hasMissing(field: Float32Array): boolean {
  for (let k = 0; k < field.length; k++) if (field[k] !== field[k]) return true;
  return false;
}

function smoothComplete(grid: HorizontalGrid, field: Float32Array, sigma: number, out: Float32Array, ws: SmoothingWorkspace): void {
  smoothAlongRows(grid, field, sigma, ws);
  smoothAlongColumns(grid, sigma, out, ws);
}

/** σ in grid steps for a spacing; a zero spacing (a pole row) is capped so the filter stays finite. */
function sigmaInSteps(sigma: number, spacing: number, length: number): number {
  return spacing > 0 ? Math.min(sigma / spacing, length) : length;
}

function smoothAlongRows(grid: HorizontalGrid, field: Float32Array, sigma: number, ws: SmoothingWorkspace): void {
  const { nx, ny, hx } = grid;
  const { work, line } = ws;
  const middle = nx >> 1;
  const coefficients = new Float64Array(RECURSIVE_COEFFICIENT_COUNT);
  let kernel: Float64Array = new Float64Array(0);
  let kernelSigma = Number.NaN;
  for (let j = 0; j < ny; j++) {
    const row = j * nx;
    const s = sigmaInSteps(sigma, hx[row + middle], nx);
    if (s < NEGLIGIBLE_SIGMA) {
      for (let i = 0; i < nx; i++) work[row + i] = field[row + i];
    } else if (s <= DIRECT_SIGMA_LIMIT) {
      const radius = Math.ceil(TRUNCATE_SIGMAS * s);
      if (s !== kernelSigma) {
        kernel = gaussianKernel(s, radius);
        kernelSigma = s;
      }
      for (let p = 0; p < nx + 2 * radius; p++) line[p] = field[row + clampIndex(p - radius, nx)];
      for (let i = 0; i < nx; i++) {
        let sum = 0;
        for (let t = 0; t <= 2 * radius; t++) sum += kernel[t] * line[i + t];
        work[row + i] = sum;
      }
    } else {
      recursiveGaussianCoefficients(s, coefficients);
      recursiveGaussianLine(field, row, nx, coefficients, line, work, row);
    }
  }
}

function smoothAlongColumns(grid: HorizontalGrid, sigma: number, out: Float32Array, ws: SmoothingWorkspace): void {
  const { nx, ny, hy } = grid;
  const middleRow = (ny >> 1) * nx;
  let largest = 0;
  for (let i = 0; i < nx; i++) largest = Math.max(largest, sigmaInSteps(sigma, hy[middleRow + i], ny));
  if (largest < NEGLIGIBLE_SIGMA) {
    for (let k = 0; k < nx * ny; k++) out[k] = ws.work[k];
  } else if (largest <= DIRECT_SIGMA_LIMIT) {
    directColumns(grid, sigma, largest, out, ws);
  } else {
    recursiveColumns(grid, sigma, out, ws);
  }
}

function clampIndex(index: number, length: number): number {
  return index < 0 ? 0 : index >= length ? length - 1 : index;
}

function gaussianWeight(offset: number, s: number, radius: number): number {
  return offset > radius ? 0 : Math.exp((-0.5 * offset * offset) / (s * s));
}

/** Unnormalised exp(−k²/2σ²) for k = −radius..radius, then scaled to unit sum. */
function gaussianKernel(s: number, radius: number): Float64Array {
  const kernel = new Float64Array(2 * radius + 1);
  let total = 0;
  for (let t = -radius; t <= radius; t++) total += kernel[t + radius] = gaussianWeight(Math.abs(t), s, radius);
  for (let t = 0; t < kernel.length; t++) kernel[t] /= total;
  return kernel;
}

/** Direct convolution down the columns, swept row by row so memory is read in order. */
function directColumns(grid: HorizontalGrid, sigma: number, largest: number, out: Float32Array, ws: SmoothingWorkspace): void {
  const { nx, ny, hy } = grid;
  const radius = Math.ceil(TRUNCATE_SIGMAS * largest);
  const width = 2 * radius + 1;
  const weights = new Float64Array(width * nx);
  const middleRow = (ny >> 1) * nx;
  for (let i = 0; i < nx; i++) {
    const s = Math.max(sigmaInSteps(sigma, hy[middleRow + i], ny), NEGLIGIBLE_SIGMA);
    const ownRadius = Math.ceil(TRUNCATE_SIGMAS * s);
    let total = 0;
    for (let t = -radius; t <= radius; t++) total += weights[(t + radius) * nx + i] = gaussianWeight(Math.abs(t), s, ownRadius);
    for (let t = 0; t < width; t++) weights[t * nx + i] /= total;
  }
  const work = ws.work;
  const sum = ws.rows.subarray(0, nx);
  for (let j = 0; j < ny; j++) {
    sum.fill(0);
    for (let t = 0; t < width; t++) {
      const source = clampIndex(j + t - radius, ny) * nx;
      const w = t * nx;
      for (let i = 0; i < nx; i++) sum[i] += weights[w + i] * work[source + i];
    }
    for (let i = 0; i < nx; i++) out[j * nx + i] = sum[i];
  }
}

/** The recursive filter down every column at once, swept row by row, with per-column coefficients. */
function recursiveColumns(grid: HorizontalGrid, sigma: number, out: Float32Array, ws: SmoothingWorkspace): void {
  const { nx, ny, hy } = grid;
  const { work, causal, rows } = ws;
  const middleRow = (ny >> 1) * nx;
  const c = new Float64Array(RECURSIVE_COEFFICIENT_COUNT);
  // Coefficient-major layout: coefficient q of column i at rows[q * nx + i].
  for (let i = 0; i < nx; i++) {
    recursiveGaussianCoefficients(Math.max(sigmaInSteps(sigma, hy[middleRow + i], ny), 1), c);
    for (let q = 0; q < RECURSIVE_COEFFICIENT_COUNT; q++) rows[q * nx + i] = c[q];
  }
  const coefficient = (q: number) => rows.subarray(q * nx, (q + 1) * nx);
  const [p0, p1, p2, p3, q1, q2, q3, q4, a1, a2, a3, a4, causalGain, anticausalGain, norm] = Array.from({ length: 15 }, (_, q) => coefficient(q));
  const state = rows.subarray(RECURSIVE_COEFFICIENT_COUNT * nx, (RECURSIVE_COEFFICIENT_COUNT + 4) * nx);
  let y1 = state.subarray(0, nx);
  let y2 = state.subarray(nx, 2 * nx);
  let y3 = state.subarray(2 * nx, 3 * nx);
  let y4 = state.subarray(3 * nx, 4 * nx);
  const rowAt = (j: number) => (j < 0 ? 0 : j >= ny ? ny - 1 : j) * nx;

  // Causal pass into `causal`; the input rows before the first repeat it (steady state).
  for (let i = 0; i < nx; i++) y1[i] = y2[i] = y3[i] = y4[i] = work[i] * causalGain[i];
  for (let j = 0; j < ny; j++) {
    const r0 = j * nx;
    const r1 = rowAt(j - 1);
    const r2 = rowAt(j - 2);
    const r3 = rowAt(j - 3);
    for (let i = 0; i < nx; i++) {
      const y =
        p0[i] * work[r0 + i] + p1[i] * work[r1 + i] + p2[i] * work[r2 + i] + p3[i] * work[r3 + i] -
        q1[i] * y1[i] - q2[i] * y2[i] - q3[i] * y3[i] - q4[i] * y4[i];
      causal[r0 + i] = y;
      y4[i] = y;
    }
    const newest = y4;
    y4 = y3;
    y3 = y2;
    y2 = y1;
    y1 = newest;
  }
  // Anti-causal pass, summed with the causal one into the output.
  const last = (ny - 1) * nx;
  for (let i = 0; i < nx; i++) y1[i] = y2[i] = y3[i] = y4[i] = work[last + i] * anticausalGain[i];
  for (let j = ny - 1; j >= 0; j--) {
    const r0 = j * nx;
    const r1 = rowAt(j + 1);
    const r2 = rowAt(j + 2);
    const r3 = rowAt(j + 3);
    const r4 = rowAt(j + 4);
    for (let i = 0; i < nx; i++) {
      const y =
        a1[i] * work[r1 + i] + a2[i] * work[r2 + i] + a3[i] * work[r3 + i] + a4[i] * work[r4 + i] -
        q1[i] * y1[i] - q2[i] * y2[i] - q3[i] * y3[i] - q4[i] * y4[i];
      out[r0 + i] = (causal[r0 + i] + y) / norm[i];
      y4[i] = y;
    }
    const newest = y4;
    y4 = y3;
    y3 = y2;
    y2 = y1;
    y1 = newest;
  }
}
