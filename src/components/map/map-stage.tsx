import { createContext, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from "react";
import type { GridGeometry } from "@shared/grid/geometry-types.ts";
import { projectionForGeometry, type GridProjection } from "@shared/grid/projection.ts";
import { cellAspect, fitGridToBox, type GridCanvasTransform } from "./grid-canvas-transform.ts";

/** What every map layer needs: the grid, its projection, and where each grid point sits on screen. */
export interface MapViewport {
  geometry: GridGeometry;
  projection: GridProjection;
  transform: GridCanvasTransform;
  /** Device pixels per CSS pixel, so layers draw crisply on high-density screens. */
  pixelRatio: number;
}

const MapViewportContext = createContext<MapViewport | null>(null);

/** Where the field has no value, the map shows this dark ground. */
export const MAP_GROUND = "#0b0e12";

/** The viewport of the map this layer sits in. */
export function useMapViewport(): MapViewport {
  const viewport = useContext(MapViewportContext);
  if (!viewport) throw new Error("Map layers must be placed inside a MapStage");
  return viewport;
}

/** Follows an element's content width. */
function useContentWidth() {
  const ref = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(0);
  useEffect(() => {
    const element = ref.current;
    if (!element) return;
    const observer = new ResizeObserver(([entry]) => setWidth(Math.floor(entry!.contentRect.width)));
    observer.observe(element);
    return () => observer.disconnect();
  }, []);
  return { ref, width };
}

/**
 * The map's frame: sized to the grid's own shape within the available width (and at most
 * `maxHeight`), with its layers stacked in order inside it (base field first, overlays above).
 */
export function MapStage({ geometry, maxHeight, children }: { geometry: GridGeometry; maxHeight: number; children: ReactNode }) {
  const { ref, width } = useContentWidth();
  const projection = useMemo(() => projectionForGeometry(geometry), [geometry]);
  const transform = useMemo(() => fitGridToBox(geometry.nx, geometry.ny, cellAspect(geometry), width, maxHeight), [geometry, width, maxHeight]);
  const pixelRatio = typeof window === "undefined" ? 1 : Math.min(3, window.devicePixelRatio || 1);
  const viewport = useMemo<MapViewport>(() => ({ geometry, projection, transform, pixelRatio }), [geometry, projection, transform, pixelRatio]);

  return (
    <div ref={ref} className="w-full">
      {width > 0 && (
        // The map keeps a dark ground in both themes so the light outlines and contours read everywhere.
        <div className="relative mx-auto overflow-hidden rounded border border-line" style={{ width: transform.width, height: transform.height, background: MAP_GROUND }}>
          <MapViewportContext.Provider value={viewport}>{children}</MapViewportContext.Provider>
        </div>
      )}
    </div>
  );
}
