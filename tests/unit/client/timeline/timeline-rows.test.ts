import { describe, expect, it } from "vitest";
import { buildTimelineRows, entryKey, utcDayOf, type TimelineEntry } from "../../../../src/features/triggers/timeline/timeline-rows.ts";
import { triggerSummary } from "../../../helpers/trigger-summary.ts";

const trigger = (id: number, openedAt: string): TimelineEntry => ({ kind: "trigger", at: openedAt, trigger: triggerSummary({ id, openedAt }) });
const grid = (jobId: number, at: string): TimelineEntry => ({ kind: "grid", at, jobId, name: `file-${jobId}.grib2`, state: "ready", frameCount: 1, reason: null });

describe("utcDayOf", () => {
  it("takes the calendar day in UTC, whatever offset the time is written with", () => {
    // Derived in closed form: 20:30 at UTC−05:00 is 01:30Z the next day.
    expect(utcDayOf("2026-05-14T20:30:00-05:00")).toBe("2026-05-15");
    expect(utcDayOf("2026-05-14T23:59:59Z")).toBe("2026-05-14");
    expect(utcDayOf("not a time")).toBe("unknown");
  });
});

describe("buildTimelineRows", () => {
  it("puts the newest first and a heading before each UTC day with its entry count", () => {
    const rows = buildTimelineRows([
      trigger(1, "2026-05-13T22:00:00Z"),
      grid(7, "2026-05-14T00:10:00Z"),
      trigger(2, "2026-05-14T15:00:00Z"),
      trigger(3, "2026-05-13T23:30:00Z"),
    ]);
    expect(rows.map((row) => (row.type === "day" ? `day ${row.day} (${row.count})` : row.key))).toEqual([
      "day 2026-05-14 (2)",
      "trigger-2",
      "grid-7",
      "day 2026-05-13 (2)",
      "trigger-3",
      "trigger-1",
    ]);
  });

  it("lists an entry once when two pages both carry it", () => {
    const rows = buildTimelineRows([trigger(5, "2026-05-14T10:00:00Z"), trigger(5, "2026-05-14T10:00:00Z"), trigger(6, "2026-05-14T09:00:00Z")]);
    expect(rows.filter((row) => row.type === "entry")).toHaveLength(2);
    expect(rows[0]).toMatchObject({ type: "day", count: 2 });
  });

  it("keeps the server's order for entries at the same moment", () => {
    const rows = buildTimelineRows([trigger(8, "2026-05-14T10:00:00Z"), grid(9, "2026-05-14T10:00:00Z")]);
    expect(rows.slice(1).map((row) => row.key)).toEqual(["trigger-8", "grid-9"]);
  });

  it("gives an empty timeline no rows at all", () => {
    expect(buildTimelineRows([])).toEqual([]);
  });
});

describe("entryKey", () => {
  it("is stable per trigger, grid job and escalation, and distinct between kinds", () => {
    expect(entryKey(trigger(4, "2026-05-14T10:00:00Z"))).toBe("trigger-4");
    expect(entryKey(grid(4, "2026-05-14T10:00:00Z"))).toBe("grid-4");
    expect(entryKey({ kind: "escalation", at: "2026-05-14T11:00:00Z", triggerId: 4, note: null })).toBe("escalation-4-2026-05-14T11:00:00Z");
    expect(entryKey({ kind: "other", at: "2026-05-14T11:00:00Z", serverKind: "report", text: "hail" })).toBe("report-2026-05-14T11:00:00Z-hail");
  });
});
