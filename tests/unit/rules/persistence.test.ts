import { describe, expect, it } from "vitest";
import { findPersistentRuns, type FrameOutcome } from "../../../shared/rules/persistence.ts";

/** Hourly frames from 12 UTC; `pattern` is one character per frame: "x" met, "." not met. */
function frames(pattern: string, startHour = 12, stepHours = 1): FrameOutcome[] {
  return [...pattern].map((c, i) => ({
    validTime: new Date(Date.UTC(2025, 4, 20, startHour + i * stepHours)).toISOString(),
    met: c === "x",
  }));
}

const hours = (run: readonly FrameOutcome[]) => run.map((f) => new Date(f.validTime).getUTCHours());

// Expected runs are read off the hand-written patterns (Derived in closed form).
describe("findPersistentRuns", () => {
  it("holds when K consecutive frames are met, and returns each whole qualifying run", () => {
    const result = findPersistentRuns(frames(".xx.xxx..x"), 2);
    expect(result.held).toBe(true);
    expect(result.runs.map(hours)).toEqual([[13, 14], [16, 17, 18]]);
    expect(result.longestStreak).toBe(3);
  });

  it("does not hold when the streaks are shorter than K", () => {
    const result = findPersistentRuns(frames("x.xx.xx.x"), 3);
    expect(result).toEqual({ held: false, runs: [], longestStreak: 2 });
  });

  it("K = 1 holds on any met frame; no frames or no met frame never holds", () => {
    expect(findPersistentRuns(frames("..x."), 1).runs.map(hours)).toEqual([[14]]);
    expect(findPersistentRuns([], 1)).toEqual({ held: false, runs: [], longestStreak: 0 });
    expect(findPersistentRuns(frames("...."), 1).held).toBe(false);
  });

  it("a run reaching the last frame counts", () => {
    expect(findPersistentRuns(frames("..xxx"), 3).runs.map(hours)).toEqual([[14, 15, 16]]);
  });

  it("a gap in valid times longer than maxGapHours breaks a streak", () => {
    const withGap = [...frames("xx"), ...frames("xx", 16)]; // 12, 13, then 16, 17: hours 14 and 15 are missing
    expect(findPersistentRuns(withGap, 3).held).toBe(true);
    expect(findPersistentRuns(withGap, 3, { maxGapHours: 1 })).toEqual({ held: false, runs: [], longestStreak: 2 });
    const threeHourly = frames("xxx", 0, 3);
    expect(findPersistentRuns(threeHourly, 3, { maxGapHours: 3 }).held).toBe(true);
  });

  it("refuses frames out of order, bad times and a bad K", () => {
    expect(() => findPersistentRuns([...frames("x", 14), ...frames("x", 13)], 1)).toThrow(/increasing valid-time order/);
    expect(() => findPersistentRuns([...frames("x"), ...frames("x")], 1)).toThrow(/increasing valid-time order/);
    expect(() => findPersistentRuns([{ validTime: "tomorrow", met: true }], 1)).toThrow(/not an ISO date/);
    expect(() => findPersistentRuns(frames("x"), 0)).toThrow(/whole number >= 1/);
    expect(() => findPersistentRuns(frames("x"), 1.5)).toThrow(/whole number >= 1/);
    expect(() => findPersistentRuns(frames("x"), 1, { maxGapHours: 0 })).toThrow(/maxGapHours/);
  });

  it("keeps the caller's frame objects, so runs carry whatever else the caller attached", () => {
    const withIds = frames("xx").map((f, i) => ({ ...f, frameId: 40 + i }));
    expect(findPersistentRuns(withIds, 2).runs[0].map((f) => f.frameId)).toEqual([40, 41]);
  });
});
