/**
 * Gaussian smoothing with σ in physical metres, separable: one pass along i, one along j.
 *
 * Each grid line gets its own σ in grid steps from the physical spacing at the line's middle point
 * (on latitude–longitude grids a row's spacing is a cos φ Δλ, so high-latitude rows are smoothed over
 * more points; on projected grids the spacing changes only with the map factor). Lines with σ ≤ 4 steps
 * use a direct kernel truncated at 4σ and normalised to unit sum; longer kernels use the fourth-order
 * recursive filter of Deriche (1993) (recursive-gaussian.ts), whose cost does not grow with σ. The first
 * pass writes its result transposed, so the second pass also reads whole lines from contiguous memory.
 *
 * Beyond the grid edge a line is continued by point reflection, f(−k) = 2 f(0) − f(k), which keeps a
 * linear trend linear: height gradients and wind shear near the edge are not flattened, so geostrophic
 * wind and divergence stay usable up to the outermost interior row. Where the input has NaN, the smoother
 * divides the smoothed values by the smoothed valid-point mask (normalised convolution, with the edge value
 * repeated instead, since a reflected mask could turn negative) and keeps NaN at the missing points.
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";
import { RECURSIVE_COEFFICIENT_COUNT, recursiveGaussianCoefficients, recursiveGaussianLine } from "./recursive-gaussian.ts";
import { GridScratch } from "./grid-scratch.ts";

/** Kernels shorter than this σ (in grid steps) are applied directly. */
const DIRECT_SIGMA_LIMIT = 4;
/** Kernels and reflected padding reach ±4σ, as common Gaussian filter implementations do. */
const TRUNCATE_SIGMAS = 4;
/** Below this σ (grid steps) smoothing changes nothing worth the work: the line is copied. */
const NEGLIGIBLE_SIGMA = 0.2;

type Boundary = "reflect" | "repeat";

/** Smooths `field` with a Gaussian of standard deviation `sigma` (m) into `out` (which may be `field`). */
export function gaussianSmooth(
  grid: HorizontalGrid,
  field: Float32Array,
  sigma: number,
  out: Float32Array = new Float32Array(field.length),
  workspace: GridScratch = new GridScratch(),
): Float32Array {
  if (!(sigma > 0)) {
    out.set(field);
    return out;
  }
  if (!hasMissing(field)) {
    smoothComplete(grid, field, sigma, out, workspace, "reflect");
    return out;
  }
  const values = workspace.float32("smoothValues", field.length);
  const valid = workspace.float32("smoothValid", field.length);
  for (let k = 0; k < field.length; k++) {
    const ok = field[k] === field[k];
    values[k] = ok ? field[k] : 0;
    valid[k] = ok ? 1 : 0;
  }
  const weight = workspace.float32("smoothWeight", field.length);
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

/**
 * One family of grid lines. Element e of line l is read from source[l·length + e] (contiguous) and written to
 * target[e·targetStride + l] (transposed); `spacing` gives the physical step that sets the line's σ.
 */
interface LineSet {
  readonly count: number;
  readonly length: number;
  readonly targetStride: number;
  readonly spacing: (line: number) => number;
}

function smoothComplete(grid: HorizontalGrid, field: Float32Array, sigma: number, out: Float32Array, ws: GridScratch, boundary: Boundary): void {
  const { nx, ny, hx, hy } = grid;
  const transposed = ws.float64("transposed", nx * ny);
  // Rows of the grid, written transposed (column-major) ...
  const rows: LineSet = { count: ny, length: nx, targetStride: ny, spacing: (j) => hx[j * nx + (nx >> 1)] };
  smoothLines(field, rows, sigma, transposed, ws, boundary);
  // ... so the columns are contiguous now; written back row-major.
  const columns: LineSet = { count: nx, length: ny, targetStride: nx, spacing: (i) => hy[(ny >> 1) * nx + i] };
  smoothLines(transposed, columns, sigma, out, ws, boundary);
}

/** σ in grid steps for a spacing; a zero spacing (a pole row) is capped so the filter stays finite. */
function sigmaInSteps(sigma: number, spacing: number, length: number): number {
  return spacing > 0 ? Math.min(sigma / spacing, length) : length;
}

function smoothLines(
  source: Float32Array | Float64Array,
  lines: LineSet,
  sigma: number,
  target: Float32Array | Float64Array,
  ws: GridScratch,
  boundary: Boundary,
): void {
  const { count, length, targetStride } = lines;
  const coefficients = new Float64Array(RECURSIVE_COEFFICIENT_COUNT);
  let kernel: Float64Array = new Float64Array(0);
  let kernelSigma = Number.NaN;
  let recursiveSigma = Number.NaN;
  const result = ws.float64("lineResult", length);
  for (let l = 0; l < count; l++) {
    const start = l * length;
    const s = sigmaInSteps(sigma, lines.spacing(l), length);
    if (s < NEGLIGIBLE_SIGMA) {
      for (let e = 0; e < length; e++) target[e * targetStride + l] = source[start + e];
      continue;
    }
    const pad = boundary === "repeat" && s > DIRECT_SIGMA_LIMIT ? 0 : Math.ceil(TRUNCATE_SIGMAS * s);
    const line = ws.float64("line", length + 2 * pad);
    padLine(source, start, length, pad, line, boundary);
    if (s <= DIRECT_SIGMA_LIMIT) {
      if (s !== kernelSigma) {
        kernel = gaussianKernel(s, pad);
        kernelSigma = s;
      }
      const taps = 2 * pad + 1;
      for (let e = 0; e < length; e++) {
        let sum = 0;
        for (let t = 0; t < taps; t++) sum += kernel[t] * line[e + t];
        result[e] = sum;
      }
    } else {
      if (s !== recursiveSigma) {
        recursiveGaussianCoefficients(s, coefficients);
        recursiveSigma = s;
      }
      const scratch = ws.float64("lineScratch", length + 2 * pad);
      recursiveGaussianLine(line, 0, length + 2 * pad, coefficients, scratch, result, -pad, pad, length);
    }
    for (let e = 0; e < length; e++) target[e * targetStride + l] = result[e];
  }
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

/** Copies one line into `line` with `pad` values either side continued by the boundary rule. */
function padLine(source: Float32Array | Float64Array, start: number, length: number, pad: number, line: Float64Array, boundary: Boundary): void {
  const first = source[start];
  const last = source[start + length - 1];
  for (let e = 0; e < length; e++) line[pad + e] = source[start + e];
  if (pad === 0) return;
  const x: Extension = { startWeight: 0, endWeight: 0, sign: 1, index: 0 };
  for (let p = 0; p < pad; p++) {
    if (boundary === "repeat") {
      line[pad - 1 - p] = first;
      line[pad + length + p] = last;
      continue;
    }
    extend(-(p + 1), length, x);
    line[pad - 1 - p] = x.startWeight * first + x.endWeight * last + x.sign * source[start + x.index];
    extend(length + p, length, x);
    line[pad + length + p] = x.startWeight * first + x.endWeight * last + x.sign * source[start + x.index];
  }
}

function gaussianWeight(offset: number, s: number): number {
  return Math.exp((-0.5 * offset * offset) / (s * s));
}

/** exp(−k²/2σ²) for k = −radius..radius, scaled to unit sum. */
function gaussianKernel(s: number, radius: number): Float64Array {
  const kernel = new Float64Array(2 * radius + 1);
  let total = 0;
  for (let t = -radius; t <= radius; t++) total += kernel[t + radius] = gaussianWeight(t, s);
  for (let t = 0; t < kernel.length; t++) kernel[t] /= total;
  return kernel;
}
