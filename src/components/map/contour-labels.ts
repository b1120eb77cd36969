import { gridToCanvas, type GridCanvasTransform } from "./grid-canvas-transform.ts";
import type { ContourLevel } from "./field-contours.ts";

/** Lines shorter than this many vertices are left unlabelled: a label would hide them. */
const MIN_LABELLED_VERTICES = 12;

/**
 * Writes each level's label once, at the middle of its longest line, light on a dark halo so it
 * reads on any colour. `text` turns a level into its label ("1,000", "70 kt").
 */
export function labelContourLevels(
  context: CanvasRenderingContext2D,
  levels: readonly ContourLevel[],
  transform: GridCanvasTransform,
  text: (level: ContourLevel) => string,
  fill = "rgba(255, 255, 255, 0.95)",
): void {
  context.font = "600 11px Inter, system-ui, sans-serif";
  context.textAlign = "center";
  context.textBaseline = "middle";
  context.lineWidth = 3;
  context.strokeStyle = "rgba(10, 14, 18, 0.85)";
  context.fillStyle = fill;
  const at = { x: 0, y: 0 };
  for (const level of levels) {
    const { points, starts } = level.rings;
    let best = -1;
    let bestLength = 0;
    for (let line = 0; line + 1 < starts.length; line++) {
      const length = starts[line + 1]! - starts[line]!;
      if (length > bestLength) [best, bestLength] = [line, length];
    }
    if (best < 0 || bestLength < MIN_LABELLED_VERTICES) continue;
    const middle = starts[best]! + Math.floor(bestLength / 2);
    gridToCanvas(transform, points[middle * 2]!, points[middle * 2 + 1]!, at);
    const label = text(level);
    context.strokeText(label, at.x, at.y);
    context.fillText(label, at.x, at.y);
  }
}
