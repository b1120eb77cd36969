import { useCallback, useMemo } from "react";
import type { ZoneGeometry } from "@shared/zones/zone-geometry.ts";
import { LayerCanvas, type DrawLayer } from "./layer-canvas.tsx";
import { useMapViewport } from "./map-stage.tsx";
import { projectZoneOutline } from "./project-zone-outline.ts";
import { tracePolylines } from "./stroke-polylines.ts";

/**
 * Forecast-zone boundaries over the map, dashed so they are not mistaken for coasts or contour
 * lines, with a dark halo for any background. Pass one or several zones.
 */
export function ZoneOutlineLayer({ zones, colour = "#f2d38a", label = "zones" }: { zones: readonly ZoneGeometry[]; colour?: string; label?: string }) {
  const { geometry } = useMapViewport();
  const lines = useMemo(() => zones.map((zone) => projectZoneOutline(geometry, zone)), [zones, geometry]);
  const draw = useCallback<DrawLayer>(
    (context, { transform }) => {
      context.lineJoin = "round";
      context.lineWidth = 3.2;
      context.strokeStyle = "rgba(10, 14, 18, 0.65)";
      context.beginPath();
      for (const line of lines) tracePolylines(context, line, transform);
      context.stroke();
      context.setLineDash([7, 4]);
      context.lineWidth = 1.6;
      context.strokeStyle = colour;
      context.beginPath();
      for (const line of lines) tracePolylines(context, line, transform);
      context.stroke();
      context.setLineDash([]);
    },
    [lines, colour],
  );
  return <LayerCanvas draw={draw} label={label} />;
}
