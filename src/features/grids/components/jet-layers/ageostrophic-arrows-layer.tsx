import { useCallback, useMemo } from "react";
import { LayerCanvas, useMapViewport, type DrawLayer } from "@/components/map/index.ts";
import type { MapFrame } from "../../api/get-frame.ts";
import { ageostrophicArrows, type ArrowSamples } from "../../jet-layers/ageostrophic-arrows.ts";
import { SHORTEST_ARROW_PX } from "../../jet-layers/arrow-scale.ts";
import { JET_COLOURS } from "./jet-palette.ts";
import { useAgeostrophicWind } from "./use-arrow-scale.ts";


/** Adds one arrow centred on (x, y) to the path: shaft and an open head. */
function addArrow(context: CanvasRenderingContext2D, x: number, y: number, dirX: number, dirY: number, length: number) {
  const half = length / 2;
  const tipX = x + dirX * half;
  const tipY = y + dirY * half;
  context.moveTo(x - dirX * half, y - dirY * half);
  context.lineTo(tipX, tipY);
  const head = Math.min(6, Math.max(3, length * 0.35));
  // The head's two barbs, 28° either side of the shaft.
  const c = Math.cos(0.49);
  const s = Math.sin(0.49);
  context.moveTo(tipX - head * (dirX * c - dirY * s), tipY - head * (dirY * c + dirX * s));
  context.lineTo(tipX, tipY);
  context.lineTo(tipX - head * (dirX * c + dirY * s), tipY - head * (dirY * c - dirX * s));
}

function addArrows(context: CanvasRenderingContext2D, samples: ArrowSamples, pixelsPerMetrePerSecond: number) {
  for (let k = 0; k < samples.count; k++) {
    const length = samples.speed[k]! * pixelsPerMetrePerSecond;
    if (length >= SHORTEST_ARROW_PX) addArrow(context, samples.x[k]!, samples.y[k]!, samples.dirX[k]!, samples.dirY[k]!, length);
  }
}

/**
 * The ageostrophic wind at the jet level (`jet_uag`, `jet_vag`) as arrows, thinned to a readable
 * density, turned from east/north into the map's own directions, and scaled to the key arrow the
 * legend shows.
 */
export function AgeostrophicArrowsLayer({ frame }: { frame: MapFrame }) {
  const { geometry, transform } = useMapViewport();
  const { u, v, scale } = useAgeostrophicWind(frame);
  const samples = useMemo(() => (u && v ? ageostrophicArrows(u.values, v.values, geometry, transform) : null), [u, v, geometry, transform]);
  const draw = useCallback<DrawLayer>(
    (context) => {
      if (!samples || !scale) return;
      context.lineJoin = "round";
      context.lineCap = "round";
      for (const [lineWidth, colour] of [
        // A firm halo: the arrows must also read over the pale middle of diverging ramps.
        [3, "rgba(10, 14, 18, 0.72)"],
        [1.2, JET_COLOURS.arrow],
      ] as const) {
        context.lineWidth = lineWidth;
        context.strokeStyle = colour;
        context.beginPath();
        addArrows(context, samples, scale.pixelsPerMetrePerSecond);
        context.stroke();
      }
    },
    [samples, scale],
  );
  return <LayerCanvas draw={draw} label="jet-ageostrophic-arrows" />;
}
