import { QUADRANT } from "@shared/meteo/jet/labels.ts";
import type { CategoricalScale } from "@/components/map/index.ts";
import { parseColour } from "@/components/map/index.ts";

/**
 * How the jet-streak quadrants (`jet_quadrant`) are shown: each code's words and Bellwether's own
 * colour for it. Entrance quadrants take cool colours and exit quadrants warm ones, so the flow's
 * direction through the streak reads at a glance; left and right differ in hue and lightness.
 */
export interface QuadrantStyle {
  code: number;
  words: string;
  colour: string;
}

export const QUADRANT_STYLES: readonly QuadrantStyle[] = [
  { code: QUADRANT.leftEntrance, words: "left entrance", colour: "#6fa8ff" },
  { code: QUADRANT.rightEntrance, words: "right entrance", colour: "#2fc4a4" },
  { code: QUADRANT.core, words: "core", colour: "#f3eeb4" },
  { code: QUADRANT.leftExit, words: "left exit", colour: "#ffa552" },
  { code: QUADRANT.rightExit, words: "right exit", colour: "#dc6fc5" },
];

/** Opacity of the quadrant shading, low enough for the field beneath to show through. */
export const QUADRANT_OPACITY = 0.35;

/** The words for a `jet_quadrant` code; null for "none" and for codes the catalogue does not have. */
export function quadrantWords(code: number): string | null {
  return QUADRANT_STYLES.find((style) => style.code === code)?.words ?? null;
}

/** The quadrant colours as a categorical scale, so the map kit's painter can colour the grid in one pass ("none" stays clear). */
export function quadrantScale(): CategoricalScale {
  const codes = QUADRANT_STYLES.map((style) => style.code);
  const minCode = Math.min(QUADRANT.none, ...codes);
  const lut = new Uint8ClampedArray((Math.max(...codes) - minCode + 1) * 4);
  for (const style of QUADRANT_STYLES) {
    const [r, g, b] = parseColour(style.colour);
    lut.set([r, g, b, 255], (style.code - minCode) * 4);
  }
  return {
    kind: "categorical",
    entries: [{ code: QUADRANT.none, label: "none", colour: null }, ...QUADRANT_STYLES.map((style) => ({ code: style.code, label: style.words, colour: style.colour }))],
    minCode,
    lut,
  };
}
