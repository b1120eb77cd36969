/**
 * Several cores on one axis: an axis traced from one core often runs on through the next core of the same
 * jet. Each axis is cut at the speed minimum between its core and the nearest other core lying on it
 * (upstream and downstream separately), so every stretch of a shared axis belongs to one core.
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";
import type { JetAxis, JetCore } from "./jet-types.ts";
import { sampleBilinear } from "./grid-sampling.ts";
import { withTangents } from "./axis-trace.ts";

/** A core counts as lying on an axis within this many local grid lengths of a vertex … */
const ON_AXIS_GRID_LENGTHS = 1.5;
/** … or within this fraction of the corrector's search distance, whichever is larger. */
const ON_AXIS_SEARCH_FRACTION = 0.25;

export function splitSharedAxes(
  grid: HorizontalGrid,
  axes: readonly JetAxis[],
  cores: readonly JetCore[],
  speed: Float32Array,
  searchDistance: number,
): JetAxis[] {
  return axes.map((axis, own) => {
    let cutDownstream = -1;
    let cutUpstream = -1;
    let nearestDownstream = Infinity;
    let nearestUpstream = Infinity;
    for (let other = 0; other < cores.length; other++) {
      if (other === own) continue;
      const vertex = vertexNear(axis, cores[other], searchDistance);
      if (vertex < 0 || vertex === axis.coreVertex) continue;
      const along = Math.abs(axis.s[vertex]);
      if (vertex > axis.coreVertex && along < nearestDownstream) {
        nearestDownstream = along;
        cutDownstream = slowestVertexBetween(grid, axis, speed, axis.coreVertex + 1, vertex);
      } else if (vertex < axis.coreVertex && along < nearestUpstream) {
        nearestUpstream = along;
        cutUpstream = slowestVertexBetween(grid, axis, speed, vertex, axis.coreVertex - 1);
      }
    }
    if (cutDownstream < 0 && cutUpstream < 0) return axis;
    const first = cutUpstream >= 0 ? cutUpstream : 0;
    const last = cutDownstream >= 0 ? cutDownstream : axis.count - 1;
    return withTangents(grid, {
      i: axis.i.slice(first, last + 1),
      j: axis.j.slice(first, last + 1),
      s: axis.s.slice(first, last + 1),
      coreVertex: axis.coreVertex - first,
      upstreamStop: cutUpstream >= 0 ? "split" : axis.upstreamStop,
      downstreamStop: cutDownstream >= 0 ? "split" : axis.downstreamStop,
    });
  });
}

/** Index of the axis vertex closest to the core if the core lies on the axis, else −1. */
function vertexNear(axis: JetAxis, core: JetCore, searchDistance: number): number {
  let best = -1;
  let bestDistance = Infinity;
  for (let k = 0; k < axis.count; k++) {
    const dx = (core.i - axis.i[k]) * axis.scaleX[k];
    const dy = (core.j - axis.j[k]) * axis.scaleY[k];
    const distance = Math.hypot(dx, dy);
    if (distance < bestDistance) {
      bestDistance = distance;
      best = k;
    }
  }
  if (best < 0) return -1;
  const tolerance = Math.max(ON_AXIS_GRID_LENGTHS * Math.max(axis.scaleX[best], axis.scaleY[best]), ON_AXIS_SEARCH_FRACTION * searchDistance);
  return bestDistance <= tolerance ? best : -1;
}

/** The vertex of lowest speed in [from, to] (inclusive); `from` when the range is empty. */
function slowestVertexBetween(grid: HorizontalGrid, axis: JetAxis, speed: Float32Array, from: number, to: number): number {
  let best = from;
  let slowest = Infinity;
  for (let k = from; k <= to; k++) {
    const value = sampleBilinear(grid, speed, axis.i[k], axis.j[k]);
    if (value < slowest) {
      slowest = value;
      best = k;
    }
  }
  return best;
}
