/**
 * Assigns grid points to jet axes. For a point P within `axisMaxDistance` of an axis: its nearest vertex
 * A (arc length s*, axis tangent t̂), along-axis coordinate σ = s* + (P − A)·t̂ and signed cross-axis
 * coordinate ν = (P − A)·(k̂ × t̂), positive to the left. A point whose nearest vertex is an end vertex lies
 * beyond the axis and stays unassigned (unless that end is a cut between two cores of one axis). Of several
 * qualifying axes the nearest wins.
 *
 * The nearest vertex is found in two passes so the cost does not grow with the square of the axis
 * resolution: every K-th vertex stamps the points within reach (K chosen for ~25 km between stamping
 * vertices), then each stamped point walks along the axis from its stamping vertex while the distance
 * falls (at most 2K vertices).
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";
import type { JetAxis } from "./jet-types.ts";
import { GridScratch } from "./grid-scratch.ts";

export interface PointAssignment {
  /** Index of the owning axis, −1 for none. */
  readonly owner: Int32Array;
  /** σ (m), NaN where unassigned. */
  readonly along: Float32Array;
  /** ν (m), NaN where unassigned. */
  readonly across: Float32Array;
}

/** Stamping vertices are spaced about this fraction of the reach apart (and at least 2 grid lengths). */
const STAMP_SPACING_FRACTION = 1 / 20;

/**
 * `along` and `across` are written into `out` (new arrays by default, since they become output fields); the
 * owner array and the search arrays come from `scratch`.
 */
export function assignPointsToAxes(
  grid: HorizontalGrid,
  axes: readonly JetAxis[],
  maxDistance: number,
  scratch: GridScratch = new GridScratch(),
  out: { along: Float32Array; across: Float32Array } = { along: new Float32Array(grid.nx * grid.ny), across: new Float32Array(grid.nx * grid.ny) },
): PointAssignment {
  const n = grid.nx * grid.ny;
  const owner = scratch.int32("assignOwner", n).fill(-1);
  const along = out.along.fill(Number.NaN);
  const across = out.across.fill(Number.NaN);
  const bestDistance2 = scratch.float64("assignBestDistance2", n).fill(Infinity);
  const stamp = scratch.int32("assignStamp", n).fill(-1);
  const stampDistance2 = scratch.float64("assignStampDistance2", n);
  const stampVertex = scratch.int32("assignStampVertex", n);
  const result = { owner, along, across };
  axes.forEach((axis, a) => {
    if (axis.count < 3) return;
    const stride = stampStride(grid, axis, maxDistance);
    const reach = maxDistance + stride * averageVertexSpacing(axis);
    const scratch = { stamp, stampDistance2, stampVertex };
    for (let k = 0; k < axis.count; k += stride) stampAround(grid, axis, k, a, reach, scratch);
    if ((axis.count - 1) % stride !== 0) stampAround(grid, axis, axis.count - 1, a, reach, scratch);
    refineStamped(grid, axis, a, 2 * stride, maxDistance, scratch, bestDistance2, result);
  });
  return result;
}

function averageVertexSpacing(axis: JetAxis): number {
  return (axis.s[axis.count - 1] - axis.s[0]) / (axis.count - 1);
}

function stampStride(grid: HorizontalGrid, axis: JetAxis, maxDistance: number): number {
  const spacing = averageVertexSpacing(axis);
  const gridLength = Math.min(axis.scaleX[axis.coreVertex], axis.scaleY[axis.coreVertex]);
  const target = Math.max(2 * gridLength, STAMP_SPACING_FRACTION * maxDistance);
  return spacing > 0 ? Math.max(1, Math.floor(target / spacing)) : 1;
}

interface StampScratch {
  stamp: Int32Array;
  stampDistance2: Float64Array;
  stampVertex: Int32Array;
}

/** Marks every grid point within `reach` of vertex k with the vertex, if it is the closest stamp so far. */
function stampAround(grid: HorizontalGrid, axis: JetAxis, k: number, a: number, reach: number, scratch: StampScratch): void {
  const { nx, ny, hx, hy } = grid;
  const ci = axis.i[k];
  const cj = axis.j[k];
  const sx = axis.scaleX[k];
  const sy = axis.scaleY[k];
  const reach2 = reach * reach;
  // Rows: the j-spacing changes little over the reach (map factor); 10 % margin plus one row.
  const rowSpan = Math.ceil((1.1 * reach) / sy) + 1;
  const jFrom = Math.max(0, Math.floor(cj - rowSpan));
  const jTo = Math.min(ny - 1, Math.ceil(cj + rowSpan));
  const { stamp, stampDistance2, stampVertex } = scratch;
  for (let j = jFrom; j <= jTo; j++) {
    const rowCentre = j * nx + Math.min(nx - 1, Math.max(0, Math.round(ci)));
    const columnSpan = Math.ceil(reach / (0.5 * (hx[rowCentre] + sx))) + 1;
    const iFrom = Math.max(0, Math.floor(ci - columnSpan));
    const iTo = Math.min(nx - 1, Math.ceil(ci + columnSpan));
    const dj = j - cj;
    for (let i = iFrom; i <= iTo; i++) {
      const p = j * nx + i;
      const dx = (i - ci) * 0.5 * (hx[p] + sx);
      const dy = dj * 0.5 * (hy[p] + sy);
      const d2 = dx * dx + dy * dy;
      if (d2 > reach2) continue;
      if (stamp[p] !== a || d2 < stampDistance2[p]) {
        stamp[p] = a;
        stampDistance2[p] = d2;
        stampVertex[p] = k;
      }
    }
  }
}

function refineStamped(
  grid: HorizontalGrid,
  axis: JetAxis,
  a: number,
  window: number,
  maxDistance: number,
  scratch: StampScratch,
  bestDistance2: Float64Array,
  result: PointAssignment,
): void {
  const { nx, hx, hy } = grid;
  const { stamp, stampVertex } = scratch;
  const last = axis.count - 1;
  const maxDistance2 = maxDistance * maxDistance;
  const openStart = axis.upstreamStop === "split";
  const openEnd = axis.downstreamStop === "split";
  for (let p = 0; p < stamp.length; p++) {
    if (stamp[p] !== a) continue;
    const i = p % nx;
    const j = (p - i) / nx;
    // Walk along the axis from the stamping vertex while the distance keeps falling (at most `window` steps).
    const hxP = hx[p];
    const hyP = hy[p];
    let nearest = stampVertex[p];
    let nearest2 = vertexDistance2(axis, nearest, i, j, hxP, hyP);
    const step = nearest < last && vertexDistance2(axis, nearest + 1, i, j, hxP, hyP) < nearest2 ? 1 : -1;
    for (let walked = 0; walked < window; walked++) {
      const next = nearest + step;
      if (next < 0 || next > last) break;
      const next2 = vertexDistance2(axis, next, i, j, hxP, hyP);
      if (next2 >= nearest2) break;
      nearest = next;
      nearest2 = next2;
    }
    const nearestDx = (i - axis.i[nearest]) * 0.5 * (hxP + axis.scaleX[nearest]);
    const nearestDy = (j - axis.j[nearest]) * 0.5 * (hyP + axis.scaleY[nearest]);
    if (nearest2 > maxDistance2 || nearest2 >= bestDistance2[p]) continue;
    if ((nearest === 0 && !openStart) || (nearest === last && !openEnd)) continue;
    const tx = axis.tangentX[nearest];
    const ty = axis.tangentY[nearest];
    bestDistance2[p] = nearest2;
    result.owner[p] = a;
    result.along[p] = axis.s[nearest] + nearestDx * tx + nearestDy * ty;
    result.across[p] = -nearestDx * ty + nearestDy * tx;
  }
}

/** Squared physical distance (m²) from grid point (i, j), with scale factors hxP, hyP, to axis vertex k. */
function vertexDistance2(axis: JetAxis, k: number, i: number, j: number, hxP: number, hyP: number): number {
  const dx = (i - axis.i[k]) * 0.5 * (hxP + axis.scaleX[k]);
  const dy = (j - axis.j[k]) * 0.5 * (hyP + axis.scaleY[k]);
  return dx * dx + dy * dy;
}
