import { useCallback, useMemo } from "react";
import type { RampScale } from "../../map/colour-scale.ts";
import { contourLevels, traceContours } from "../../map/field-contours.ts";
import type { MapField } from "../../map/map-fields.ts";
import type { FieldValues } from "../../api/get-field-values.ts";
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
    },
    [levels],
  );
  return <LayerCanvas draw={draw} label="contours" />;
}
