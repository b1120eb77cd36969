import { useCallback, useMemo } from "react";
import { LayerCanvas, labelContourLevels, traceContours, tracePolylines, type ContourLevel, type DrawLayer } from "@/components/map/index.ts";
import type { MapFrame } from "../../api/get-frame.ts";
import { isotachLevels, isotachLineWidth } from "../../jet-layers/isotach-levels.ts";
import { JET_COLOURS } from "./jet-palette.ts";
import { useJetField } from "./use-jet-field.ts";

/** Traced lines per loaded speed field, so the lines and their labels (two canvases) trace once. */
const traced = new WeakMap<Float32Array, { maxSpeed: number | null; levels: ContourLevel[] }>();

function useIsotachs(frame: MapFrame): ContourLevel[] {
  const speed = useJetField(frame, "jet_speed");
  const maxSpeed = frame.fields.find((field) => field.key === "jet_speed")?.max ?? null;
  return useMemo(() => {
    if (!speed.data) return [];
    const known = traced.get(speed.data.values);
    if (known && known.maxSpeed === maxSpeed) return known.levels;
    const levels = traceContours(speed.data.values, speed.data.nx, speed.data.ny, isotachLevels(maxSpeed));
    traced.set(speed.data.values, { maxSpeed, levels });
    return levels;
  }, [speed.data, maxSpeed]);
}

/** Isotachs of the smoothed jet-level speed, every 10 kt from 60 kt; faster lines a little heavier. */
export function JetIsotachsLayer({ frame }: { frame: MapFrame }) {
  const levels = useIsotachs(frame);
  const draw = useCallback<DrawLayer>(
    (context, { transform }) => {
      context.lineJoin = "round";
      context.lineCap = "round";
      for (const level of levels) {
        const width = isotachLineWidth(level.display);
        for (const [lineWidth, colour] of [
          [width + 2, JET_COLOURS.halo],
          [width, JET_COLOURS.isotach],
        ] as const) {
          context.lineWidth = lineWidth;
          context.strokeStyle = colour;
          context.beginPath();
          tracePolylines(context, level.rings, transform);
          context.stroke();
        }
      }
    },
    [levels],
  );
  return <LayerCanvas draw={draw} label="jet-isotachs" />;
}

/** Each isotach's speed in knots, written above the other layers. */
export function JetIsotachLabelsLayer({ frame }: { frame: MapFrame }) {
  const levels = useIsotachs(frame);
  const draw = useCallback<DrawLayer>(
    (context, { transform }) => labelContourLevels(context, levels, transform, (level) => `${level.display} kt`, JET_COLOURS.isotach),
    [levels],
  );
  return <LayerCanvas draw={draw} label="jet-isotach-labels" />;
}
