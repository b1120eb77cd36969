import { useCallback } from "react";
import { LayerCanvas, gridToCanvas, type DrawLayer } from "@/components/map/index.ts";
import type { StormReportDto } from "@shared/api/storm-reports.ts";
import { useStormReports } from "../api/storm-reports.ts";

const HOUR_MS = 3_600_000;

/** Outlined marks readable over any field colour: tornado triangle, hail circle, wind square. */
function mark(context: CanvasRenderingContext2D, kind: StormReportDto["kind"], x: number, y: number, r: number) {
  context.beginPath();
  if (kind === "tornado") {
    context.moveTo(x, y - r * 1.2);
    context.lineTo(x + r * 1.1, y + r * 0.8);
    context.lineTo(x - r * 1.1, y + r * 0.8);
    context.closePath();
  } else if (kind === "wind") {
    context.rect(x - r * 0.9, y - r * 0.9, r * 1.8, r * 1.8);
  } else {
    context.arc(x, y, r, 0, 2 * Math.PI);
  }
}

const FILL: Record<StormReportDto["kind"], string> = { tornado: "#f4f1ea", hail: "#9fd3e6", wind: "#e8c7f0" };

/**
 * Storm reports observed within `hours` of a frame's valid time, drawn over the map of that frame
 * (inside a MapStage of the map kit). For the grids viewer's overlay list:
 *   { id: "storm-reports", label: "Storm reports (±1 h)", visibleByDefault: true,
 *     render: ({ frame }) => <StormReportsLayer validTime={frame.validTime} /> }
 */
export function StormReportsLayer({ validTime, hours = 1 }: { validTime: string; hours?: number }) {
  const at = Date.parse(validTime);
  const reports = useStormReports({ from: new Date(at - hours * HOUR_MS).toISOString(), to: new Date(at + hours * HOUR_MS).toISOString(), limit: 2000 }, Number.isFinite(at));
  const draw = useCallback<DrawLayer>(
    (context, { projection, transform }) => {
      const list = reports.data?.reports ?? [];
      const grid = { i: 0, j: 0 };
      const xy = { x: 0, y: 0 };
      const r = Math.max(4, Math.min(transform.cellWidth, transform.cellHeight) * 0.8);
      for (const report of list) {
        projection.latLonToGrid(report.latitude, report.longitude, grid);
        if (grid.i < -0.5 || grid.j < -0.5 || grid.i > transform.nx - 0.5 || grid.j > transform.ny - 0.5) continue;
        gridToCanvas(transform, grid.i, grid.j, xy);
        mark(context, report.kind, xy.x, xy.y, r);
        context.lineWidth = 3;
        context.strokeStyle = "rgba(10, 14, 18, 0.85)";
        context.stroke();
        context.fillStyle = FILL[report.kind];
        context.fill();
      }
    },
    [reports.data],
  );
  return <LayerCanvas draw={draw} label="storm-reports" />;
}
