/**
 * Traces a jet axis from a core downstream and upstream on the smoothed wind.
 *
 * Each step is a midpoint (second-order Runge–Kutta) predictor of length `axisStepFraction` × the local grid
 * length along ±t̂, then a corrector that samples S along the local normal within ±`axisSearchDistance`,
 * takes the maximum (refined by a parabola through its neighbours) and moves the point there, so the axis
 * follows the speed ridge rather than a streamline. Tracing stops below `axisSpeed`, beyond `axisMaxLength`,
 * when a step turns more than 90° from the previous one, or at the grid edge.
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";
import type { JetSettings } from "./jet-settings.ts";
import type { AxisStop, JetAxis, JetCore } from "./jet-types.ts";
import { insideGrid, sampleBicubic, sampleBilinear } from "./grid-sampling.ts";
import { parabolaPeak } from "./cores.ts";

type AxisSettings = Pick<JetSettings, "axisSpeed" | "axisMaxLength" | "axisStepFraction" | "axisSearchDistance">;

/** Samples along the normal in the corrector (odd, so the predicted point itself is one of them). */
const NORMAL_SAMPLES = 17;
/** Safety cap on steps per direction, far above any real axis. */
const MAX_STEPS = 100_000;

/** Smoothed wind in grid axes and its speed. */
export interface TracingFields {
  readonly u: Float32Array;
  readonly v: Float32Array;
  readonly speed: Float32Array;
}

/** Growable vertex list for one direction (allocated per trace, not per point). */
class VertexTrail {
  i: Float64Array = new Float64Array(64);
  j: Float64Array = new Float64Array(64);
  s: Float64Array = new Float64Array(64);
  count = 0;
  push(i: number, j: number, s: number): void {
    if (this.count === this.i.length) {
      this.i = grow(this.i);
      this.j = grow(this.j);
      this.s = grow(this.s);
    }
    this.i[this.count] = i;
    this.j[this.count] = j;
    this.s[this.count] = s;
    this.count++;
  }
}

function grow(a: Float64Array): Float64Array {
  const bigger = new Float64Array(a.length * 2);
  bigger.set(a);
  return bigger;
}

/** Mutable scratch for one step, so the loop allocates nothing. */
interface StepState {
  i: number;
  j: number;
}

export function traceJetAxis(grid: HorizontalGrid, fields: TracingFields, core: JetCore, settings: AxisSettings): JetAxis {
  const downstream = new VertexTrail();
  const upstream = new VertexTrail();
  const downstreamStop = traceOneWay(grid, fields, core, +1, settings, downstream);
  const upstreamStop = traceOneWay(grid, fields, core, -1, settings, upstream);
  return assembleAxis(grid, core, upstream, downstream, upstreamStop, downstreamStop);
}

function traceOneWay(
  grid: HorizontalGrid,
  fields: TracingFields,
  core: JetCore,
  direction: 1 | -1,
  settings: AxisSettings,
  trail: VertexTrail,
): AxisStop {
  const { u, v, speed } = fields;
  let i = core.i;
  let j = core.j;
  let s = 0;
  let previousX = Number.NaN;
  let previousY = Number.NaN;
  const next: StepState = { i: 0, j: 0 };
  for (let step = 0; step < MAX_STEPS; step++) {
    const hxHere = sampleBilinear(grid, grid.hx, i, j);
    const hyHere = sampleBilinear(grid, grid.hy, i, j);
    const length = settings.axisStepFraction * Math.min(hxHere, hyHere);
    // Predictor: half step along the wind, then a full step along the wind found there.
    let ue = sampleBilinear(grid, u, i, j);
    let ve = sampleBilinear(grid, v, i, j);
    let sp = Math.hypot(ue, ve);
    if (!(sp > 0)) return "calm";
    const midI = i + (0.5 * length * direction * ue) / (sp * hxHere);
    const midJ = j + (0.5 * length * direction * ve) / (sp * hyHere);
    if (!insideGrid(grid, midI, midJ)) return "edge";
    ue = sampleBilinear(grid, u, midI, midJ);
    ve = sampleBilinear(grid, v, midI, midJ);
    sp = Math.hypot(ue, ve);
    if (!(sp > 0)) return "calm";
    const tx = (direction * ue) / sp;
    const ty = (direction * ve) / sp;
    next.i = i + (length * tx) / hxHere;
    next.j = j + (length * ty) / hyHere;
    if (!insideGrid(grid, next.i, next.j)) return "edge";
    // Corrector: move to the speed maximum along the normal (−ty, tx).
    correctTowardRidge(grid, speed, -ty, tx, settings.axisSearchDistance, hxHere, hyHere, next);
    if (!insideGrid(grid, next.i, next.j)) return "edge";
    const speedThere = sampleBicubic(grid, speed, next.i, next.j);
    if (!(speedThere >= settings.axisSpeed)) return "slow";
    const stepX = (next.i - i) * hxHere;
    const stepY = (next.j - j) * hyHere;
    const stepLength = Math.hypot(stepX, stepY);
    if (!(stepLength > 0)) return "calm";
    if (stepX * previousX + stepY * previousY < 0) return "turn";
    if (s + stepLength > settings.axisMaxLength) return "length";
    s += stepLength;
    trail.push(next.i, next.j, direction * s);
    i = next.i;
    j = next.j;
    previousX = stepX;
    previousY = stepY;
  }
  return "length";
}

/** Moves `point` along the unit normal (nX, nY) (grid axes) to the largest S within ±search metres. */
function correctTowardRidge(
  grid: HorizontalGrid,
  speed: Float32Array,
  nX: number,
  nY: number,
  search: number,
  hxHere: number,
  hyHere: number,
  point: StepState,
): void {
  if (!(search > 0)) return;
  const spacing = (2 * search) / (NORMAL_SAMPLES - 1);
  let bestK = -1;
  let best = -Infinity;
  let before = Number.NaN;
  let after = Number.NaN;
  let previous = Number.NaN;
  for (let k = 0; k < NORMAL_SAMPLES; k++) {
    const offset = -search + k * spacing;
    const si = point.i + (offset * nX) / hxHere;
    const sj = point.j + (offset * nY) / hyHere;
    const value = insideGrid(grid, si, sj) ? sampleBicubic(grid, speed, si, sj) : Number.NaN;
    if (k === bestK + 1) after = value;
    if (value > best) {
      best = value;
      bestK = k;
      before = previous;
      after = Number.NaN;
    }
    previous = value;
  }
  if (bestK < 0) return;
  let offset = -search + bestK * spacing;
  if (before === before && after === after) offset += parabolaPeak(before, best, after) * spacing;
  point.i += (offset * nX) / hxHere;
  point.j += (offset * nY) / hyHere;
}

/** Joins upstream (reversed), the core and downstream into one ordered axis with tangents. */
function assembleAxis(
  grid: HorizontalGrid,
  core: JetCore,
  upstream: VertexTrail,
  downstream: VertexTrail,
  upstreamStop: AxisStop,
  downstreamStop: AxisStop,
): JetAxis {
  const count = upstream.count + 1 + downstream.count;
  const i = new Float64Array(count);
  const j = new Float64Array(count);
  const s = new Float64Array(count);
  for (let k = 0; k < upstream.count; k++) {
    const to = upstream.count - 1 - k;
    i[to] = upstream.i[k];
    j[to] = upstream.j[k];
    s[to] = upstream.s[k];
  }
  const coreVertex = upstream.count;
  i[coreVertex] = core.i;
  j[coreVertex] = core.j;
  for (let k = 0; k < downstream.count; k++) {
    i[coreVertex + 1 + k] = downstream.i[k];
    j[coreVertex + 1 + k] = downstream.j[k];
    s[coreVertex + 1 + k] = downstream.s[k];
  }
  return withTangents(grid, { i, j, s, coreVertex, upstreamStop, downstreamStop });
}

/**
 * Adds scale factors and unit tangents of the axis itself: centred differences of the vertex positions
 * (one-sided at the ends). With one vertex only, the tangent is left NaN.
 */
export function withTangents(
  grid: HorizontalGrid,
  axis: Pick<JetAxis, "i" | "j" | "s" | "coreVertex" | "upstreamStop" | "downstreamStop">,
): JetAxis {
  const count = axis.i.length;
  const scaleX = new Float64Array(count);
  const scaleY = new Float64Array(count);
  const tangentX = new Float64Array(count).fill(Number.NaN);
  const tangentY = new Float64Array(count).fill(Number.NaN);
  for (let k = 0; k < count; k++) {
    scaleX[k] = sampleBilinear(grid, grid.hx, axis.i[k], axis.j[k]);
    scaleY[k] = sampleBilinear(grid, grid.hy, axis.i[k], axis.j[k]);
  }
  if (count > 1) {
    for (let k = 0; k < count; k++) {
      const a = k > 0 ? k - 1 : k;
      const b = k < count - 1 ? k + 1 : k;
      const dx = (axis.i[b] - axis.i[a]) * scaleX[k];
      const dy = (axis.j[b] - axis.j[a]) * scaleY[k];
      const length = Math.hypot(dx, dy);
      if (length > 0) {
        tangentX[k] = dx / length;
        tangentY[k] = dy / length;
      }
    }
  }
  return { ...axis, count, scaleX, scaleY, tangentX, tangentY };
}
