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
 * d3-contour places value k at the centre of pixel (k mod nx, ⌊k / nx⌋), that is at (x + 0.5, y + 0.5),
 * with y growing with the row index. Bellwether's rows also grow with j, so the only change is the
 * half-cell shift. Missing values (NaN) count as lower than every level.
 */
export function traceContours(values: Float32Array, nx: number, ny: number, levels: ReadonlyArray<{ value: number; display: number }>): ContourLevel[] {
  if (levels.length === 0) return [];
  const generator = contours()
    .size([nx, ny])
    .thresholds(levels.map((level) => level.value));
  // d3-contour reads values by index only; a typed array serves as its number array.
  const shapes = generator(values as unknown as number[]);
  return shapes.map((shape, index) => {
    const points: number[] = [];
    const starts: number[] = [];
    for (const polygon of shape.coordinates) {
      for (const ring of polygon) appendRing(ring, nx, ny, points, starts);
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

/** Adds a ring as one or more lines, leaving out the stretches that only close it along the border. */
function appendRing(ring: number[][], nx: number, ny: number, points: number[], starts: number[]): void {
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
      points.push(x0! - 0.5, y0! - 0.5);
      open = true;
    }
    points.push(x1! - 0.5, y1! - 0.5);
  }
}
