import { useCallback, useMemo } from "react";
import { useQuery } from "@tanstack/react-query";
import { mapKeys } from "./map-keys.ts";
import { loadOutlineLines } from "./load-outlines.ts";
import { projectOutlines } from "./project-outlines.ts";
import { LayerCanvas, type DrawLayer } from "./layer-canvas.tsx";
import { useMapViewport } from "./map-stage.tsx";
import { tracePolylines } from "./stroke-polylines.ts";

/** Loaded once per tab: the outline files never change while the app runs. */
function useOutlineLines() {
  return useQuery({ queryKey: mapKeys.outlineLines(), queryFn: loadOutlineLines, staleTime: Infinity, gcTime: Infinity });
}

/** Coastlines, country borders and US state borders, projected into this grid (once per geometry). */
export function OutlinesLayer() {
  const { geometry } = useMapViewport();
  const lines = useOutlineLines();
  const projected = useMemo(() => {
    if (!lines.data) return null;
    return {
      coasts: projectOutlines(geometry, [...lines.data.coastlines, ...lines.data.countryBorders]),
      states: projectOutlines(geometry, lines.data.stateBorders),
    };
  }, [lines.data, geometry]);

  const draw = useCallback<DrawLayer>(
    (context, { transform }) => {
      if (!projected) return;
      context.lineJoin = "round";
      context.strokeStyle = "rgba(230, 236, 240, 0.55)";
      context.lineWidth = 0.8;
      context.beginPath();
      tracePolylines(context, projected.states, transform);
      context.stroke();
      context.strokeStyle = "rgba(240, 244, 246, 0.9)";
      context.lineWidth = 1.2;
      context.beginPath();
      tracePolylines(context, projected.coasts, transform);
      context.stroke();
    },
    [projected],
  );
  return <LayerCanvas draw={draw} label="outlines" />;
}
