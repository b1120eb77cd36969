import { useCallback, useMemo } from "react";
import { LayerCanvas, labelContourLevels, traceContours, tracePolylines, type DrawLayer } from "@/components/map/index.ts";
import type { MapFrame } from "../../api/get-frame.ts";
import { isotachLevels, isotachLineWidth } from "../../jet-layers/isotach-levels.ts";
import { JET_COLOURS } from "./jet-palette.ts";
import { useJetField } from "./use-jet-field.ts";

/** Isotachs of the smoothed jet-level speed, every 10 kt from 60 kt, each labelled in knots. */
export function JetIsotachsLayer({ frame }: { frame: MapFrame }) {
  const speed = useJetField(frame, "jet_speed");
  const maxSpeed = frame.fields.find((field) => field.key === "jet_speed")?.max ?? null;
  const levels = useMemo(
    () => (speed.data ? traceContours(speed.data.values, speed.data.nx, speed.data.ny, isotachLevels(maxSpeed)) : []),
    [speed.data, maxSpeed],
  );
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
      labelContourLevels(context, levels, transform, (level) => `${level.display} kt`, JET_COLOURS.isotach);
    },
    [levels],
  );
  return <LayerCanvas draw={draw} label="jet-isotachs" />;
}
