import type { GridPolylines } from "@/components/map/index.ts";
import { gridToCanvas, type GridCanvasTransform } from "@/components/map/index.ts";

/**
 * Streak axes on the map. Axis vertices arrive in the grid's fractional indices (the frame's own
 * projection plane), so they are drawn with the same grid-to-canvas mapping as the field beneath:
 * no second projection step that could drift from the raster.
 */

interface AxisPoint {
  i: number;
  j: number;
  s: number;
}

/** Every streak's axis as polylines in grid coordinates (upstream → downstream), ready for `tracePolylines`. */
export function axisPolylines(streaks: ReadonlyArray<{ axis: readonly AxisPoint[] }>): GridPolylines {
  const total = streaks.reduce((sum, streak) => sum + streak.axis.length, 0);
  const points = new Float32Array(total * 2);
  const starts = new Uint32Array(streaks.length + 1);
  let at = 0;
  streaks.forEach((streak, index) => {
    starts[index] = at;
    for (const vertex of streak.axis) {
      points[at * 2] = vertex.i;
      points[at * 2 + 1] = vertex.j;
      at++;
    }
  });
  starts[streaks.length] = at;
  return { points, starts };
}

/** Screen position and unit direction (y down) of the axis at its downstream end, for an arrowhead; null for an axis too short to have a direction. */
export function downstreamEnd(axis: readonly AxisPoint[], transform: GridCanvasTransform): { x: number; y: number; dirX: number; dirY: number } | null {
  if (axis.length < 2) return null;
  const tip = gridToCanvas(transform, axis[axis.length - 1]!.i, axis[axis.length - 1]!.j, { x: 0, y: 0 });
  // Step back until the vertices are a few pixels apart, so a dense axis still gives a steady direction.
  const back = { x: 0, y: 0 };
  for (let k = axis.length - 2; k >= 0; k--) {
    gridToCanvas(transform, axis[k]!.i, axis[k]!.j, back);
    const length = Math.hypot(tip.x - back.x, tip.y - back.y);
    if (length >= 4 || k === 0) {
      if (length === 0) return null;
      return { x: tip.x, y: tip.y, dirX: (tip.x - back.x) / length, dirY: (tip.y - back.y) / length };
    }
  }
  return null;
}

/** Unit direction of the axis on screen at the core (the vertex nearest s = 0), from its neighbours on either side. */
export function coreDirection(axis: readonly AxisPoint[], transform: GridCanvasTransform): { x: number; y: number } {
  if (axis.length < 2) return { x: 1, y: 0 };
  let core = 0;
  for (let k = 1; k < axis.length; k++) if (Math.abs(axis[k]!.s) < Math.abs(axis[core]!.s)) core = k;
  const before = axis[Math.max(0, core - 2)]!;
  const after = axis[Math.min(axis.length - 1, core + 2)]!;
  const a = gridToCanvas(transform, before.i, before.j, { x: 0, y: 0 });
  const b = gridToCanvas(transform, after.i, after.j, { x: 0, y: 0 });
  const length = Math.hypot(b.x - a.x, b.y - a.y);
  return length > 0 ? { x: (b.x - a.x) / length, y: (b.y - a.y) / length } : { x: 1, y: 0 };
}

/**
 * Where the core's label goes: a box of `width` × `height` pixels beside the core on the left of the
 * flow (north of a westerly jet), or on its right when the left side would leave the map, kept
 * inside the map. Returns the box's top-left corner.
 */
export function coreLabelBox(
  core: { x: number; y: number },
  direction: { x: number; y: number },
  size: { width: number; height: number },
  map: { width: number; height: number },
  gap = 14,
): { x: number; y: number } {
  const margin = 2;
  // Left of a direction (dx, dy) on a y-down screen is (dy, −dx).
  const place = (side: 1 | -1) => {
    const nx = side * direction.y;
    const ny = side * -direction.x;
    // Centre far enough out that the box clears the core whatever its orientation.
    const reach = gap + Math.abs(nx) * (size.width / 2) + Math.abs(ny) * (size.height / 2);
    return { x: core.x + nx * reach - size.width / 2, y: core.y + ny * reach - size.height / 2 };
  };
  const fits = (box: { x: number; y: number }) =>
    box.x >= margin && box.y >= margin && box.x + size.width <= map.width - margin && box.y + size.height <= map.height - margin;
  const left = place(1);
  const chosen = fits(left) ? left : fits(place(-1)) ? place(-1) : left;
  return {
    x: Math.min(Math.max(chosen.x, margin), Math.max(margin, map.width - margin - size.width)),
    y: Math.min(Math.max(chosen.y, margin), Math.max(margin, map.height - margin - size.height)),
  };
}
