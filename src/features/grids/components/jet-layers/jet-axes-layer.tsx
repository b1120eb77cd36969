import { useCallback, useMemo } from "react";
import { gridToCanvas, LayerCanvas, tracePolylines, type DrawLayer, type GridCanvasTransform } from "@/components/map/index.ts";
import type { JetStreakDto } from "@shared/api/grids.ts";
import type { MapFrame } from "../../api/get-frame.ts";
import { useJetStreaks } from "../../api/get-jet-streaks.ts";
import { axisPolylines, coreDirection, coreLabelBox, downstreamEnd } from "../../jet-layers/axis-projection.ts";
import { coreLabel } from "../../jet-layers/streak-words.ts";
import { JET_COLOURS } from "./jet-palette.ts";

const LABEL_FONT = "600 12px Inter, system-ui, sans-serif";
const LABEL_PADDING = 5;
const LABEL_HEIGHT = 20;

/** A filled arrowhead at the axis's downstream end, so the flow direction reads along the line. */
function addArrowhead(context: CanvasRenderingContext2D, streak: JetStreakDto, transform: GridCanvasTransform) {
  const end = downstreamEnd(streak.axis, transform);
  if (!end) return;
  const size = 11;
  const baseX = end.x - end.dirX * size;
  const baseY = end.y - end.dirY * size;
  context.moveTo(end.x, end.y);
  context.lineTo(baseX - end.dirY * size * 0.5, baseY + end.dirX * size * 0.5);
  context.lineTo(baseX + end.dirY * size * 0.5, baseY - end.dirX * size * 0.5);
  context.closePath();
}

/** The core: a gold disc with a dark ring, and its speed and curvature in a label beside it. */
function drawCore(context: CanvasRenderingContext2D, streak: JetStreakDto, number: number | null, transform: GridCanvasTransform) {
  const core = gridToCanvas(transform, streak.core.i, streak.core.j, { x: 0, y: 0 });
  context.beginPath();
  context.arc(core.x, core.y, 7, 0, 2 * Math.PI);
  context.fillStyle = JET_COLOURS.axis;
  context.fill();
  context.lineWidth = 2.5;
  context.strokeStyle = JET_COLOURS.halo;
  context.stroke();

  const text = number === null ? coreLabel(streak) : `${number}: ${coreLabel(streak)}`;
  context.font = LABEL_FONT;
  const width = context.measureText(text).width + 2 * LABEL_PADDING;
  const box = coreLabelBox(core, coreDirection(streak.axis, transform), { width, height: LABEL_HEIGHT }, transform);
  context.fillStyle = "rgba(10, 14, 18, 0.88)";
  context.strokeStyle = JET_COLOURS.axis;
  context.lineWidth = 1;
  context.beginPath();
  context.roundRect(box.x, box.y, width, LABEL_HEIGHT, 4);
  context.fill();
  context.stroke();
  context.fillStyle = "#ffffff";
  context.textAlign = "left";
  context.textBaseline = "middle";
  context.fillText(text, box.x + LABEL_PADDING, box.y + LABEL_HEIGHT / 2);
}

/** Each streak's traced axis (upstream → downstream, with an arrowhead) and its core with speed in knots and curvature in words. */
export function JetAxesLayer({ frame }: { frame: MapFrame }) {
  const streaks = useJetStreaks(frame.id);
  const list = streaks.data?.streaks;
  const lines = useMemo(() => (list ? axisPolylines(list) : null), [list]);
  const draw = useCallback<DrawLayer>(
    (context, { transform }) => {
      if (!list || !lines) return;
      context.lineJoin = "round";
      context.lineCap = "round";
      for (const [lineWidth, colour] of [
        [6, JET_COLOURS.halo],
        [3, JET_COLOURS.axis],
      ] as const) {
        context.lineWidth = lineWidth;
        context.strokeStyle = colour;
        context.fillStyle = colour;
        context.beginPath();
        tracePolylines(context, lines, transform);
        context.stroke();
        context.beginPath();
        for (const streak of list) addArrowhead(context, streak, transform);
        context.fill();
        context.stroke();
      }
      list.forEach((streak, index) => drawCore(context, streak, list.length > 1 ? index + 1 : null, transform));
    },
    [list, lines],
  );
  return <LayerCanvas draw={draw} label="jet-axes" />;
}
