import { knotsFromMetersPerSecond } from "@/lib/format-units.ts";

/**
 * Isotach levels of the jet-level speed: every 10 kt from 60 kt, the usual spacing on upper-air
 * charts (common practice, no source), up to the fastest wind of the frame.
 */
export const ISOTACH_FIRST_KNOTS = 60;
export const ISOTACH_STEP_KNOTS = 10;

export interface IsotachLevel {
  /** Speed of the line in storage units (m/s). */
  value: number;
  /** The same speed in knots, as labelled. */
  display: number;
}

/** Levels from 60 kt in 10-kt steps up to `maxSpeed` (m/s); none when the frame has no speed or nothing reaches 60 kt. */
export function isotachLevels(maxSpeed: number | null): IsotachLevel[] {
  if (maxSpeed === null || !Number.isFinite(maxSpeed)) return [];
  const metresPerSecondPerKnot = 1 / knotsFromMetersPerSecond(1);
  const topKnots = knotsFromMetersPerSecond(maxSpeed);
  const levels: IsotachLevel[] = [];
  for (let knots = ISOTACH_FIRST_KNOTS; knots <= topKnots; knots += ISOTACH_STEP_KNOTS) {
    levels.push({ value: knots * metresPerSecondPerKnot, display: knots });
  }
  return levels;
}

/** Faster lines are drawn a little heavier so the core stands out (CSS pixels). */
export function isotachLineWidth(knots: number): number {
  return knots >= 100 ? 2 : knots >= 80 ? 1.5 : 1.1;
}
