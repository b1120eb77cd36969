/**
 * Which isobaric level the jet diagnostics run on.
 *
 * "max-wind" mode picks one level per frame, not one per point: divergence, vorticity and the geostrophic
 * wind are derivatives along a single pressure surface, and a patchwork of levels chosen point by point
 * would difference winds and heights from different surfaces wherever the choice jumps.
 */
import type { Hemisphere } from "../column/column-options.ts";
import type { JetSettings } from "./jet-settings.ts";

export type { Hemisphere } from "../column/column-options.ts";

/** 250 hPa (Pa) in the warm half-year, 300 hPa in the cold one. */
const WARM_SEASON_LEVEL = 25_000;
const COLD_SEASON_LEVEL = 30_000;

/**
 * Seasonal default jet level (Pa), common practice (no source): the tropopause and the jet are higher in
 * the warm half-year, taken as May–October in the Northern Hemisphere and November–April in the Southern
 * (UTC month of the valid time).
 */
export function defaultJetLevel(validTime: Date | string, hemisphere: Hemisphere): number {
  const time = typeof validTime === "string" ? new Date(validTime) : validTime;
  const month = time.getUTCMonth() + 1;
  if (!Number.isFinite(month)) throw new RangeError(`validTime: expected a date, received ${String(validTime)}`);
  const northernWarm = month >= 5 && month <= 10;
  const warm = hemisphere === "north" ? northernWarm : !northernWarm;
  return warm ? WARM_SEASON_LEVEL : COLD_SEASON_LEVEL;
}

/** Winds of one isobaric level; only the speeds matter here. */
export interface LevelWinds {
  readonly pressure: number;
  readonly u: ArrayLike<number>;
  readonly v: ArrayLike<number>;
}

export interface JetLevelChoice {
  /** Index into the levels given. */
  readonly index: number;
  readonly pressure: number;
  /** One sentence saying how the level was chosen, for the frame's notes. */
  readonly reason: string;
  /** Set when the requested level was missing and another was used. */
  readonly warning: string | null;
}

const hPa = (pressure: number) => `${Math.round(pressure / 100)} hPa`;

/** The jet level for a frame from the levels it holds, following `settings.jetLevelMode`. */
export function chooseJetLevel(
  levels: readonly LevelWinds[],
  settings: Pick<JetSettings, "jetLevelMode" | "jetLevel" | "maxWindBottom" | "maxWindTop">,
  validTime: Date | string,
  hemisphere: Hemisphere,
): JetLevelChoice {
  if (levels.length === 0) throw new RangeError("levels: the frame holds no isobaric winds to choose a jet level from");
  if (settings.jetLevelMode === "max-wind") return levelOfMaximumWind(levels, settings.maxWindBottom, settings.maxWindTop);
  const wanted = settings.jetLevel === "seasonal" ? defaultJetLevel(validTime, hemisphere) : settings.jetLevel;
  let best = 0;
  for (let i = 1; i < levels.length; i++) {
    if (Math.abs(levels[i].pressure - wanted) < Math.abs(levels[best].pressure - wanted)) best = i;
  }
  const found = levels[best].pressure;
  const source = settings.jetLevel === "seasonal" ? "seasonal default" : "office setting";
  if (Math.abs(found - wanted) < 1) {
    return { index: best, pressure: found, reason: `${hPa(found)} (${source})`, warning: null };
  }
  return {
    index: best,
    pressure: found,
    reason: `${hPa(found)} (nearest available to the ${source} of ${hPa(wanted)})`,
    warning: `Jet level ${hPa(wanted)} is not in this frame; used ${hPa(found)} instead.`,
  };
}

/** Speed percentile used to rank levels: high enough to follow the streak cores, robust to a single spike. */
const RANKING_PERCENTILE = 0.995;
const HISTOGRAM_BIN = 0.5;
const HISTOGRAM_BINS = 400;

/**
 * The level between `bottom` and `top` (Pa) whose 99.5th-percentile wind speed is largest. A percentile
 * from a 0.5 m s⁻¹ histogram costs one pass per level and is not swayed by one bad grid point.
 */
function levelOfMaximumWind(levels: readonly LevelWinds[], bottom: number, top: number): JetLevelChoice {
  const histogram = new Uint32Array(HISTOGRAM_BINS);
  let best = -1;
  let bestSpeed = -Infinity;
  for (let index = 0; index < levels.length; index++) {
    const level = levels[index];
    if (level.pressure > bottom || level.pressure < top) continue;
    const speed = speedPercentile(level, histogram);
    if (speed > bestSpeed) {
      bestSpeed = speed;
      best = index;
    }
  }
  if (best < 0) {
    const held = levels.map((l) => hPa(l.pressure)).join(", ");
    throw new RangeError(`No isobaric level between ${hPa(bottom)} and ${hPa(top)} to search for the maximum wind (frame holds ${held})`);
  }
  const pressure = levels[best].pressure;
  return {
    index: best,
    pressure,
    reason: `${hPa(pressure)} (level of maximum wind between ${hPa(bottom)} and ${hPa(top)}: 99.5th-percentile speed ${bestSpeed.toFixed(1)} m/s)`,
    warning: null,
  };
}

function speedPercentile(level: LevelWinds, histogram: Uint32Array): number {
  histogram.fill(0);
  let count = 0;
  const { u, v } = level;
  for (let k = 0; k < u.length; k++) {
    const s = Math.sqrt(u[k] * u[k] + v[k] * v[k]);
    if (!(s >= 0)) continue;
    histogram[Math.min(HISTOGRAM_BINS - 1, Math.floor(s / HISTOGRAM_BIN))]++;
    count++;
  }
  if (count === 0) return -Infinity;
  const target = RANKING_PERCENTILE * count;
  let seen = 0;
  for (let bin = 0; bin < HISTOGRAM_BINS; bin++) {
    seen += histogram[bin];
    if (seen >= target) return (bin + 0.5) * HISTOGRAM_BIN;
  }
  return (HISTOGRAM_BINS - 0.5) * HISTOGRAM_BIN;
}
