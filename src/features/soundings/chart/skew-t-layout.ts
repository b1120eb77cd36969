import { ICE_POINT } from "@shared/meteo/constants.ts";
import { createSkewTGeometry, type SkewTFrame, type ThermoPoint } from "./skew-t-geometry.ts";
import { defaultReferenceLines, steps } from "./reference-lines.ts";

/**
 * The fixed layout of Bellwether's skew-T: 1050–100 hPa, −40…50 °C along the bottom, isotherms at 45°,
 * with a column for wind barbs to the right of the plot. Sizes are SVG user units; the figure scales to fit.
 */
export const SKEW_T_VIEW = { width: 690, height: 640 } as const;

export const SKEW_T_FRAME: SkewTFrame = {
  left: 52,
  top: 12,
  width: 540,
  height: 590,
  bottomPressure: 105000,
  topPressure: 10000,
  leftTemperature: ICE_POINT - 40,
  rightTemperature: ICE_POINT + 50,
  skew: 1,
};

export const SKEW_T_GEOMETRY = createSkewTGeometry(SKEW_T_FRAME);

/** x of the wind-barb stations, midway across the strip right of the plot. */
export const BARB_COLUMN_X = SKEW_T_FRAME.left + SKEW_T_FRAME.width + 48;

/** Labelled isobars (Pa). */
export const ISOBARS = steps(1, 10, 1).map((n) => n * 10000).reverse();

/** Isotherms every 10 °C, as far as they reach into the plot (K). */
export const ISOTHERMS = steps(-140, 50, 10).map((c) => c + ICE_POINT);

/** Heights (m AGL) marked on the right edge of the plot. */
export const HEIGHT_MARKS = [1000, 2000, 3000, 6000, 9000, 12000];

let background: ReturnType<typeof defaultReferenceLines> | null = null;

/** Dry adiabats, pseudo-adiabats and mixing-ratio lines for this layout, computed once per page load. */
export function skewTBackground() {
  background ??= defaultReferenceLines(SKEW_T_FRAME.bottomPressure, SKEW_T_FRAME.topPressure);
  return background;
}

/** The two ends of an isotherm across the whole pressure range (it is a straight line on the diagram). */
export function isothermEnds(temperature: number): ThermoPoint[] {
  return [
    { pressure: SKEW_T_FRAME.bottomPressure, temperature },
    { pressure: SKEW_T_FRAME.topPressure, temperature },
  ];
}
