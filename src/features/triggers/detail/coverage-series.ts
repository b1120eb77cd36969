import type { TriggerFrameDto } from "@shared/api/triggers.ts";

export interface CoverageSeries {
  runTime: string;
  /** Ordered by valid time; coverage in % of the zone (0 when the frame had nothing to decide). */
  points: Array<{ validTime: string; coverage: number; met: boolean; frameId: number }>;
}

/** Coverage per valid time, one series per model run, oldest run first: how the signal moved between runs. */
export function coverageSeries(frames: readonly TriggerFrameDto[]): CoverageSeries[] {
  const runs = new Map<string, CoverageSeries>();
  for (const frame of frames) {
    const series = runs.get(frame.runTime) ?? { runTime: frame.runTime, points: [] };
    series.points.push({ validTime: frame.validTime, coverage: frame.coveragePercent ?? 0, met: frame.met, frameId: frame.frameId });
    runs.set(frame.runTime, series);
  }
  const out = [...runs.values()].sort((a, b) => a.runTime.localeCompare(b.runTime));
  for (const series of out) series.points.sort((a, b) => a.validTime.localeCompare(b.validTime));
  return out;
}

/** The time axis of the chart: the earliest and latest valid time over all runs (ms since the epoch). */
export function validTimeExtent(series: readonly CoverageSeries[]): [number, number] | null {
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const s of series) {
    for (const point of s.points) {
      const t = Date.parse(point.validTime);
      if (t < lo) lo = t;
      if (t > hi) hi = t;
    }
  }
  return lo <= hi ? [lo, hi] : null;
}
