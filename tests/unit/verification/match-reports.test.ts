import { describe, expect, it } from "vitest";
import { matchReportsToTriggers, type ReportToMatch, type TriggerToMatch } from "../../../shared/verification/match-reports.ts";
import { distanceOutsideZoneKm } from "../../../shared/verification/zone-proximity.ts";
import type { ZoneGeometry } from "../../../shared/zones/zone-geometry.ts";

/**
 * Hand-built cases for Bellwether's matching rules (README, "History and verification"). Two
 * squares share the meridian 98° W: WEST spans 99–98° W, EAST 98–97° W, both 35–36° N. The
 * expected outcomes follow from the documented rules, not from running the code.
 */
const WEST: ZoneGeometry = { type: "Polygon", coordinates: [[[-99, 35], [-98, 35], [-98, 36], [-99, 36], [-99, 35]]] };
const EAST: ZoneGeometry = { type: "Polygon", coordinates: [[[-98, 35], [-97, 35], [-97, 36], [-98, 36], [-98, 35]]] };
const H = 3_600_000;
const T0 = Date.parse("2026-05-14T18:00:00Z");

interface Case {
  triggers: Array<TriggerToMatch & { zone: ZoneGeometry }>;
  reports: Array<ReportToMatch & { lat: number; lon: number }>;
}

/** Zone test: inside, or on the edge (0.5 km tolerance), with no extra distance. */
function run({ triggers, reports }: Case, windowHours = 1) {
  return matchReportsToTriggers(triggers, reports, windowHours, (t, r) => distanceOutsideZoneKm(triggers[t]!.zone, reports[r]!.lat, reports[r]!.lon, 0.5) <= 0);
}

/** A trigger opened at T0 − 1 h for valid times T0 … T0 + 2 h. */
const trigger = (id: number, zone: ZoneGeometry, over: Partial<TriggerToMatch> = {}) => ({ id, zone, openedAt: T0 - H, firstValidTime: T0, lastValidTime: T0 + 2 * H, ...over });

describe("matching triggers to storm reports", () => {
  it("a report inside the zone during the valid times verifies the trigger, with its lead time", () => {
    const result = run({ triggers: [trigger(1, WEST)], reports: [{ id: 10, time: T0 + H, lat: 35.5, lon: -98.5 }] });
    expect(result.counts).toEqual({ verifiedTriggers: 1, falseAlarms: 0, detectedReports: 1, misses: 0 });
    // Derived in closed form: report at T0 + 1 h, trigger opened at T0 − 1 h → 120 min
    expect(result.reports[0]).toMatchObject({ outcome: "detected", triggerIds: [1], leadMinutes: 120 });
  });

  it("a report on the edge shared by two zones verifies both zones' triggers and is detected once", () => {
    const result = run({
      triggers: [trigger(1, WEST), trigger(2, EAST, { openedAt: T0 - 3 * H })],
      reports: [{ id: 10, time: T0 + H, lat: 35.5, lon: -98 }],
    });
    expect(result.counts).toEqual({ verifiedTriggers: 2, falseAlarms: 0, detectedReports: 1, misses: 0 });
    // One report, two triggers: the lead time runs from the earlier opening (T0 − 3 h) → 240 min
    expect(result.reports[0]).toMatchObject({ triggerIds: [1, 2], leadMinutes: 240 });
    expect(result.leadTimesMinutes).toEqual([240]);
  });

  it("a report just outside the time window is a miss, and the trigger a false alarm", () => {
    // Window closes W = 1 h after the last valid time: T0 + 3 h; one minute later is outside
    const result = run({ triggers: [trigger(1, WEST)], reports: [{ id: 10, time: T0 + 3 * H + 60_000, lat: 35.5, lon: -98.5 }] });
    expect(result.counts).toEqual({ verifiedTriggers: 0, falseAlarms: 1, detectedReports: 0, misses: 1 });
    expect(result.reports[0]!.outcome).toBe("missed");
    // Exactly on the closing edge still counts
    const edge = run({ triggers: [trigger(1, WEST)], reports: [{ id: 10, time: T0 + 3 * H, lat: 35.5, lon: -98.5 }] });
    expect(edge.counts.verifiedTriggers).toBe(1);
  });

  it("a report before the window opens is a miss; one widened window later it verifies", () => {
    const early = { id: 10, time: T0 - 90 * 60_000, lat: 35.5, lon: -98.5 };
    const opensEarly = trigger(1, WEST, { openedAt: T0 - 6 * H });
    expect(run({ triggers: [opensEarly], reports: [early] }, 1).counts.detectedReports).toBe(0);
    expect(run({ triggers: [opensEarly], reports: [early] }, 2).counts.detectedReports).toBe(1);
  });

  it("two reports, one trigger: one verified trigger and two detected reports, each with its own lead time", () => {
    const result = run({
      triggers: [trigger(1, EAST)],
      reports: [
        { id: 10, time: T0, lat: 35.2, lon: -97.5 },
        { id: 11, time: T0 + 30 * 60_000, lat: 35.8, lon: -97.2 },
      ],
    });
    expect(result.counts).toEqual({ verifiedTriggers: 1, falseAlarms: 0, detectedReports: 2, misses: 0 });
    expect(result.triggers[0]!.reportIds).toEqual([10, 11]);
    expect(result.leadTimesMinutes).toEqual([60, 90]);
  });

  it("a report that came before the trigger opened is late, not a hit", () => {
    const result = run({ triggers: [trigger(1, WEST, { openedAt: T0 + H })], reports: [{ id: 10, time: T0 + 30 * 60_000, lat: 35.5, lon: -98.5 }] });
    expect(result.reports[0]).toMatchObject({ outcome: "late", triggerIds: [], lateTriggerIds: [1], leadMinutes: null });
    expect(result.counts).toEqual({ verifiedTriggers: 0, falseAlarms: 1, detectedReports: 0, misses: 1 });
  });

  it("a report in the other zone does not verify a trigger of this one", () => {
    const result = run({ triggers: [trigger(1, WEST)], reports: [{ id: 10, time: T0 + H, lat: 35.5, lon: -97.5 }] });
    expect(result.counts).toEqual({ verifiedTriggers: 0, falseAlarms: 1, detectedReports: 0, misses: 1 });
  });

  it("asks the space test only for pairs that pass the time test", () => {
    const asked: Array<[number, number]> = [];
    matchReportsToTriggers([trigger(1, WEST)], [{ id: 10, time: T0 + 10 * H }], 1, (t, r) => {
      asked.push([t, r]);
      return true;
    });
    expect(asked).toEqual([]);
  });
});
