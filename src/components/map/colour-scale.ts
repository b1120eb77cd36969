import { scaleLinear } from "d3-scale";
import {
  interpolateCividis,
  interpolateInferno,
  interpolateMagma,
  interpolatePlasma,
  interpolateRdBu,
  interpolateViridis,
  schemeTableau10,
} from "d3-scale-chromatic";
import { toDisplayValue, type MapField, type MapFieldGroup } from "./map-fields.ts";

/**
 * How a field is coloured on the map. Magnitudes get a sequential perceptual ramp, fields whose
 * sign matters a diverging ramp centred on zero, and flags and categories one colour per code.
 * Ramps are sampled once into a 256-entry lookup table so painting a grid is a table lookup per point.
 */

export const RAMP_STEPS = 256;
/** About this many round-number ticks on a ramp's legend; the ramp's ends are rounded to the same steps. */
const LEGEND_TICKS = 6;

export interface RampScale {
  kind: "sequential" | "diverging";
  /** Storage-unit values at the two ends of the ramp; values beyond are drawn in the end colours. */
  domain: readonly [number, number];
  interpolator: (t: number) => string;
  /** RGBA for RAMP_STEPS evenly spaced points from domain[0] to domain[1]. */
  lut: Uint8ClampedArray;
  /** Round numbers in display units for the legend, with their place along the ramp (0..1). */
  ticks: ReadonlyArray<{ display: number; at: number }>;
}

export interface CategoryEntry {
  code: number;
  label: string;
  /** Null: drawn clear so the map beneath shows (a flag that is off, the "none" category). */
  colour: string | null;
}

export interface CategoricalScale {
  kind: "categorical";
  entries: readonly CategoryEntry[];
  /** RGBA per code, from `minCode` upwards; codes outside the table are drawn clear. */
  minCode: number;
  lut: Uint8ClampedArray;
}

export type ColourScale = RampScale | CategoricalScale;

/** Perceptual sequential ramps per theme (all from d3-scale-chromatic; none is a rainbow). */
const SEQUENTIAL_BY_GROUP: Record<MapFieldGroup, (t: number) => string> = {
  buoyancy: interpolateInferno,
  shear: interpolateViridis,
  helicity: interpolatePlasma,
  moisture: interpolateViridis,
  lapse: interpolateMagma,
  composite: interpolateMagma,
  jet: interpolateViridis,
  frontogenesis: interpolateMagma,
  model: interpolateCividis,
  other: interpolateCividis,
};

/** Negative blue, positive red: RdBu runs red to blue, so it is read backwards. */
const diverging = (t: number) => interpolateRdBu(1 - t);

/** "#rrggbb" or "rgb(r, g, b)" (the two forms d3-scale-chromatic returns) → [r, g, b]. */
export function parseColour(colour: string): [number, number, number] {
  const hex = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(colour);
  if (hex) return [parseInt(hex[1]!, 16), parseInt(hex[2]!, 16), parseInt(hex[3]!, 16)];
  const rgb = /^rgb\(\s*(\d+),\s*(\d+),\s*(\d+)\s*\)$/.exec(colour);
  if (rgb) return [Number(rgb[1]), Number(rgb[2]), Number(rgb[3])];
  throw new Error(`Unrecognised colour "${colour}"`);
}

function sampleRamp(interpolator: (t: number) => string): Uint8ClampedArray {
  const lut = new Uint8ClampedArray(RAMP_STEPS * 4);
  for (let k = 0; k < RAMP_STEPS; k++) {
    const [r, g, b] = parseColour(interpolator(k / (RAMP_STEPS - 1)));
    lut.set([r, g, b, 255], k * 4);
  }
  return lut;
}

/** A finite [min, max], or null when the field has no values at all. */
export interface ValueRange {
  min: number | null;
  max: number | null;
}

/**
 * The ramp's ends, chosen in display units so the legend reads in round numbers (knots, not m/s),
 * then carried back to storage units. Diverging ramps are symmetric about zero, or end at zero for
 * a field that cannot be positive.
 */
function rampDomain(field: MapField, range: ValueRange, isDiverging: boolean): { storage: [number, number]; display: [number, number] } {
  const scale = field.display.scale || 1;
  const toStorage = (display: number) => (display - field.display.offset) / scale;
  const min = range.min !== null && Number.isFinite(range.min) ? range.min : 0;
  const max = range.max !== null && Number.isFinite(range.max) ? range.max : min;
  let lo = toDisplayValue(field, min);
  let hi = toDisplayValue(field, max);
  if (isDiverging) {
    const centre = toDisplayValue(field, 0);
    const reach = Math.max(Math.abs(lo - centre), Math.abs(hi - centre)) || 1;
    // Half the legend's tick count per side, so both ends of a symmetric ramp land on a tick.
    const niced = scaleLinear().domain([0, reach]).nice(field.neverPositive ? LEGEND_TICKS : LEGEND_TICKS / 2).domain()[1]!;
    lo = centre - niced;
    hi = field.neverPositive ? centre : centre + niced;
  } else {
    if (!(hi > lo)) hi = lo + 1;
    [lo, hi] = scaleLinear().domain([lo, hi]).nice(LEGEND_TICKS).domain() as [number, number];
  }
  return { storage: [toStorage(lo), toStorage(hi)], display: [lo, hi] };
}

/** The negative half of the diverging ramp, for fields that are never above zero: zero keeps the ramp's neutral middle. */
const divergingNegativeHalf = (t: number) => diverging(t / 2);

function rampScale(field: MapField, range: ValueRange): RampScale {
  const kind = field.signed ? "diverging" : "sequential";
  const interpolator = kind === "sequential" ? SEQUENTIAL_BY_GROUP[field.group] : field.neverPositive ? divergingNegativeHalf : diverging;
  const { storage, display } = rampDomain(field, range, kind === "diverging");
  const ticks = scaleLinear()
    .domain(display)
    .ticks(LEGEND_TICKS)
    .map((value) => ({ display: value, at: (value - display[0]) / (display[1] - display[0]) }));
  return { kind, domain: storage, interpolator, lut: sampleRamp(interpolator), ticks };
}

/** The colour a flag that is on gets: one calm, clearly visible colour from the same categorical scheme. */
const FLAG_ON_COLOUR = schemeTableau10[1]!;

function categoricalScale(field: MapField): CategoricalScale {
  const entries: CategoryEntry[] =
    field.kind === "bool"
      ? [
          { code: 0, label: "no", colour: null },
          { code: 1, label: "yes", colour: FLAG_ON_COLOUR },
        ]
      : field.categories.map((category, index) => ({
          code: category.code,
          label: category.label,
          colour: category.label === "none" ? null : schemeTableau10[index % schemeTableau10.length]!,
        }));
  const codes = entries.map((entry) => entry.code);
  const minCode = Math.min(...codes);
  const lut = new Uint8ClampedArray((Math.max(...codes) - minCode + 1) * 4);
  for (const entry of entries) {
    if (!entry.colour) continue;
    const [r, g, b] = parseColour(entry.colour);
    lut.set([r, g, b, 235], (entry.code - minCode) * 4);
  }
  return { kind: "categorical", entries, minCode, lut };
}

/** Picks and builds the colour scale for a field whose values span `range` (storage units). */
export function chooseColourScale(field: MapField, range: ValueRange): ColourScale {
  if (field.kind === "bool" || (field.kind === "category" && field.categories.length > 0)) return categoricalScale(field);
  return rampScale(field, range);
}

/** Enough decimals to tell neighbouring ticks apart, and no more (ticks 0, 0.5, 1 → 1; 0, 1000 → 0). */
export function tickDecimals(ticks: ReadonlyArray<{ display: number }>): number {
  const step = ticks.length > 1 ? Math.abs(ticks[1]!.display - ticks[0]!.display) : 1;
  return step > 0 ? Math.max(0, Math.min(4, -Math.floor(Math.log10(step) + 1e-9))) : 0;
}

/** The union of several ranges (the frames of one run), ignoring frames with no values. */
export function unionRange(ranges: readonly ValueRange[]): ValueRange {
  let min: number | null = null;
  let max: number | null = null;
  for (const range of ranges) {
    if (range.min !== null && Number.isFinite(range.min)) min = min === null ? range.min : Math.min(min, range.min);
    if (range.max !== null && Number.isFinite(range.max)) max = max === null ? range.max : Math.max(max, range.max);
  }
  return { min, max };
}
