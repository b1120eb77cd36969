import { useCallback, useMemo } from "react";
import type { ColourScale } from "./colour-scale.ts";
import { paintField } from "./paint-field.ts";
import type { FieldValues } from "./field-values.ts";
import { LayerCanvas, type DrawLayer } from "./layer-canvas.tsx";

/** The field itself, one image pixel per grid cell, painted once per field and scale. */
function paintedImage(field: FieldValues, scale: ColourScale): HTMLCanvasElement | null {
  const image = document.createElement("canvas");
  image.width = field.nx;
  image.height = field.ny;
  const context = image.getContext("2d");
  if (!context) return null;
  const pixels = context.createImageData(field.nx, field.ny);
  paintField(field.values, field.nx, field.ny, scale, pixels.data);
  context.putImageData(pixels, 0, 0);
  return image;
}

/**
 * The base layer: the grid image stretched over the map with smoothing off, so each grid cell is
 * a crisp block of pixels and what is seen is exactly what is stored.
 */
export function FieldRasterLayer({ field, scale }: { field: FieldValues; scale: ColourScale }) {
  const image = useMemo(() => paintedImage(field, scale), [field, scale]);
  const draw = useCallback<DrawLayer>(
    (context, { transform }) => {
      if (!image) return;
      context.imageSmoothingEnabled = false;
      context.drawImage(image, 0, 0, transform.width, transform.height);
    },
    [image],
  );
  return <LayerCanvas draw={draw} label="field" />;
}
