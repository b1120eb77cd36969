import { useCallback, useMemo } from "react";
import { formatNumber } from "@/lib/format-units.ts";
import { tickDecimals, type RampScale } from "./colour-scale.ts";
import { labelContourLevels } from "./contour-labels.ts";
import { contourLevels, traceContours } from "./field-contours.ts";
import type { MapField } from "./map-fields.ts";
import type { FieldValues } from "./field-values.ts";
import { LayerCanvas, type DrawLayer } from "./layer-canvas.tsx";
import { tracePolylines } from "./stroke-polylines.ts";

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
      const decimals = tickDecimals(scale.ticks);
      labelContourLevels(context, levels, transform, (level) => formatNumber(level.display, decimals));
    },
    [levels, scale],
  );
  return <LayerCanvas draw={draw} label="contours" />;
}
