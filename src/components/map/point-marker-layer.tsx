import { useCallback } from "react";
import { gridToCanvas } from "./grid-canvas-transform.ts";
import { LayerCanvas, type DrawLayer } from "./layer-canvas.tsx";

/** A ring around one grid point (the strongest value of an area, a picked location). */
export function PointMarkerLayer({ i, j, colour = "#ffffff", label = "marker" }: { i: number; j: number; colour?: string; label?: string }) {
  const draw = useCallback<DrawLayer>(
    (context, { transform }) => {
      const at = gridToCanvas(transform, i, j, { x: 0, y: 0 });
      const radius = Math.max(6, Math.min(transform.cellWidth, transform.cellHeight) * 1.2);
      for (const [lineWidth, stroke] of [
        [4, "rgba(10, 14, 18, 0.75)"],
        [2, colour],
      ] as const) {
        context.lineWidth = lineWidth;
        context.strokeStyle = stroke;
        context.beginPath();
        context.arc(at.x, at.y, radius, 0, 2 * Math.PI);
        context.stroke();
      }
    },
    [i, j, colour],
  );
  return <LayerCanvas draw={draw} label={label} />;
}
