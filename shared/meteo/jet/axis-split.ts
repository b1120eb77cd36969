/**
 * Several cores on one axis. The axis traced downstream from one core often runs along the same speed ridge
 * as the axis traced upstream from the next core (and may reach that core). Where the downstream half of
 * axis A meets the upstream half of axis B, both are cut at the slowest point of the ridge between the two
 * cores, so each stretch of the shared axis belongs to one core. The cut ends stay "open": points near them
 * are labelled, as exit of the first core and entrance of the second.
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";
import type { JetAxis, JetCore } from "./jet-types.ts";
import { sampleBilinear } from "./grid-sampling.ts";
import { withTangents } from "./axis-trace.ts";

/** Two axes share a ridge where their vertices come within this many local grid lengths … */
const SHARED_GRID_LENGTHS = 1.5;
/** … or within this fraction of the corrector's search distance, whichever is larger. */
const SHARED_SEARCH_FRACTION = 0.25;
/** Vertices are compared at this stride first, then the hit is refined vertex by vertex. */
const COARSE_STRIDE = 4;

export function splitSharedAxes(
  grid: HorizontalGrid,
  axes: readonly JetAxis[],
  cores: readonly JetCore[],
  speed: Float32Array,
  searchDistance: number,
): JetAxis[] {
  const lastKept = axes.map((axis) => axis.count - 1);
  const firstKept = axes.map(() => 0);
  for (let a = 0; a < axes.length; a++) {
    for (let b = 0; b < axes.length; b++) {
      if (a === b || !downstreamMeetsUpstream(axes[a], axes[b], searchDistance)) continue;
      const cut = slowestPointBetween(grid, axes[a], axes[b], cores[a], cores[b], speed, searchDistance);
      const cutA = nearestVertex(axes[a], cut.i, cut.j, axes[a].coreVertex + 1, axes[a].count - 1);
      const cutB = nearestVertex(axes[b], cut.i, cut.j, 0, axes[b].coreVertex - 1);
      if (cutA >= 0) lastKept[a] = Math.min(lastKept[a], cutA);
      if (cutB >= 0) firstKept[b] = Math.max(firstKept[b], cutB);
    }
  }
  return axes.map((axis, index) => {
    const first = firstKept[index];
    const last = lastKept[index];
    if (first === 0 && last === axis.count - 1) return axis;
    return withTangents(grid, {
      i: axis.i.slice(first, last + 1),
      j: axis.j.slice(first, last + 1),
      s: axis.s.slice(first, last + 1),
      coreVertex: axis.coreVertex - first,
      upstreamStop: first > 0 ? "split" : axis.upstreamStop,
      downstreamStop: last < axis.count - 1 ? "split" : axis.downstreamStop,
    });
  });
}

function tolerance(axis: JetAxis, k: number, searchDistance: number): number {
  return Math.max(SHARED_GRID_LENGTHS * Math.max(axis.scaleX[k], axis.scaleY[k]), SHARED_SEARCH_FRACTION * searchDistance);
}

function vertexDistance(a: JetAxis, ka: number, b: JetAxis, kb: number): number {
  const dx = (a.i[ka] - b.i[kb]) * 0.5 * (a.scaleX[ka] + b.scaleX[kb]);
  const dy = (a.j[ka] - b.j[kb]) * 0.5 * (a.scaleY[ka] + b.scaleY[kb]);
  return Math.sqrt(dx * dx + dy * dy);
}

/** Whether a vertex downstream of A's core lies on B's axis upstream of B's core (coarse pass, then exact). */
function downstreamMeetsUpstream(a: JetAxis, b: JetAxis, searchDistance: number): boolean {
  const coarseSlack = COARSE_STRIDE * Math.max(spacing(a), spacing(b));
  for (let ka = a.coreVertex + 1; ka < a.count; ka += COARSE_STRIDE) {
    const reach = tolerance(a, ka, searchDistance);
    for (let kb = 0; kb < b.coreVertex; kb += COARSE_STRIDE) {
      if (vertexDistance(a, ka, b, kb) > reach + coarseSlack) continue;
      for (let fa = Math.max(a.coreVertex + 1, ka - COARSE_STRIDE); fa <= Math.min(a.count - 1, ka + COARSE_STRIDE); fa++) {
        for (let fb = Math.max(0, kb - COARSE_STRIDE); fb <= Math.min(b.coreVertex - 1, kb + COARSE_STRIDE); fb++) {
          if (vertexDistance(a, fa, b, fb) <= reach) return true;
        }
      }
    }
  }
  return false;
}

function spacing(axis: JetAxis): number {
  return axis.count > 1 ? (axis.s[axis.count - 1] - axis.s[0]) / (axis.count - 1) : 0;
}

/** Index of the vertex of `axis` in [from, to] nearest to (i, j); −1 when the range is empty. */
function nearestVertex(axis: JetAxis, i: number, j: number, from: number, to: number): number {
  let best = -1;
  let bestDistance = Infinity;
  for (let k = Math.max(0, from); k <= Math.min(axis.count - 1, to); k++) {
    const dx = (i - axis.i[k]) * axis.scaleX[k];
    const dy = (j - axis.j[k]) * axis.scaleY[k];
    const d = dx * dx + dy * dy;
    if (d < bestDistance) {
      bestDistance = d;
      best = k;
    }
  }
  return best;
}

/**
 * The slowest vertex on the ridge between core A and core B: A's vertices downstream of its core up to where
 * A passes B's core (or A's end), and B's vertices upstream of its core back to where B passes A's core.
 */
function slowestPointBetween(
  grid: HorizontalGrid,
  a: JetAxis,
  b: JetAxis,
  coreA: JetCore,
  coreB: JetCore,
  speed: Float32Array,
  searchDistance: number,
): { i: number; j: number } {
  const aPassesB = nearestVertex(a, coreB.i, coreB.j, a.coreVertex + 1, a.count - 1);
  const aTo = aPassesB >= 0 && closeTo(a, aPassesB, coreB, searchDistance) ? aPassesB - 1 : a.count - 1;
  const bPassesA = nearestVertex(b, coreA.i, coreA.j, 0, b.coreVertex - 1);
  const bFrom = bPassesA >= 0 && closeTo(b, bPassesA, coreA, searchDistance) ? bPassesA + 1 : 0;
  let best = { i: a.i[a.count - 1], j: a.j[a.count - 1] };
  let slowest = Infinity;
  const consider = (axis: JetAxis, from: number, to: number) => {
    for (let k = from; k <= to; k++) {
      const value = sampleBilinear(grid, speed, axis.i[k], axis.j[k]);
      if (value < slowest) {
        slowest = value;
        best = { i: axis.i[k], j: axis.j[k] };
      }
    }
  };
  consider(a, a.coreVertex + 1, aTo);
  consider(b, bFrom, b.coreVertex - 1);
  return best;
}

function closeTo(axis: JetAxis, k: number, core: JetCore, searchDistance: number): boolean {
  const dx = (core.i - axis.i[k]) * axis.scaleX[k];
  const dy = (core.j - axis.j[k]) * axis.scaleY[k];
  return Math.sqrt(dx * dx + dy * dy) <= tolerance(axis, k, searchDistance);
}
