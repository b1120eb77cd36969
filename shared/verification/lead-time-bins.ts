/**
 * Bins for the lead-time histogram: equal widths (so bar heights compare as counts), the width
 * chosen from the longest lead time so the chart has a readable number of bars.
 */
export interface LeadTimeBin {
  /** Inclusive lower edge, minutes. */
  fromMinutes: number;
  /** Exclusive upper edge, minutes. */
  toMinutes: number;
  count: number;
}

const WIDTHS_MINUTES = [15, 30, 60, 120, 180, 360];
const MAX_BINS = 16;

export function leadTimeBinWidth(maxMinutes: number): number {
  return WIDTHS_MINUTES.find((width) => Math.floor(maxMinutes / width) + 1 <= MAX_BINS) ?? WIDTHS_MINUTES[WIDTHS_MINUTES.length - 1]!;
}

/** Counts lead times (minutes, ≥ 0) into equal bins from 0 to past the largest; empty input gives no bins. */
export function binLeadTimes(leadMinutes: readonly number[]): LeadTimeBin[] {
  if (leadMinutes.length === 0) return [];
  const max = Math.max(...leadMinutes);
  const width = leadTimeBinWidth(max);
  const count = Math.max(1, Math.floor(max / width) + 1);
  const bins: LeadTimeBin[] = Array.from({ length: count }, (_, k) => ({ fromMinutes: k * width, toMinutes: (k + 1) * width, count: 0 }));
  for (const lead of leadMinutes) bins[Math.min(count - 1, Math.max(0, Math.floor(lead / width)))]!.count += 1;
  return bins;
}
