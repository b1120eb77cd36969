import { useEffect, useRef } from "react";
import { useMapViewport, type MapViewport } from "./map-stage.tsx";

/** Draws in CSS pixels; the canvas is already scaled for the screen's pixel density and cleared. */
export type DrawLayer = (context: CanvasRenderingContext2D, viewport: MapViewport) => void;

/**
 * One map layer: a canvas covering the map, redrawn when the viewport or `draw` changes (keep
 * `draw` stable with useCallback). Layers never take pointer events; the pointer surface on top does.
 */
export function LayerCanvas({ draw, label }: { draw: DrawLayer; label: string }) {
  const viewport = useMapViewport();
  const ref = useRef<HTMLCanvasElement>(null);

  useEffect(() => {
    const canvas = ref.current;
    const context = canvas?.getContext("2d");
    if (!canvas || !context) return;
    const { transform, pixelRatio } = viewport;
    const width = Math.max(1, Math.round(transform.width * pixelRatio));
    const height = Math.max(1, Math.round(transform.height * pixelRatio));
    if (canvas.width !== width) canvas.width = width;
    if (canvas.height !== height) canvas.height = height;
    context.setTransform(1, 0, 0, 1, 0, 0);
    context.clearRect(0, 0, width, height);
    context.setTransform(pixelRatio, 0, 0, pixelRatio, 0, 0);
    draw(context, viewport);
  }, [draw, viewport]);

  return <canvas ref={ref} data-layer={label} aria-hidden="true" className="pointer-events-none absolute inset-0 h-full w-full" />;
}
