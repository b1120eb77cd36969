import { knotsFromMetersPerSecond } from "@/lib/format-units.ts";

/**
 * Geometry of one wind barb, in px relative to the station point (0, 0), SVG axes (x east, y down).
 * Convention (common practice of the trade, no single source): the staff points toward where the wind comes
 * from; speed is rounded to 5 kt; a pennant is 50 kt, a full feather 10 kt, a half feather 5 kt; feathers sit
 * at the outer end, on the low-pressure side in the Northern Hemisphere (the right of the staff looking
 * outward); a lone half feather is set one step in from the end so it cannot be read as a full one.
 */
export interface WindBarbGlyph {
  /** Speed after rounding to 5 kt. */
  roundedKnots: number;
  calm: boolean;
  staff: [number, number, number, number];
  feathers: Array<[number, number, number, number]>;
  pennants: Array<Array<[number, number]>>;
}

export interface WindBarbStyle {
  /** Staff length, px. */
  length: number;
  /** Full feather length, px. */
  featherLength: number;
  /** Distance between feathers along the staff, px. */
  spacing: number;
  /** Pennant width along the staff, px. */
  pennantWidth: number;
  /** 1 for the Northern Hemisphere (feathers on the right looking outward), −1 for the Southern. */
  side: 1 | -1;
}

export const DEFAULT_BARB_STYLE: WindBarbStyle = { length: 26, featherLength: 10, spacing: 4, pennantWidth: 5, side: 1 };

/** Feathers lean outward at 60° from the staff (a drawing choice). */
const FEATHER_ANGLE = (60 * Math.PI) / 180;

export function windBarbCounts(roundedKnots: number): { pennants: number; full: number; half: number } {
  const pennants = Math.floor(roundedKnots / 50);
  const rest = roundedKnots - pennants * 50;
  const full = Math.floor(rest / 10);
  return { pennants, full, half: rest - full * 10 >= 5 ? 1 : 0 };
}

/** The glyph for a wind of (u, v) m/s (u toward east, v toward north). */
export function windBarbGlyph(u: number, v: number, style: WindBarbStyle = DEFAULT_BARB_STYLE): WindBarbGlyph {
  const speed = Math.hypot(u, v);
  const roundedKnots = Math.round(knotsFromMetersPerSecond(speed) / 5) * 5;
  const empty: WindBarbGlyph = { roundedKnots, calm: true, staff: [0, 0, 0, 0], feathers: [], pennants: [] };
  if (roundedKnots === 0) return empty;

  // Unit vector toward where the wind comes from, on screen (north is −y).
  const dx = -u / speed;
  const dy = v / speed;
  // Right of the outward direction on screen (clockwise quarter turn with y down), flipped for the south.
  const rx = -dy * style.side;
  const ry = dx * style.side;
  const at = (s: number): [number, number] => [dx * s, dy * s];
  const featherTip = (s: number, length: number): [number, number] => [
    dx * s + (rx * Math.sin(FEATHER_ANGLE) + dx * Math.cos(FEATHER_ANGLE)) * length,
    dy * s + (ry * Math.sin(FEATHER_ANGLE) + dy * Math.cos(FEATHER_ANGLE)) * length,
  ];

  const { pennants, full, half } = windBarbCounts(roundedKnots);
  const glyph: WindBarbGlyph = { roundedKnots, calm: false, staff: [0, 0, ...at(style.length)], feathers: [], pennants: [] };
  let s = style.length;
  for (let i = 0; i < pennants; i++) {
    const tip: [number, number] = [dx * s + rx * style.featherLength, dy * s + ry * style.featherLength];
    glyph.pennants.push([at(s), tip, at(s - style.pennantWidth)]);
    s -= style.pennantWidth + (i === pennants - 1 ? style.spacing : 1);
  }
  for (let i = 0; i < full; i++) {
    glyph.feathers.push([...at(s), ...featherTip(s, style.featherLength)]);
    s -= style.spacing;
  }
  if (half) {
    if (pennants === 0 && full === 0) s -= style.spacing;
    glyph.feathers.push([...at(s), ...featherTip(s, style.featherLength / 2)]);
  }
  return glyph;
}

/**
 * Which barbs to draw when levels crowd together: walking up from the surface, keep a level only when it sits
 * at least `minGap` px above the last one kept. `ys` are screen y values, surface first (falling upward).
 */
export function thinBySpacing(ys: readonly number[], minGap: number): number[] {
  const kept: number[] = [];
  let last = Number.POSITIVE_INFINITY;
  ys.forEach((y, index) => {
    if (last - y >= minGap) {
      kept.push(index);
      last = y;
    }
  });
  return kept;
}
