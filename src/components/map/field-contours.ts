import { contours } from "d3-contour";
import type { RampScale } from "./colour-scale.ts";
import type { MapField } from "./map-fields.ts";
import type { GridPolylines } from "./project-outlines.ts";

/**
 * Contour lines of a field, traced by d3-contour's marching squares and returned in the grid's
 * own fractional index space (the same space the outlines use), one set of rings per level.
 */

export interface ContourLevel {
  /** Storage-unit value of the line. */
  value: number;
  /** Display-unit value, as the legend shows it. */
  display: number;
  rings: GridPolylines;
}

/**
 * Levels at the legend's round numbers, so every line matches a tick the reader can see. The
 * ramp's two ends are left out: a line there would only trace the edge of the colour range.
 */
export function contourLevels(field: MapField, scale: RampScale): Array<{ value: number; display: number }> {
  const scaleFactor = field.display.scale || 1;
  return scale.ticks
    .filter((tick) => tick.at > 1e-9 && tick.at < 1 - 1e-9)
    .map((tick) => ({ value: (tick.display - field.display.offset) / scaleFactor, display: tick.display }));
}

/**
 * Above this many grid points the field is contoured from block means: d3-contour took about 4.7 s
 * for four levels on a full 1799 × 1059 grid here (about 1 s from 3 × 3 block means), while a map a
 * thousand pixels wide cannot show lines finer than a few cells of such a grid anyway.
 */
export const CONTOUR_MAX_POINTS = 120_000;

/** Block size (cells per side) that brings a grid under `maxPoints`. */
export function contourBlockSize(nx: number, ny: number, maxPoints = CONTOUR_MAX_POINTS): number {
  return Math.max(1, Math.ceil(Math.sqrt((nx * ny) / maxPoints)));
}

/**
 * Means of whole size × size blocks, ignoring missing values (a block with none is NaN). A partial
 * block at the east or north edge is left out, so every block's centre sits exactly at a fine
 * fractional index: block I covers cells I·size … I·size + size − 1, centred at I·size + (size − 1)/2.
 */
export function blockMeans(values: Float32Array, nx: number, ny: number, size: number): { values: Float32Array; nx: number; ny: number } {
  const cx = Math.floor(nx / size);
  const cy = Math.floor(ny / size);
  const sums = new Float64Array(cx * cy);
  const counts = new Uint32Array(cx * cy);
  for (let j = 0; j < cy * size; j++) {
    const row = Math.floor(j / size) * cx;
    for (let i = 0; i < cx * size; i++) {
      const value = values[j * nx + i]!;
      if (value !== value) continue;
      const block = row + Math.floor(i / size);
      sums[block]! += value;
      counts[block]!++;
    }
  }
  const means = new Float32Array(cx * cy);
  for (let k = 0; k < means.length; k++) means[k] = counts[k]! > 0 ? sums[k]! / counts[k]! : Number.NaN;
  return { values: means, nx: cx, ny: cy };
}

/**
 * d3-contour places value k at the centre of pixel (k mod nx, ⌊k / nx⌋), that is at (x + 0.5, y + 0.5),
 * with y growing with the row index. Bellwether's rows also grow with j, so the only change is the
 * half-cell shift (and, for a large grid traced from block means, the block size). Missing values (NaN)
 * count as lower than every level.
 */
export function traceContours(
  values: Float32Array,
  nx: number,
  ny: number,
  levels: ReadonlyArray<{ value: number; display: number }>,
  maxPoints = CONTOUR_MAX_POINTS,
): ContourLevel[] {
  if (levels.length === 0) return [];
  const size = contourBlockSize(nx, ny, maxPoints);
  const grid = size === 1 ? { values, nx, ny } : blockMeans(values, nx, ny, size);
  const generator = contours()
    .size([grid.nx, grid.ny])
    .thresholds(levels.map((level) => level.value));
  // d3-contour reads values by index only; a typed array serves as its number array.
  const shapes = generator(grid.values as unknown as number[]);
  const toFine = { scale: size, shift: -0.5 * size + (size - 1) / 2 };
  return shapes.map((shape, index) => {
    const points: number[] = [];
    const starts: number[] = [];
    for (const polygon of shape.coordinates) {
      for (const ring of polygon) appendRing(ring, grid.nx, grid.ny, toFine, points, starts);
    }
    starts.push(points.length / 2);
    return { value: shape.value, display: levels[index]!.display, rings: { points: Float32Array.from(points), starts: Uint32Array.from(starts) } };
  });
}

/**
 * True for a point on the grid's outer border. d3-contour treats the world outside the grid as
 * below every level, so a region reaching the edge gets its ring closed along the border; those
 * points are never a real crossing of the level (real ones lie between two cell centres).
 */
function onBorder(x: number, y: number, nx: number, ny: number): boolean {
  return x <= 0 || x >= nx || y <= 0 || y >= ny;
}

/**
 * Adds a ring as one or more lines, leaving out the stretches that only close it along the border.
 * A traced coordinate x becomes the fine grid index x · scale + shift (x − 0.5 when not downsampled).
 */
function appendRing(ring: number[][], nx: number, ny: number, toFine: { scale: number; shift: number }, points: number[], starts: number[]): void {
  const fine = (coordinate: number) => coordinate * toFine.scale + toFine.shift;
  let open = false;
  for (let k = 1; k < ring.length; k++) {
    const [x0, y0] = ring[k - 1]!;
    const [x1, y1] = ring[k]!;
    if (onBorder(x0!, y0!, nx, ny) || onBorder(x1!, y1!, nx, ny)) {
      open = false;
      continue;
    }
    if (!open) {
      starts.push(points.length / 2);
      points.push(fine(x0!), fine(y0!));
      open = true;
    }
    points.push(fine(x1!), fine(y1!));
  }
}
