import { useCallback, useMemo } from "react";
import { formatNumber } from "@/lib/format-units.ts";
import { tickDecimals, type RampScale } from "./colour-scale.ts";
import { contourLevels, traceContours, type ContourLevel } from "./field-contours.ts";
import { gridToCanvas, type GridCanvasTransform } from "./grid-canvas-transform.ts";
import type { MapField } from "./map-fields.ts";
import type { FieldValues } from "./field-values.ts";
import { LayerCanvas, type DrawLayer } from "./layer-canvas.tsx";
import { tracePolylines } from "./stroke-polylines.ts";

/** Lines shorter than this many vertices are left unlabelled: a label would hide them. */
const MIN_LABELLED_VERTICES = 12;

/** Writes each level's value once, at the middle of its longest line. */
function labelLevels(context: CanvasRenderingContext2D, levels: readonly ContourLevel[], transform: GridCanvasTransform, decimals: number) {
  context.font = "600 11px Inter, system-ui, sans-serif";
  context.textAlign = "center";
  context.textBaseline = "middle";
  context.lineWidth = 3;
  context.strokeStyle = "rgba(10, 14, 18, 0.85)";
  context.fillStyle = "rgba(255, 255, 255, 0.95)";
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
    const text = formatNumber(level.display, decimals);
    context.strokeText(text, at.x, at.y);
    context.fillText(text, at.x, at.y);
  }
}

/** Contour lines of the shown field at the legend's tick values; a dark halo keeps them readable on any colour. */
export function ContoursLayer({ field, values, scale }: { field: MapField; values: FieldValues; scale: RampScale }) {
  const levels = useMemo(() => traceContours(values.values, values.nx, values.ny, contourLevels(field, scale)), [field, values, scale]);
  const draw = useCallback<DrawLayer>(
    (context, { transform }) => {
      context.lineJoin = "round";
      for (const [width, colour] of [
        [2.6, "rgba(10, 14, 18, 0.55)"],
        [1.1, "rgba(255, 255, 255, 0.9)"],
      ] as const) {
        context.lineWidth = width;
        context.strokeStyle = colour;
        context.beginPath();
        for (const level of levels) tracePolylines(context, level.rings, transform);
        context.stroke();
      }
      labelLevels(context, levels, transform, tickDecimals(scale.ticks));
    },
    [levels, scale],
  );
  return <LayerCanvas draw={draw} label="contours" />;
}
