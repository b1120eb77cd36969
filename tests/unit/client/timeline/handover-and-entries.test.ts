import { describe, expect, it } from "vitest";
import { handoverLine, handoverText, orderForHandover } from "../../../../src/features/triggers/timeline/handover-text.ts";
import { readTimelineEntry } from "../../../../src/features/triggers/api/read-timeline-entry.ts";
import { triggerSummary } from "../../../helpers/trigger-summary.ts";

const chicago = { timeZone: "America/Chicago" };

describe("handover", () => {
  const triggers = [
    triggerSummary({ id: 1, state: "acknowledged", severity: "urgent", acknowledgedBy: "forecaster", firstValidTime: "2026-05-14T16:00:00Z" }),
    triggerSummary({ id: 2, state: "open", severity: "heads-up", firstValidTime: "2026-05-14T17:00:00Z" }),
    triggerSummary({ id: 3, state: "open", severity: "urgent", firstValidTime: "2026-05-14T19:00:00Z" }),
    triggerSummary({ id: 4, state: "open", severity: "urgent", firstValidTime: "2026-05-14T18:00:00Z" }),
    triggerSummary({ id: 5, state: "cleared", severity: "urgent" }),
  ];

  it("lists unacknowledged first, then by severity and the soonest valid time, and leaves closed ones out", () => {
    expect(orderForHandover(triggers).map((t) => t.id)).toEqual([4, 3, 2, 1]);
  });

  it("writes a plain note with a header count and one line per trigger", () => {
    const text = handoverText(triggers, new Date("2026-05-14T20:00:00Z"), chicago);
    const lines = text.split("\n");
    expect(lines[0]).toBe("Bellwether handover, 2026-05-14 20:00Z: 3 open, 1 acknowledged.");
    expect(lines).toHaveLength(5);
    expect(lines[4]).toContain("acknowledged by forecaster");
    expect(lines[1]).toContain("NOT acknowledged");
  });

  it("names severity, rule and version, zone, run, valid window (UTC and local) and coverage on a line", () => {
    // Source: IANA tz database, America/Chicago UTC−5 in May.
    expect(handoverLine(triggerSummary(), chicago)).toBe(
      "[Serious] · Deep shear with buoyancy v2 · Z3 Test zone · test-model 13Z run · valid 18:00–21:00Z (13:00–16:00 CDT) · coverage 42 % · NOT acknowledged",
    );
  });
});

describe("readTimelineEntry", () => {
  it("reads the kinds the timeline lays out strictly", () => {
    const trigger = triggerSummary();
    expect(readTimelineEntry({ kind: "trigger", at: trigger.openedAt, trigger })).toMatchObject({ kind: "trigger", trigger: { id: trigger.id } });
    expect(readTimelineEntry({ kind: "escalation", at: "2026-05-14T10:00:00Z", triggerId: 4, note: "nobody answered" })).toMatchObject({ kind: "escalation", triggerId: 4 });
    // A known kind with a broken body is dropped rather than shown half-read.
    expect(readTimelineEntry({ kind: "trigger", at: "2026-05-14T10:00:00Z", trigger: { id: "x" } })).toBeNull();
  });

  it("keeps an entry of a kind it does not know as a plain line with a few readable words", () => {
    const entry = readTimelineEntry({ kind: "report", at: "2026-05-14T21:10:00Z", report: { id: 3, kind: "hail", remarks: "large hail on the highway", invented: true } });
    expect(entry).toEqual({ kind: "other", at: "2026-05-14T21:10:00Z", serverKind: "report", text: "hail · large hail on the highway · (invented)" });
  });

  it("drops what is not an entry at all", () => {
    expect(readTimelineEntry(null)).toBeNull();
    expect(readTimelineEntry({ kind: "report" })).toBeNull();
    expect(readTimelineEntry({ kind: "report", at: "yesterday-ish" })).toBeNull();
    expect(readTimelineEntry(["trigger"])).toBeNull();
  });
});
