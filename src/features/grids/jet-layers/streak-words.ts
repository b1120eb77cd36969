import type { JetStreakDto } from "@shared/api/grids.ts";
import { formatLatLon } from "@/components/map/index.ts";
import { formatHectopascals, formatWindKnots } from "@/lib/format-units.ts";

/** The curvature class in plain words: "straight", "cyclonic", "strongly anticyclonic"… */
export function curvatureWords(curvatureClass: -1 | 0 | 1, strong: boolean): string {
  if (curvatureClass === 0) return "straight";
  const bend = curvatureClass > 0 ? "cyclonic" : "anticyclonic";
  return strong ? `strongly ${bend}` : bend;
}

/** The short label written beside a core on the map: "109 kt · straight". */
export function coreLabel(streak: Pick<JetStreakDto, "core" | "curvatureClass" | "curvatureStrong">): string {
  return `${formatWindKnots(streak.core.speed)} · ${curvatureWords(streak.curvatureClass, streak.curvatureStrong)}`;
}

/** One streak in a sentence, for the legend and screen readers. */
export function describeStreak(streak: JetStreakDto, number: number): string {
  const turning = streak.turningAngleDegrees === null ? "" : `, axis turning ${Math.round(Math.abs(streak.turningAngleDegrees))}°`;
  return (
    `Streak ${number}: core ${formatWindKnots(streak.core.speed)} at ${formatLatLon(streak.core.lat, streak.core.lon)}, ` +
    `${curvatureWords(streak.curvatureClass, streak.curvatureStrong)}${turning}`
  );
}

/** "250 hPa", or a plain note when the frame has no jet level. */
export function jetLevelWords(pressure: number | null): string {
  return pressure === null ? "no jet level" : `${formatHectopascals(pressure)} hPa`;
}
