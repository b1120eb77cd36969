import { describe, expect, it } from "vitest";
import { describeTrend, STEADY_WITHIN_POINTS } from "../../../../src/features/triggers/timeline/trend-wording.ts";
import { openedNotice } from "../../../../src/features/triggers/timeline/opened-notice.ts";

describe("describeTrend", () => {
  it("says the area grew or shrank, with the change in percentage points", () => {
    expect(describeTrend(12)).toMatchObject({ direction: "grew", symbol: "↑", short: "grew 12 pts" });
    expect(describeTrend(-8.25)).toMatchObject({ direction: "shrank", symbol: "↓", short: "shrank 8.3 pts" });
    expect(describeTrend(1)).toMatchObject({ short: "grew 1.0 pt" });
    expect(describeTrend(12).sentence).toContain("grew by 12 percentage points");
  });

  it("calls a change smaller than half a point steady", () => {
    // Common practice (no source): a cell or two of a zone is noise, not a trend.
    expect(STEADY_WITHIN_POINTS).toBe(0.5);
    expect(describeTrend(0.4).direction).toBe("steady");
    expect(describeTrend(-0.4).short).toBe("steady");
    expect(describeTrend(0.5).direction).toBe("grew");
  });

  it("says there is no trend yet when only one run has matched", () => {
    expect(describeTrend(null)).toMatchObject({ direction: "first-run", short: "first run" });
    expect(describeTrend(Number.NaN).direction).toBe("first-run");
  });
});

describe("openedNotice", () => {
  it("names a single new trigger by its severity", () => {
    expect(openedNotice(["urgent"])).toBe("New Urgent trigger opened");
  });

  it("sums up a burst, most severe first", () => {
    expect(openedNotice(["heads-up", "urgent", "heads-up"])).toBe("3 new triggers opened: 1 Urgent, 2 Heads-up");
    expect(openedNotice([])).toBe("");
  });
});
