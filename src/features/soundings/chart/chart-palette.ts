import { interpolateViridis } from "d3-scale-chromatic";
import type { Theme } from "@/lib/theme.tsx";
import type { ParcelId } from "../parcels.ts";
import { HEIGHT_BANDS } from "./hodograph-geometry.ts";

/**
 * Bellwether's own chart colours for the sounding figures, one set per theme. The low layers of the hodograph
 * stand out most in both themes (bright on dark, dark on light); band colours are samples of the perceptual
 * viridis ramp. Parcel paths differ by dash pattern as well as colour, so they read without colour too.
 */
export interface ChartPalette {
  grid: string;
  gridStrong: string;
  dryAdiabat: string;
  moistAdiabat: string;
  mixingRatio: string;
  label: string;
  temperature: string;
  dewpoint: string;
  positiveArea: string;
  negativeArea: string;
  parcels: Record<ParcelId, string>;
  barb: string;
  bands: readonly string[];
  stormMotion: string;
  inflow: string;
  cursor: string;
}

export const PARCEL_DASHES: Record<ParcelId, string> = { sb: "7 4", ml: "", mu: "2 3" };

const darkBands = [0.95, 0.72, 0.5, 0.32].map(interpolateViridis);
const lightBands = [0.02, 0.38, 0.62, 0.82].map(interpolateViridis);

const PALETTES: Record<Theme, ChartPalette> = {
  dark: {
    grid: "#2a323a",
    gridStrong: "#3b4650",
    dryAdiabat: "#6b5a48",
    moistAdiabat: "#44614f",
    mixingRatio: "#4a5e6e",
    label: "#8995a0",
    temperature: "#ef9a6c",
    dewpoint: "#62c2ae",
    positiveArea: "#e3a857",
    negativeArea: "#6f9fd8",
    parcels: { sb: "#c7a6ea", ml: "#f1e3a4", mu: "#9cc6f2" },
    barb: "#c5ced6",
    bands: darkBands,
    stormMotion: "#f2f4f5",
    inflow: "#86b7d6",
    cursor: "#e5bf68",
  },
  light: {
    grid: "#dde2dc",
    gridStrong: "#c3cac2",
    dryAdiabat: "#d8c3ad",
    moistAdiabat: "#b5cfbd",
    mixingRatio: "#b7c6d3",
    label: "#5a6570",
    temperature: "#b8512a",
    dewpoint: "#1c7a68",
    positiveArea: "#d68a1f",
    negativeArea: "#3f76b8",
    parcels: { sb: "#7a4bb0", ml: "#6b5a00", mu: "#245b85" },
    barb: "#2a333b",
    bands: lightBands,
    stormMotion: "#182026",
    inflow: "#245b85",
    cursor: "#8f6300",
  },
};

export function chartPalette(theme: Theme): ChartPalette {
  return PALETTES[theme];
}

/** Hodograph band colour by band index (HEIGHT_BANDS order). */
export function bandColor(palette: ChartPalette, index: number): string {
  return palette.bands[Math.min(index, HEIGHT_BANDS.length - 1)];
}
