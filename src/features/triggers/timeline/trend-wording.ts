import { formatNumber } from "@/lib/format-units.ts";

/**
 * How a trigger's signal changed since the previous model run, from the change in its peak
 * coverage (percentage points). Forecasters care whether a signal is consistent from run to run.
 */
export type TrendDirection = "grew" | "shrank" | "steady" | "first-run";

export interface TrendWording {
  direction: TrendDirection;
  /** An arrow for the eye; the words carry the meaning. */
  symbol: "↑" | "↓" | "→" | "·";
  /** Short text for a dense row: "grew 12 pts", "steady", "first run". */
  short: string;
  /** A full sentence for a tooltip or a screen reader. */
  sentence: string;
}

/** Changes smaller than this (percentage points) read as steady: a cell or two of a zone is noise. */
export const STEADY_WITHIN_POINTS = 0.5;

export function describeTrend(trend: number | null | undefined): TrendWording {
  if (trend === null || trend === undefined || !Number.isFinite(trend)) {
    return { direction: "first-run", symbol: "·", short: "first run", sentence: "Only one model run has matched so far; no run-to-run change yet." };
  }
  const size = Math.abs(trend);
  if (size < STEADY_WITHIN_POINTS) {
    return { direction: "steady", symbol: "→", short: "steady", sentence: "The matched area is about the same as in the previous run." };
  }
  const points = formatNumber(size, size < 10 ? 1 : 0);
  const unit = points === "1" || points === "1.0" ? "pt" : "pts";
  if (trend > 0) {
    return { direction: "grew", symbol: "↑", short: `grew ${points} ${unit}`, sentence: `The matched area grew by ${points} percentage points of the zone since the previous run.` };
  }
  return { direction: "shrank", symbol: "↓", short: `shrank ${points} ${unit}`, sentence: `The matched area shrank by ${points} percentage points of the zone since the previous run.` };
}
