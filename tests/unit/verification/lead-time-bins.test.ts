import { describe, expect, it } from "vitest";
import { binLeadTimes, leadTimeBinWidth } from "../../../shared/verification/lead-time-bins.ts";

describe("lead-time histogram bins", () => {
  it("picks the narrowest width that keeps 16 bars or fewer", () => {
    // Common practice (no source): equal-width bins so bar heights compare as counts
    expect(leadTimeBinWidth(100)).toBe(15);
    expect(leadTimeBinWidth(300)).toBe(30);
    expect(leadTimeBinWidth(7.9 * 60)).toBe(30);
    // A lead of exactly 8 h opens a 17th half-hour bar ([480, 510) min), so the width steps up
    expect(leadTimeBinWidth(8 * 60)).toBe(60);
    expect(leadTimeBinWidth(12 * 60)).toBe(60);
  });

  it("counts every lead time once, with edges in the lower bin's favour", () => {
    const bins = binLeadTimes([0, 14.9, 15, 44, 59]);
    expect(bins.map((b) => [b.fromMinutes, b.toMinutes, b.count])).toEqual([
      [0, 15, 2],
      [15, 30, 1],
      [30, 45, 1],
      [45, 60, 1],
    ]);
    expect(binLeadTimes([])).toEqual([]);
  });
});
