import { describe, expect, it } from "vitest";
import {
  filterOptions,
  filtersFromSearch,
  filterTimeline,
  hasFilters,
  NO_FILTERS,
  searchFromFilters,
  triggerMatchesFilters,
} from "../../../../src/features/triggers/timeline/timeline-filters.ts";
import type { TimelineEntry } from "../../../../src/features/triggers/timeline/timeline-rows.ts";
import { triggerSummary } from "../../../helpers/trigger-summary.ts";

describe("filters in the URL", () => {
  it("reads each filter and ignores unknown or malformed values", () => {
    expect(filtersFromSearch(new URLSearchParams("state=active&severity=serious&zone=3&rule=7"))).toEqual({ state: "active", severity: "serious", zoneId: 3, ruleId: 7 });
    expect(filtersFromSearch(new URLSearchParams("state=acknowledged"))).toMatchObject({ state: "acknowledged" });
    expect(filtersFromSearch(new URLSearchParams("state=lost&severity=extreme&zone=-2&rule=1e3"))).toEqual(NO_FILTERS);
    expect(filtersFromSearch(new URLSearchParams("zone=0"))).toEqual(NO_FILTERS);
  });

  it("writes them back, keeping other parameters and dropping empty filters", () => {
    const written = searchFromFilters({ state: "open", severity: null, zoneId: 4, ruleId: null }, new URLSearchParams("rule=9&keep=1"));
    // The old rule filter is cleared; the unrelated parameter stays.
    expect(written.toString()).toBe("keep=1&state=open&zone=4");
    expect(filtersFromSearch(written)).toEqual({ state: "open", severity: null, zoneId: 4, ruleId: null });
  });
});

describe("triggerMatchesFilters", () => {
  const open = triggerSummary({ state: "open", severity: "serious" });
  const acknowledged = triggerSummary({ state: "acknowledged", severity: "heads-up" });
  const cleared = triggerSummary({ state: "cleared", severity: "urgent" });

  it("treats 'active' as open or acknowledged", () => {
    const active = { ...NO_FILTERS, state: "active" as const };
    expect([open, acknowledged, cleared].map((t) => triggerMatchesFilters(t, active))).toEqual([true, true, false]);
  });

  it("reads the severity filter as 'at least'", () => {
    const serious = { ...NO_FILTERS, severity: "serious" as const };
    expect([open, acknowledged, cleared].map((t) => triggerMatchesFilters(t, serious))).toEqual([true, false, true]);
  });

  it("matches zone and rule by id", () => {
    expect(triggerMatchesFilters(open, { ...NO_FILTERS, zoneId: open.zone.id })).toBe(true);
    expect(triggerMatchesFilters(open, { ...NO_FILTERS, zoneId: open.zone.id + 1 })).toBe(false);
    expect(triggerMatchesFilters(open, { ...NO_FILTERS, ruleId: open.rule.id + 1 })).toBe(false);
  });
});

describe("filterTimeline", () => {
  const a = triggerSummary({ id: 1, severity: "urgent" });
  const b = triggerSummary({ id: 2, severity: "heads-up" });
  const entries: TimelineEntry[] = [
    { kind: "trigger", at: "2026-05-14T10:00:00Z", trigger: a },
    { kind: "trigger", at: "2026-05-14T09:00:00Z", trigger: b },
    { kind: "escalation", at: "2026-05-14T11:00:00Z", triggerId: 1, note: null },
    { kind: "escalation", at: "2026-05-14T11:30:00Z", triggerId: 2, note: null },
    { kind: "grid", at: "2026-05-14T08:00:00Z", jobId: 5, name: "f.grib2", state: "ready", frameCount: 1, reason: null },
    { kind: "other", at: "2026-05-14T07:00:00Z", serverKind: "report", text: null },
  ];

  it("shows everything without filters", () => {
    expect(hasFilters(NO_FILTERS)).toBe(false);
    expect(filterTimeline(entries, NO_FILTERS)).toHaveLength(entries.length);
  });

  it("keeps matching triggers and the escalations of those triggers, and hides light entries", () => {
    const kept = filterTimeline(entries, { ...NO_FILTERS, severity: "serious" });
    expect(kept.map((e) => (e.kind === "trigger" ? `trigger ${e.trigger.id}` : e.kind === "escalation" ? `escalation ${e.triggerId}` : e.kind))).toEqual(["trigger 1", "escalation 1"]);
  });
});

describe("filterOptions", () => {
  it("lists the zones and rules met in the entries once each, sorted by label", () => {
    const entries: TimelineEntry[] = [
      { kind: "trigger", at: "2026-05-14T10:00:00Z", trigger: triggerSummary({ zone: { id: 2, code: "B", name: "Beta" }, rule: { id: 5, name: "Wind", versionId: 1, version: 1 } }) },
      { kind: "trigger", at: "2026-05-14T09:00:00Z", trigger: triggerSummary({ zone: { id: 1, code: "A", name: "Alpha" }, rule: { id: 5, name: "Wind", versionId: 2, version: 2 } }) },
    ];
    expect(filterOptions(entries)).toEqual({ zones: [{ id: 1, label: "A · Alpha" }, { id: 2, label: "B · Beta" }], rules: [{ id: 5, label: "Wind" }] });
  });
});
