import type { GridCanvasTransform } from "@/components/map/index.ts";

export type HatchPattern = "lines" | "dots";

/** A field's cells where the value is 1, as an opaque nx × ny image for cutting patterns to (null when none is set). */
export function flagImage(values: Float32Array, nx: number, ny: number): HTMLCanvasElement | null {
  const image = document.createElement("canvas");
  image.width = nx;
  image.height = ny;
  const context = image.getContext("2d");
  if (!context) return null;
  const pixels = context.createImageData(nx, ny);
  let any = false;
  for (let j = 0; j < ny; j++) {
    // Image rows run north to south, grid rows south to north.
    const row = (ny - 1 - j) * nx;
    for (let i = 0; i < nx; i++) {
      if (values[j * nx + i] !== 1) continue;
      pixels.data.fill(255, (row + i) * 4, (row + i) * 4 + 4);
      any = true;
    }
  }
  if (!any) return null;
  context.putImageData(pixels, 0, 0);
  return image;
}

/**
 * Draws a pattern over the cells set in `area` only: the pattern is drawn on a scratch canvas,
 * cut to the area there, then laid over the map. Lines mark one reading and dots another, so the
 * two differ without relying on colour.
 */
export function hatchArea(
  context: CanvasRenderingContext2D,
  area: HTMLCanvasElement,
  transform: GridCanvasTransform,
  pixelRatio: number,
  pattern: HatchPattern,
  colour: string,
  spacing: number,
): void {
  const { width, height } = transform;
  const scratch = document.createElement("canvas");
  scratch.width = Math.max(1, Math.round(width * pixelRatio));
  scratch.height = Math.max(1, Math.round(height * pixelRatio));
  const hatch = scratch.getContext("2d");
  if (!hatch) return;
  hatch.setTransform(pixelRatio, 0, 0, pixelRatio, 0, 0);
  hatch.strokeStyle = colour;
  hatch.fillStyle = colour;
  hatch.lineWidth = 1.3;
  hatch.beginPath();
  if (pattern === "lines") {
    for (let x = -height; x < width; x += spacing) {
      hatch.moveTo(x, height);
      hatch.lineTo(x + height, 0);
    }
    hatch.stroke();
  } else {
    for (let y = spacing / 2; y < height; y += spacing) {
      for (let x = spacing / 2; x < width; x += spacing) {
        hatch.moveTo(x + 1.6, y);
        hatch.arc(x, y, 1.6, 0, 2 * Math.PI);
      }
    }
    hatch.fill();
  }
  hatch.globalCompositeOperation = "destination-in";
  hatch.imageSmoothingEnabled = false;
  hatch.drawImage(area, 0, 0, width, height);
  context.drawImage(scratch, 0, 0, width, height);
}
