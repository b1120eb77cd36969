import { gridToCanvas, type GridCanvasTransform, type XY } from "./grid-canvas-transform.ts";
import type { GridPolylines } from "./project-outlines.ts";

/** Adds polylines held in grid coordinates to the current path, placed with the map's transform. */
export function tracePolylines(context: CanvasRenderingContext2D, lines: GridPolylines, transform: GridCanvasTransform): void {
  const at: XY = { x: 0, y: 0 };
  const { points, starts } = lines;
  for (let line = 0; line + 1 < starts.length; line++) {
    const first = starts[line]!;
    const end = starts[line + 1]!;
    if (end - first < 2) continue;
    gridToCanvas(transform, points[first * 2]!, points[first * 2 + 1]!, at);
    context.moveTo(at.x, at.y);
    for (let k = first + 1; k < end; k++) {
      gridToCanvas(transform, points[k * 2]!, points[k * 2 + 1]!, at);
      context.lineTo(at.x, at.y);
    }
  }
}
