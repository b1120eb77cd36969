import { useCallback, useMemo } from "react";
import { gridToCanvas, LayerCanvas, paintField, traceContours, tracePolylines, type DrawLayer, type GridCanvasTransform, type GridPolylines } from "@/components/map/index.ts";
import { QUADRANT } from "@shared/meteo/jet/labels.ts";
import type { MapFrame } from "../../api/get-frame.ts";
import { QUADRANT_OPACITY, QUADRANT_STYLES, quadrantScale, quadrantWords } from "../../jet-layers/quadrant-legend.ts";
import { quadrantRegions, type QuadrantRegion } from "../../jet-layers/quadrant-regions.ts";
import { flagImage, hatchArea } from "./hatch-area.ts";
import { HATCH_SPACING_PX, JET_COLOURS } from "./jet-palette.ts";
import { useJetField } from "./use-jet-field.ts";

/** Area (CSS px²) a region needs on screen before its words are written in it. */
const LABELLED_AREA_PX = 2400;

const READING_WORDS = { favoured: "divergence favoured", ambiguous: "ambiguous", neither: null } as const;

function quadrantImage(values: Float32Array, nx: number, ny: number): HTMLCanvasElement | null {
  const image = document.createElement("canvas");
  image.width = nx;
  image.height = ny;
  const context = image.getContext("2d");
  if (!context) return null;
  const pixels = context.createImageData(nx, ny);
  paintField(values, nx, ny, quadrantScale(), pixels.data);
  context.putImageData(pixels, 0, 0);
  return image;
}

/** Each quadrant's outline (the 0.5 line of its 0/1 mask), so the partition reads whatever field lies beneath. */
function quadrantEdges(values: Float32Array, nx: number, ny: number): Array<{ colour: string; rings: GridPolylines }> {
  const mask = new Float32Array(values.length);
  return QUADRANT_STYLES.map((style) => {
    for (let k = 0; k < values.length; k++) mask[k] = values[k] === style.code ? 1 : 0;
    const rings = traceContours(mask, nx, ny, [{ value: 0.5, display: 0.5 }])[0]?.rings ?? { points: new Float32Array(0), starts: new Uint32Array(1) };
    return { colour: style.colour, rings };
  });
}

/**
 * The quadrants of each jet streak (`jet_quadrant`) shaded and outlined in their own colours, the
 * cells where the streak's shape favours upper divergence (`jet_div_favoured`) hatched with lines,
 * and those made doubtful by the axis curvature (`jet_div_ambiguous`) dotted.
 */
export function JetQuadrantsLayer({ frame }: { frame: MapFrame }) {
  const quadrant = useJetField(frame, "jet_quadrant");
  const favoured = useJetField(frame, "jet_div_favoured");
  const ambiguous = useJetField(frame, "jet_div_ambiguous");
  const { nx, ny } = frame.geometry;
  const shading = useMemo(() => (quadrant.data ? quadrantImage(quadrant.data.values, nx, ny) : null), [quadrant.data, nx, ny]);
  const edges = useMemo(() => (quadrant.data ? quadrantEdges(quadrant.data.values, nx, ny) : []), [quadrant.data, nx, ny]);
  const favouredArea = useMemo(() => (favoured.data ? flagImage(favoured.data.values, nx, ny) : null), [favoured.data, nx, ny]);
  const ambiguousArea = useMemo(() => (ambiguous.data ? flagImage(ambiguous.data.values, nx, ny) : null), [ambiguous.data, nx, ny]);
  const draw = useCallback<DrawLayer>(
    (context, { transform, pixelRatio }) => {
      if (!shading) return;
      context.imageSmoothingEnabled = false;
      context.globalAlpha = QUADRANT_OPACITY;
      context.drawImage(shading, 0, 0, transform.width, transform.height);
      context.globalAlpha = 1;
      if (favouredArea) hatchArea(context, favouredArea, transform, pixelRatio, "lines", "rgba(255, 255, 255, 0.55)", HATCH_SPACING_PX);
      if (ambiguousArea) hatchArea(context, ambiguousArea, transform, pixelRatio, "dots", "rgba(255, 255, 255, 0.75)", HATCH_SPACING_PX);
      context.lineJoin = "round";
      for (const edge of edges) {
        for (const [lineWidth, colour] of [
          [3.4, "rgba(10, 14, 18, 0.55)"],
          [1.6, edge.colour],
        ] as const) {
          context.lineWidth = lineWidth;
          context.strokeStyle = colour;
          context.beginPath();
          tracePolylines(context, edge.rings, transform);
          context.stroke();
        }
      }
    },
    [shading, edges, favouredArea, ambiguousArea],
  );
  return <LayerCanvas draw={draw} label="jet-quadrants" />;
}

/**
 * Writes each large enough patch's quadrant, and its divergence reading on a second line. The core
 * band is left unnamed: its disc and label (streak axes) mark it, and words there would hide them.
 */
function labelRegions(context: CanvasRenderingContext2D, regions: readonly QuadrantRegion[], transform: GridCanvasTransform) {
  context.textAlign = "center";
  context.textBaseline = "middle";
  context.lineJoin = "round";
  context.strokeStyle = JET_COLOURS.halo;
  context.fillStyle = "#ffffff";
  const at = { x: 0, y: 0 };
  for (const region of regions) {
    if (region.code === QUADRANT.core || region.cells * transform.cellWidth * transform.cellHeight < LABELLED_AREA_PX) continue;
    const words = quadrantWords(region.code);
    if (!words) continue;
    const reading = READING_WORDS[region.reading];
    gridToCanvas(transform, region.i, region.j, at);
    const lines: Array<[string, string]> = [[words, "700 12px Inter, system-ui, sans-serif"]];
    if (reading) lines.push([reading, "italic 600 11px Inter, system-ui, sans-serif"]);
    lines.forEach(([text, font], index) => {
      const y = at.y + (index - (lines.length - 1) / 2) * 14;
      context.font = font;
      context.lineWidth = 4;
      context.strokeText(text, at.x, y);
      context.fillText(text, at.x, y);
    });
  }
}

/** The quadrants' names on the map, drawn above the other jet layers so arrows and lines never cover them. */
export function JetQuadrantLabelsLayer({ frame }: { frame: MapFrame }) {
  const quadrant = useJetField(frame, "jet_quadrant");
  const favoured = useJetField(frame, "jet_div_favoured");
  const ambiguous = useJetField(frame, "jet_div_ambiguous");
  const { nx, ny } = frame.geometry;
  const regions = useMemo(
    () => (quadrant.data && favoured.data && ambiguous.data ? quadrantRegions(quadrant.data.values, favoured.data.values, ambiguous.data.values, nx, ny) : []),
    [quadrant.data, favoured.data, ambiguous.data, nx, ny],
  );
  const draw = useCallback<DrawLayer>((context, { transform }) => labelRegions(context, regions, transform), [regions]);
  return <LayerCanvas draw={draw} label="jet-quadrant-labels" />;
}
