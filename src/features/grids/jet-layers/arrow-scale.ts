/**
 * One arrow length per speed for a whole frame, shown by a key arrow. The key speed is the smallest
 * round value for which nine arrows in ten stay shorter than a set share of the gap between arrows, so the map
 * stays readable in calm and in strong flow alike; the legend always says which speed the key is.
 */

/** Length of the key arrow on the map and in the legend (CSS pixels). */
export const KEY_ARROW_PX = 16;
/**
 * Arrows shorter than this (CSS pixels) are left out: their direction could not be read, and dots in
 * their place would look like the dotted "ambiguous" marking of the quadrant layer.
 */
export const SHORTEST_ARROW_PX = 3;
/** Round key speeds to choose from (m/s). */
export const KEY_SPEEDS = [2, 5, 10, 15, 20, 30, 40, 50, 100] as const;

const HISTOGRAM_STEP = 0.25;
const HISTOGRAM_BINS = 800;

export interface ArrowScale {
  /** Speed (m/s) the key arrow stands for. */
  keySpeed: number;
  pixelsPerMetrePerSecond: number;
  /** Slowest wind (m/s) drawn as an arrow; slower points are left out. */
  slowestDrawn: number;
  /** The 90th-percentile speed the choice was made from (m/s); null when the field has no values. */
  speed90: number | null;
}

/** 90th percentile of |(u, v)| over every point with a value, to 0.25 m/s, from a histogram (one pass, no sort). */
export function speedPercentile90(u: Float32Array, v: Float32Array): number | null {
  const counts = new Uint32Array(HISTOGRAM_BINS + 1);
  let total = 0;
  for (let k = 0; k < u.length; k++) {
    const speed = Math.hypot(u[k]!, v[k]!);
    if (speed !== speed) continue;
    counts[Math.min(HISTOGRAM_BINS, Math.floor(speed / HISTOGRAM_STEP))]!++;
    total++;
  }
  if (total === 0) return null;
  const wanted = Math.ceil(0.9 * total);
  let seen = 0;
  for (let bin = 0; bin <= HISTOGRAM_BINS; bin++) {
    seen += counts[bin]!;
    if (seen >= wanted) return (bin + 1) * HISTOGRAM_STEP;
  }
  return HISTOGRAM_BINS * HISTOGRAM_STEP;
}

/** The key speed whose scale keeps the 90th-percentile arrow within `gapPx` (the spacing between arrows, less a margin). */
export function chooseArrowScale(speed90: number | null, gapPx: number): ArrowScale {
  const fallback = 10;
  const needed = speed90 === null ? fallback : (speed90 * KEY_ARROW_PX) / gapPx;
  const keySpeed = KEY_SPEEDS.find((candidate) => candidate >= needed) ?? KEY_SPEEDS[KEY_SPEEDS.length - 1]!;
  const pixelsPerMetrePerSecond = KEY_ARROW_PX / keySpeed;
  return { keySpeed, pixelsPerMetrePerSecond, slowestDrawn: SHORTEST_ARROW_PX / pixelsPerMetrePerSecond, speed90 };
}
