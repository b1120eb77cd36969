import { useState, type KeyboardEvent, type MouseEvent } from "react";
import { canvasToGrid, cellAtCanvas, useMapViewport } from "@/components/map/index.ts";
import type { LonLat } from "../../drawing/polygon-drawing.ts";

const KEY_STEPS: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, 1], ArrowDown: [0, -1] };

/**
 * The top of the drawing map: a click adds a vertex exactly where it lands (not snapped to a grid
 * point), a double-click or Enter closes the ring, Backspace takes the last vertex back. Without a
 * mouse, the arrow keys move a cursor cell by cell (Shift: ten) and Space adds a vertex there.
 */
export function DrawingSurface({
  label,
  onAdd,
  onClose,
  onUndo,
  onPointer,
}: {
  label: string;
  onAdd: (vertex: LonLat) => void;
  onClose: () => void;
  onUndo: () => void;
  onPointer: (vertex: LonLat | null) => void;
}) {
  const { transform, projection } = useMapViewport();
  const [cursor, setCursor] = useState<{ i: number; j: number } | null>(null);

  const lonLatAt = (i: number, j: number): LonLat => {
    const at = projection.gridToLatLon(i, j, { lat: 0, lon: 0 });
    return [at.lon, at.lat];
  };
  const fromEvent = (event: MouseEvent<HTMLDivElement>): LonLat | null => {
    const box = event.currentTarget.getBoundingClientRect();
    const x = event.clientX - box.left;
    const y = event.clientY - box.top;
    if (!cellAtCanvas(transform, x, y)) return null;
    const grid = canvasToGrid(transform, x, y, { i: 0, j: 0 });
    return lonLatAt(grid.i, grid.j);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    if (event.ctrlKey || event.metaKey || event.altKey) return;
    const step = KEY_STEPS[event.key];
    if (step) {
      event.preventDefault();
      const size = event.shiftKey ? 10 : 1;
      const from = cursor ?? { i: Math.floor(transform.nx / 2), j: Math.floor(transform.ny / 2) };
      const next = {
        i: Math.min(transform.nx - 1, Math.max(0, from.i + (cursor ? step[0] * size : 0))),
        j: Math.min(transform.ny - 1, Math.max(0, from.j + (cursor ? step[1] * size : 0))),
      };
      setCursor(next);
      onPointer(lonLatAt(next.i, next.j));
    } else if (event.key === " " && cursor) {
      event.preventDefault();
      onAdd(lonLatAt(cursor.i, cursor.j));
    } else if (event.key === "Enter") {
      event.preventDefault();
      onClose();
    } else if (event.key === "Backspace") {
      event.preventDefault();
      onUndo();
    }
  };

  return (
    <div
      role="application"
      aria-label={label}
      tabIndex={0}
      className="absolute inset-0 cursor-crosshair focus-visible:outline-offset-[-2px]"
      onPointerMove={(event) => onPointer(fromEvent(event))}
      onPointerLeave={() => onPointer(null)}
      onClick={(event) => {
        // The second click of a double-click is the closing gesture, not another vertex.
        if (event.detail > 1) return;
        const at = fromEvent(event);
        if (at) onAdd(at);
      }}
      onDoubleClick={(event) => {
        event.preventDefault();
        onClose();
      }}
      onKeyDown={onKeyDown}
    >
      {cursor && (
        <div
          aria-hidden="true"
          className="pointer-events-none absolute h-3 w-3 -translate-x-1/2 -translate-y-1/2 rounded-full border border-white shadow-[0_0_0_1px_rgba(0,0,0,0.6)]"
          style={{ left: (cursor.i + 0.5) * transform.cellWidth, top: (transform.ny - 0.5 - cursor.j) * transform.cellHeight }}
        />
      )}
    </div>
  );
}
