import { useCallback } from "react";
import { gridToCanvas, LayerCanvas, useMapViewport, type DrawLayer, type XY } from "@/components/map/index.ts";
import type { LonLat } from "../../drawing/polygon-drawing.ts";

const EDGE = "#9fd3f5";
const EDGE_PROBLEM = "#f0928a";

/**
 * The polygon being drawn: its edges, its vertices (the first one larger, as the place to close),
 * a dashed line back to the first vertex while open, a dashed rubber band to the pointer, and a light
 * fill once closed. Edges turn red while the ring as drawn would cross itself.
 */
export function DrawnPolygonLayer({ vertices, closed, pointer, hasProblems }: { vertices: readonly LonLat[]; closed: boolean; pointer: LonLat | null; hasProblems: boolean }) {
  const { projection } = useMapViewport();
  const draw = useCallback<DrawLayer>(
    (context, { transform }) => {
      const grid = { i: 0, j: 0 };
      const toCanvas = ([lon, lat]: LonLat): XY => {
        projection.latLonToGrid(lat, lon, grid);
        return gridToCanvas(transform, grid.i, grid.j, { x: 0, y: 0 });
      };
      const points = vertices.map(toCanvas);
      const colour = hasProblems ? EDGE_PROBLEM : EDGE;
      const path = (closeIt: boolean) => {
        context.beginPath();
        points.forEach((p, k) => (k === 0 ? context.moveTo(p.x, p.y) : context.lineTo(p.x, p.y)));
        if (closeIt) context.closePath();
      };
      if (points.length > 0) {
        if (closed) {
          path(true);
          context.fillStyle = "rgba(159, 211, 245, 0.18)";
          context.fill();
        }
        for (const [width, stroke] of [[4, "rgba(10, 14, 18, 0.7)"], [2, colour]] as const) {
          context.lineWidth = width;
          context.strokeStyle = stroke;
          context.lineJoin = "round";
          path(closed);
          context.stroke();
        }
        if (!closed) {
          const last = points[points.length - 1]!;
          context.setLineDash([5, 4]);
          context.lineWidth = 1.2;
          context.strokeStyle = colour;
          context.beginPath();
          if (points.length >= 3) {
            context.moveTo(last.x, last.y);
            context.lineTo(points[0]!.x, points[0]!.y);
          }
          if (pointer) {
            const at = toCanvas(pointer);
            context.moveTo(last.x, last.y);
            context.lineTo(at.x, at.y);
          }
          context.stroke();
          context.setLineDash([]);
        }
      }
      points.forEach((p, k) => {
        const size = k === 0 ? 9 : 6;
        context.fillStyle = k === 0 ? colour : "#0b0e12";
        context.strokeStyle = colour;
        context.lineWidth = 1.6;
        context.fillRect(p.x - size / 2, p.y - size / 2, size, size);
        context.strokeRect(p.x - size / 2, p.y - size / 2, size, size);
      });
    },
    [projection, vertices, closed, pointer, hasProblems],
  );
  return <LayerCanvas draw={draw} label="drawn zone" />;
}
