/**
 * Gaussian smoothing with σ in physical metres, separable: one pass along i, one along j.
 *
 * Each grid line gets its own σ in grid steps from the physical spacing at the line's middle point
 * (on latitude–longitude grids a row's spacing is a cos φ Δλ, so high-latitude rows are smoothed over
 * more points; on projected grids the spacing changes only with the map factor). Lines with σ ≤ 4 steps
 * use a direct kernel truncated at 4σ and normalised to unit sum; longer kernels use the fourth-order
 * recursive filter of Deriche (1993) (recursive-gaussian.ts), whose cost does not grow with σ.
 *
 * Beyond the grid edge a line is continued by point reflection, f(−k) = 2 f(0) − f(k), which keeps a
 * linear trend linear: height gradients and wind shear near the edge are not flattened, so geostrophic
 * wind and divergence stay usable up to the outermost interior row. Where the input has NaN, the smoother
 * divides the smoothed values by the smoothed valid-point mask (normalised convolution, with the edge value
 * repeated instead, since a reflected mask could turn negative) and keeps NaN at the missing points.
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";
import { RECURSIVE_COEFFICIENT_COUNT, recursiveGaussianCoefficients, recursiveGaussianLine } from "./recursive-gaussian.ts";

/** Kernels shorter than this σ (in grid steps) are applied directly. */
const DIRECT_SIGMA_LIMIT = 4;
/** Kernels and reflected padding reach ±4σ, as common Gaussian filter implementations do. */
const TRUNCATE_SIGMAS = 4;
/** Below this σ (grid steps) smoothing changes nothing worth the work: the line is copied. */
const NEGLIGIBLE_SIGMA = 0.2;

type Boundary = "reflect" | "repeat";

/** Scratch space reused across calls, so smoothing many same-sized fields allocates only once. */
export class SmoothingWorkspace {
  private readonly buffers = new Map<string, Float64Array>();

  /** A Float64Array of at least `length` values, kept for the next call (contents undefined). */
  buffer(name: string, length: number): Float64Array {
    const existing = this.buffers.get(name);
    if (existing && existing.length >= length) return existing;
    const created = new Float64Array(length);
    this.buffers.set(name, created);
    return created;
  }
}

export function createSmoothingWorkspace(): SmoothingWorkspace {
  return new SmoothingWorkspace();
}

/** Smooths `field` with a Gaussian of standard deviation `sigma` (m) into `out` (which may be `field`). */
export function gaussianSmooth(
  grid: HorizontalGrid,
  field: Float32Array,
  sigma: number,
  out: Float32Array = new Float32Array(field.length),
  workspace: SmoothingWorkspace = new SmoothingWorkspace(),
): Float32Array {
  if (!(sigma > 0)) {
    out.set(field);
    return out;
  }
  if (!hasMissing(field)) {
    smoothComplete(grid, field, sigma, out, workspace, "reflect");
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
  smoothComplete(grid, values, sigma, out, workspace, "repeat");
  smoothComplete(grid, valid, sigma, weight, workspace, "repeat");
  for (let k = 0; k < field.length; k++) {
    out[k] = valid[k] === 1 && weight[k] > 1e-6 ? out[k] / weight[k] : Number.NaN;
  }
  return out;
}

function hasMissing(field: Float32Array): boolean {
  for (let k = 0; k < field.length; k++) if (field[k] !== field[k]) return true;
  return false;
}

function smoothComplete(grid: HorizontalGrid, field: Float32Array, sigma: number, out: Float32Array, ws: SmoothingWorkspace, boundary: Boundary): void {
  const work = ws.buffer("work", grid.nx * grid.ny);
  smoothAlongRows(grid, field, sigma, work, ws, boundary);
  smoothAlongColumns(grid, sigma, work, out, ws, boundary);
}

/** σ in grid steps for a spacing; a zero spacing (a pole row) is capped so the filter stays finite. */
function sigmaInSteps(sigma: number, spacing: number, length: number): number {
  return spacing > 0 ? Math.min(sigma / spacing, length) : length;
}

/**
 * How the value at an index beyond [0, length) is built by repeated point reflection across the ends:
 * value = startWeight·f(0) + endWeight·f(length − 1) + sign·f(index). Repeating the reflection keeps even
 * a short line's linear trend linear when the padding is longer than the line.
 */
interface Extension {
  startWeight: number;
  endWeight: number;
  sign: number;
  index: number;
}

function extend(index: number, length: number, out: Extension): Extension {
  out.startWeight = 0;
  out.endWeight = 0;
  out.sign = 1;
  let at = index;
  while (at < 0 || at >= length) {
    if (at < 0) {
      out.startWeight += 2 * out.sign;
      at = -at;
    } else {
      out.endWeight += 2 * out.sign;
      at = 2 * (length - 1) - at;
    }
    out.sign = -out.sign;
  }
  out.index = at;
  return out;
}

/** Copies row j of `field` into `line` with `pad` values either side continued by the boundary rule. */
function padRow(field: Float32Array, row: number, nx: number, pad: number, line: Float64Array, boundary: Boundary): void {
  const first = field[row];
  const last = field[row + nx - 1];
  const e: Extension = { startWeight: 0, endWeight: 0, sign: 1, index: 0 };
  for (let p = 0; p < nx + 2 * pad; p++) {
    const index = p - pad;
    if (index >= 0 && index < nx) {
      line[p] = field[row + index];
    } else if (boundary === "repeat") {
      line[p] = index < 0 ? first : last;
    } else {
      extend(index, nx, e);
      line[p] = e.startWeight * first + e.endWeight * last + e.sign * field[row + e.index];
    }
  }
}

function smoothAlongRows(grid: HorizontalGrid, field: Float32Array, sigma: number, work: Float64Array, ws: SmoothingWorkspace, boundary: Boundary): void {
  const { nx, ny, hx } = grid;
  const middle = nx >> 1;
  const coefficients = new Float64Array(RECURSIVE_COEFFICIENT_COUNT);
  let kernel: Float64Array = new Float64Array(0);
  let kernelSigma = Number.NaN;
  for (let j = 0; j < ny; j++) {
    const row = j * nx;
    const s = sigmaInSteps(sigma, hx[row + middle], nx);
    if (s < NEGLIGIBLE_SIGMA) {
      for (let i = 0; i < nx; i++) work[row + i] = field[row + i];
      continue;
    }
    const pad = Math.ceil(TRUNCATE_SIGMAS * s);
    const line = ws.buffer("line", nx + 2 * pad);
    padRow(field, row, nx, pad, line, boundary);
    if (s <= DIRECT_SIGMA_LIMIT) {
      if (s !== kernelSigma) {
        kernel = gaussianKernel(s, pad);
        kernelSigma = s;
      }
      for (let i = 0; i < nx; i++) {
        let sum = 0;
        for (let t = 0; t <= 2 * pad; t++) sum += kernel[t] * line[i + t];
        work[row + i] = sum;
      }
    } else {
      recursiveGaussianCoefficients(s, coefficients);
      const scratch = ws.buffer("lineScratch", nx + 2 * pad);
      recursiveGaussianLine(line, 0, nx + 2 * pad, coefficients, scratch, work, row - pad, pad, nx);
    }
  }
}

function smoothAlongColumns(grid: HorizontalGrid, sigma: number, work: Float64Array, out: Float32Array, ws: SmoothingWorkspace, boundary: Boundary): void {
  const { nx, ny, hy } = grid;
  const middleRow = (ny >> 1) * nx;
  let largest = 0;
  for (let i = 0; i < nx; i++) largest = Math.max(largest, sigmaInSteps(sigma, hy[middleRow + i], ny));
  if (largest < NEGLIGIBLE_SIGMA) {
    for (let k = 0; k < nx * ny; k++) out[k] = work[k];
  } else if (largest <= DIRECT_SIGMA_LIMIT) {
    directColumns(grid, sigma, largest, work, out, ws, boundary);
  } else {
    recursiveColumns(grid, sigma, largest, work, out, ws, boundary);
  }
}

function gaussianWeight(offset: number, s: number, radius: number): number {
  return offset > radius ? 0 : Math.exp((-0.5 * offset * offset) / (s * s));
}

/** exp(−k²/2σ²) for k = −radius..radius, scaled to unit sum. */
function gaussianKernel(s: number, radius: number): Float64Array {
  const kernel = new Float64Array(2 * radius + 1);
  let total = 0;
  for (let t = -radius; t <= radius; t++) total += kernel[t + radius] = gaussianWeight(Math.abs(t), s, radius);
  for (let t = 0; t < kernel.length; t++) kernel[t] /= total;
  return kernel;
}

/** Direct convolution down the columns, swept row by row so memory is read in order. */
function directColumns(
  grid: HorizontalGrid,
  sigma: number,
  largest: number,
  work: Float64Array,
  out: Float32Array,
  ws: SmoothingWorkspace,
  boundary: Boundary,
): void {
  const { nx, ny, hy } = grid;
  const radius = Math.ceil(TRUNCATE_SIGMAS * largest);
  const width = 2 * radius + 1;
  const weights = ws.buffer("columnWeights", width * nx);
  const middleRow = (ny >> 1) * nx;
  for (let i = 0; i < nx; i++) {
    const s = Math.max(sigmaInSteps(sigma, hy[middleRow + i], ny), NEGLIGIBLE_SIGMA);
    const ownRadius = Math.ceil(TRUNCATE_SIGMAS * s);
    let total = 0;
    for (let t = -radius; t <= radius; t++) total += weights[(t + radius) * nx + i] = gaussianWeight(Math.abs(t), s, ownRadius);
    for (let t = 0; t < width; t++) weights[t * nx + i] /= total;
  }
  const sum = ws.buffer("columnSum", nx);
  const e: Extension = { startWeight: 0, endWeight: 0, sign: 1, index: 0 };
  for (let j = 0; j < ny; j++) {
    sum.fill(0, 0, nx);
    for (let t = 0; t < width; t++) {
      const source = j + t - radius;
      const w = t * nx;
      if (source >= 0 && source < ny) {
        const from = source * nx;
        for (let i = 0; i < nx; i++) sum[i] += weights[w + i] * work[from + i];
      } else if (boundary === "repeat") {
        const edge = (source < 0 ? 0 : ny - 1) * nx;
        for (let i = 0; i < nx; i++) sum[i] += weights[w + i] * work[edge + i];
      } else {
        extend(source, ny, e);
        const last = (ny - 1) * nx;
        const from = e.index * nx;
        for (let i = 0; i < nx; i++) sum[i] += weights[w + i] * (e.startWeight * work[i] + e.endWeight * work[last + i] + e.sign * work[from + i]);
      }
    }
    for (let i = 0; i < nx; i++) out[j * nx + i] = sum[i];
  }
}

/**
 * The recursive filter down every column at once, swept row by row with per-column coefficients, over the
 * rows padded by the boundary rule (so the causal and anti-causal passes start from steady state).
 */
function recursiveColumns(
  grid: HorizontalGrid,
  sigma: number,
  largest: number,
  work: Float64Array,
  out: Float32Array,
  ws: SmoothingWorkspace,
  boundary: Boundary,
): void {
  const { nx, ny, hy } = grid;
  const pad = boundary === "repeat" ? 0 : Math.ceil(TRUNCATE_SIGMAS * largest);
  const rowsPadded = ny + 2 * pad;
  const padded = ws.buffer("paddedColumns", rowsPadded * nx);
  padded.set(work.subarray(0, nx * ny), pad * nx);
  const e: Extension = { startWeight: 0, endWeight: 0, sign: 1, index: 0 };
  const last = (ny - 1) * nx;
  for (let p = 0; p < pad; p++) {
    for (const gridRow of [-(p + 1), ny + p]) {
      extend(gridRow, ny, e);
      const target = (gridRow + pad) * nx;
      const from = e.index * nx;
      for (let i = 0; i < nx; i++) padded[target + i] = e.startWeight * work[i] + e.endWeight * work[last + i] + e.sign * work[from + i];
    }
  }
  const coefficientRows = ws.buffer("columnCoefficients", RECURSIVE_COEFFICIENT_COUNT * nx);
  const c = new Float64Array(RECURSIVE_COEFFICIENT_COUNT);
  const middleRow = (ny >> 1) * nx;
  // Coefficient-major layout: coefficient q of column i at coefficientRows[q * nx + i].
  for (let i = 0; i < nx; i++) {
    recursiveGaussianCoefficients(Math.max(sigmaInSteps(sigma, hy[middleRow + i], ny), 1), c);
    for (let q = 0; q < RECURSIVE_COEFFICIENT_COUNT; q++) coefficientRows[q * nx + i] = c[q];
  }
  const causal = ws.buffer("causalColumns", rowsPadded * nx);
  const state = ws.buffer("columnState", 4 * nx);
  sweepColumns(nx, rowsPadded, padded, coefficientRows, causal, state);
  sweepColumnsBack(nx, rowsPadded, padded, coefficientRows, causal, state, out, pad, ny);
}

/** Causal pass down the padded rows into `causal`; rows before the first repeat it (steady state). */
function sweepColumns(nx: number, rows: number, x: Float64Array, coefficients: Float64Array, causal: Float64Array, state: Float64Array): void {
  const at = (q: number) => coefficients.subarray(q * nx, (q + 1) * nx);
  const [p0, p1, p2, p3, q1, q2, q3, q4] = [0, 1, 2, 3, 4, 5, 6, 7].map(at);
  const gain = at(12);
  let y1 = state.subarray(0, nx);
  let y2 = state.subarray(nx, 2 * nx);
  let y3 = state.subarray(2 * nx, 3 * nx);
  let y4 = state.subarray(3 * nx, 4 * nx);
  for (let i = 0; i < nx; i++) y1[i] = y2[i] = y3[i] = y4[i] = x[i] * gain[i];
  for (let j = 0; j < rows; j++) {
    const r0 = j * nx;
    const r1 = Math.max(j - 1, 0) * nx;
    const r2 = Math.max(j - 2, 0) * nx;
    const r3 = Math.max(j - 3, 0) * nx;
    for (let i = 0; i < nx; i++) {
      const y = p0[i] * x[r0 + i] + p1[i] * x[r1 + i] + p2[i] * x[r2 + i] + p3[i] * x[r3 + i] - q1[i] * y1[i] - q2[i] * y2[i] - q3[i] * y3[i] - q4[i] * y4[i];
      causal[r0 + i] = y;
      y4[i] = y;
    }
    const newest = y4;
    y4 = y3;
    y3 = y2;
    y2 = y1;
    y1 = newest;
  }
}

/** Anti-causal pass up the padded rows, summed with the causal pass; only the grid's own rows are written. */
function sweepColumnsBack(
  nx: number,
  rows: number,
  x: Float64Array,
  coefficients: Float64Array,
  causal: Float64Array,
  state: Float64Array,
  out: Float32Array,
  pad: number,
  ny: number,
): void {
  const at = (q: number) => coefficients.subarray(q * nx, (q + 1) * nx);
  const [q1, q2, q3, q4, a1, a2, a3, a4] = [4, 5, 6, 7, 8, 9, 10, 11].map(at);
  const gain = at(13);
  const norm = at(14);
  let y1 = state.subarray(0, nx);
  let y2 = state.subarray(nx, 2 * nx);
  let y3 = state.subarray(2 * nx, 3 * nx);
  let y4 = state.subarray(3 * nx, 4 * nx);
  const lastRow = (rows - 1) * nx;
  for (let i = 0; i < nx; i++) y1[i] = y2[i] = y3[i] = y4[i] = x[lastRow + i] * gain[i];
  for (let j = rows - 1; j >= 0; j--) {
    const r0 = j * nx;
    const r1 = Math.min(j + 1, rows - 1) * nx;
    const r2 = Math.min(j + 2, rows - 1) * nx;
    const r3 = Math.min(j + 3, rows - 1) * nx;
    const r4 = Math.min(j + 4, rows - 1) * nx;
    const gridRow = j - pad;
    const keep = gridRow >= 0 && gridRow < ny;
    const target = gridRow * nx;
    for (let i = 0; i < nx; i++) {
      const y = a1[i] * x[r1 + i] + a2[i] * x[r2 + i] + a3[i] * x[r3 + i] + a4[i] * x[r4 + i] - q1[i] * y1[i] - q2[i] * y2[i] - q3[i] * y3[i] - q4[i] * y4[i];
      if (keep) out[target + i] = (causal[r0 + i] + y) / norm[i];
      y4[i] = y;
    }
    const newest = y4;
    y4 = y3;
    y3 = y2;
    y2 = y1;
    y1 = newest;
  }
}
