import { useCallback, useMemo } from "react";
import { parseColour } from "./colour-scale.ts";
import { traceContours } from "./field-contours.ts";
import { LayerCanvas, type DrawLayer } from "./layer-canvas.tsx";
import { useMapViewport } from "./map-stage.tsx";
import { paintMask } from "./paint-mask.ts";
import { tracePolylines } from "./stroke-polylines.ts";

/** Gap between hatch lines, in CSS pixels. */
const HATCH_SPACING = 6;

/** The mask as an opaque nx × ny image; null when it does not fit the map's grid. */
function maskImage(mask: Uint8Array, nx: number, ny: number): HTMLCanvasElement | null {
  if (mask.length !== nx * ny) return null;
  const image = document.createElement("canvas");
  image.width = nx;
  image.height = ny;
  const context = image.getContext("2d");
  if (!context) return null;
  const pixels = context.createImageData(nx, ny);
  paintMask(mask, nx, ny, [255, 255, 255, 255], pixels.data);
  context.putImageData(pixels, 0, 0);
  return image;
}

/** The area's edge: the 0.5 line between cells in and out, traced like a contour. */
function maskEdge(mask: Uint8Array, nx: number, ny: number) {
  if (mask.length !== nx * ny) return null;
  const values = new Float32Array(mask.length);
  for (let k = 0; k < mask.length; k++) values[k] = mask[k]!;
  return traceContours(values, nx, ny, [{ value: 0.5, display: 0.5 }])[0]?.rings ?? null;
}

/**
 * A 0/1 mask over the map (a rule's matched area): the cells in it are tinted and hatched, and its
 * edge is outlined, so the field beneath still shows through and the area reads without relying on
 * colour alone. `colour` is a "#rrggbb" hex.
 */
export function MaskLayer({ mask, colour = "#ffffff", label = "mask" }: { mask: Uint8Array; colour?: string; label?: string }) {
  const { geometry } = useMapViewport();
  const image = useMemo(() => maskImage(mask, geometry.nx, geometry.ny), [mask, geometry.nx, geometry.ny]);
  const edge = useMemo(() => maskEdge(mask, geometry.nx, geometry.ny), [mask, geometry.nx, geometry.ny]);
  const draw = useCallback<DrawLayer>(
    (context, { transform, pixelRatio }) => {
      if (!image) return;
      const [r, g, b] = parseColour(colour);
      const { width, height } = transform;
      context.imageSmoothingEnabled = false;
      // A light tint of the whole area...
      context.globalAlpha = 0.16;
      context.drawImage(image, 0, 0, width, height);
      context.globalAlpha = 1;
      // ...diagonal hatching cut to the area (drawn on a scratch canvas, then kept only where the mask is)...
      const scratch = document.createElement("canvas");
      scratch.width = Math.max(1, Math.round(width * pixelRatio));
      scratch.height = Math.max(1, Math.round(height * pixelRatio));
      const hatch = scratch.getContext("2d");
      if (hatch) {
        hatch.setTransform(pixelRatio, 0, 0, pixelRatio, 0, 0);
        hatch.strokeStyle = `rgba(${r}, ${g}, ${b}, 0.75)`;
        hatch.lineWidth = 1;
        hatch.beginPath();
        for (let x = -height; x < width; x += HATCH_SPACING) {
          hatch.moveTo(x, height);
          hatch.lineTo(x + height, 0);
        }
        hatch.stroke();
        hatch.globalCompositeOperation = "destination-in";
        hatch.imageSmoothingEnabled = false;
        hatch.drawImage(image, 0, 0, width, height);
        context.drawImage(scratch, 0, 0, width, height);
      }
      // ...and its edge, with a dark halo so it reads on any colour.
      if (edge) {
        context.lineJoin = "round";
        for (const [lineWidth, stroke] of [
          [3, "rgba(10, 14, 18, 0.7)"],
          [1.4, `rgb(${r}, ${g}, ${b})`],
        ] as const) {
          context.lineWidth = lineWidth;
          context.strokeStyle = stroke;
          context.beginPath();
          tracePolylines(context, edge, transform);
          context.stroke();
        }
      }
    },
    [image, edge, colour],
  );
  return <LayerCanvas draw={draw} label={label} />;
}
