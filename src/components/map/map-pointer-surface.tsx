import { useState, type KeyboardEvent, type MouseEvent } from "react";
import type { GeoPoint } from "@shared/grid/projection.ts";
import { cellAtCanvas } from "./grid-canvas-transform.ts";
import { useMapViewport } from "./map-stage.tsx";

/** A grid cell under the pointer or keyboard cursor, with the latitude/longitude of its centre. */
export interface MapPoint {
  i: number;
  j: number;
  lat: number;
  lon: number;
}

const KEY_STEPS: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, 1], ArrowDown: [0, -1] };

/**
 * The top of the map stack: turns pointer and keyboard into grid cells. Hovering (or moving the
 * cursor with the arrow keys while the map has focus) reports a point; a click, Enter or Space picks it.
 */
export function MapPointerSurface({ label, onPoint, onPick }: { label: string; onPoint: (point: MapPoint | null) => void; onPick: (point: MapPoint) => void }) {
  const { transform, projection } = useMapViewport();
  const [cursor, setCursor] = useState<{ i: number; j: number } | null>(null);

  const pointAt = (i: number, j: number): MapPoint => {
    const centre: GeoPoint = projection.gridToLatLon(i, j, { lat: 0, lon: 0 });
    return { i, j, lat: centre.lat, lon: centre.lon };
  };
  const moveTo = (cell: { i: number; j: number } | null) => {
    setCursor(cell);
    onPoint(cell ? pointAt(cell.i, cell.j) : null);
  };
  const cellFromEvent = (event: MouseEvent<HTMLDivElement>) => {
    const box = event.currentTarget.getBoundingClientRect();
    return cellAtCanvas(transform, event.clientX - box.left, event.clientY - box.top);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    if (event.ctrlKey || event.metaKey || event.altKey) return;
    const step = KEY_STEPS[event.key];
    if (step) {
      event.preventDefault();
      const size = event.shiftKey ? 10 : 1;
      const from = cursor ?? { i: Math.floor(transform.nx / 2), j: Math.floor(transform.ny / 2) };
      const i = Math.min(transform.nx - 1, Math.max(0, from.i + (cursor ? step[0] * size : 0)));
      const j = Math.min(transform.ny - 1, Math.max(0, from.j + (cursor ? step[1] * size : 0)));
      moveTo({ i, j });
    } else if ((event.key === "Enter" || event.key === " ") && cursor) {
      event.preventDefault();
      onPick(pointAt(cursor.i, cursor.j));
    } else if (event.key === "Escape" && cursor) {
      moveTo(null);
    }
  };

  return (
    <div
      role="application"
      aria-label={label}
      tabIndex={0}
      className="absolute inset-0 cursor-crosshair focus-visible:outline-offset-[-2px]"
      onPointerMove={(event) => {
        const cell = cellFromEvent(event);
        if (cell?.i !== cursor?.i || cell?.j !== cursor?.j) moveTo(cell);
      }}
      onPointerLeave={() => moveTo(null)}
      onClick={(event) => {
        const cell = cellFromEvent(event);
        if (cell) onPick(pointAt(cell.i, cell.j));
      }}
      onKeyDown={onKeyDown}
    >
      {cursor && (
        <div
          aria-hidden="true"
          className="pointer-events-none absolute border border-white shadow-[0_0_0_1px_rgba(0,0,0,0.6)]"
          style={{
            left: cursor.i * transform.cellWidth + transform.cellWidth / 2 - Math.max(transform.cellWidth, 8) / 2,
            top: (transform.ny - 1 - cursor.j) * transform.cellHeight + transform.cellHeight / 2 - Math.max(transform.cellHeight, 8) / 2,
            width: Math.max(transform.cellWidth, 8),
            height: Math.max(transform.cellHeight, 8),
          }}
        />
      )}
    </div>
  );
}
