import { knotsFromMetersPerSecond } from "@/lib/format-units.ts";

/** One wind of the profile for the hodograph: height m AGL, components in kt. */
export interface HodographPoint {
  height: number;
  u: number;
  v: number;
}

export interface HeightBand {
  id: string;
  label: string;
  /** m AGL */
  from: number;
  to: number;
}

/**
 * The height bands the hodograph colours. 0–1 and 0–3 km are the layers of the low-level SRH fields, 0–6 km
 * the deep-layer shear; everything above 6 km is one band, drawn up to 12 km.
 */
export const HEIGHT_BANDS: readonly HeightBand[] = [
  { id: "0-1", label: "0–1 km", from: 0, to: 1000 },
  { id: "1-3", label: "1–3 km", from: 1000, to: 3000 },
  { id: "3-6", label: "3–6 km", from: 3000, to: 6000 },
  { id: "6-12", label: "6–12 km", from: 6000, to: 12000 },
];

export const HODOGRAPH_TOP = 12000;

/** Levels with a wind, converted to kt, in height order. */
export function hodographPoints(levels: ReadonlyArray<{ height: number; u: number | null; v: number | null }>): HodographPoint[] {
  const points: HodographPoint[] = [];
  for (const level of levels) {
    if (level.u === null || level.v === null || !Number.isFinite(level.u) || !Number.isFinite(level.v)) continue;
    points.push({ height: level.height, u: knotsFromMetersPerSecond(level.u), v: knotsFromMetersPerSecond(level.v) });
  }
  return points.sort((a, b) => a.height - b.height);
}

/** The wind at a height, linear in height between the profile's winds (the library's convention); null outside. */
export function windAtHeight(points: readonly HodographPoint[], height: number): HodographPoint | null {
  for (let k = 0; k < points.length; k++) {
    const a = points[k];
    if (a.height === height) return a;
    const b = points[k + 1];
    if (b && height > a.height && height < b.height) {
      const f = (height - a.height) / (b.height - a.height);
      return { height, u: a.u + f * (b.u - a.u), v: a.v + f * (b.v - a.v) };
    }
  }
  return null;
}

/**
 * The part of the hodograph between two heights, with both ends interpolated so neighbouring bands meet
 * exactly. Empty when the profile does not reach into the layer.
 */
export function hodographBetween(points: readonly HodographPoint[], from: number, to: number): HodographPoint[] {
  if (points.length < 2) return [];
  const bottom = Math.max(from, points[0].height);
  const top = Math.min(to, points[points.length - 1].height);
  if (!(top > bottom)) return [];
  const start = windAtHeight(points, bottom);
  const end = windAtHeight(points, top);
  if (!start || !end) return [];
  return [start, ...points.filter((p) => p.height > bottom && p.height < top), end];
}

/** Ring spacing in kt: 10 kt rings for light profiles, 20 kt once winds pass 60 kt (a legibility choice). */
export function ringSpacing(maxKnots: number): number {
  return maxKnots > 60 ? 20 : 10;
}

export interface HodographWindow {
  /** Centre of the visible square, kt. */
  centerU: number;
  centerV: number;
  /** Half the side of the visible square, kt. */
  halfSpan: number;
}

/**
 * A square view around every point that must show (the winds, the storm motions and the origin), padded by
 * 10 % and at least ±20 kt so a light profile does not fill the whole figure.
 */
export function hodographWindow(points: ReadonlyArray<{ u: number; v: number }>): HodographWindow {
  let minU = 0;
  let maxU = 0;
  let minV = 0;
  let maxV = 0;
  for (const p of points) {
    minU = Math.min(minU, p.u);
    maxU = Math.max(maxU, p.u);
    minV = Math.min(minV, p.v);
    maxV = Math.max(maxV, p.v);
  }
  const halfSpan = Math.max(20, 0.55 * Math.max(maxU - minU, maxV - minV));
  return { centerU: (minU + maxU) / 2, centerV: (minV + maxV) / 2, halfSpan };
}

/** Directions (unit vectors in u, v) tried for a ring's label: the axes first, then the diagonals. */
const LABEL_DIRECTIONS: ReadonlyArray<readonly [number, number]> = [
  [1, 0], [0, -1], [-1, 0], [0, 1],
  [Math.SQRT1_2, -Math.SQRT1_2], [-Math.SQRT1_2, -Math.SQRT1_2], [-Math.SQRT1_2, Math.SQRT1_2], [Math.SQRT1_2, Math.SQRT1_2],
];

/**
 * Where on a ring of `radius` kt to put its label: of the spots that are in view, the one farthest from anything
 * drawn (winds, storm motions), so labels never sit on the data. Null when the ring is out of view.
 */
export function ringLabelSpot(
  radius: number,
  inView: (u: number, v: number) => boolean,
  obstacles: ReadonlyArray<{ u: number; v: number }>,
): { u: number; v: number } | null {
  let best: { u: number; v: number } | null = null;
  let bestClearance = -1;
  for (const [du, dv] of LABEL_DIRECTIONS) {
    const u = radius * du;
    const v = radius * dv;
    if (!inView(u, v)) continue;
    let clearance = Number.POSITIVE_INFINITY;
    for (const p of obstacles) clearance = Math.min(clearance, Math.hypot(p.u - u, p.v - v));
    if (clearance > bestClearance + 1e-9) {
      best = { u, v };
      bestClearance = clearance;
    }
  }
  return best;
}
