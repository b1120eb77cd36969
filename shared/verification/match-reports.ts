import type { VerificationCounts } from "./contingency-scores.ts";

/**
 * Matching triggers to storm reports, Bellwether's rules (README, "History and verification"):
 *
 * - Time: a report matches a trigger when it happened no earlier than W hours before the trigger's
 *   first valid time and no later than W hours after its last valid time, AND at or after the
 *   moment the trigger opened. A report inside the window but before the trigger opened is "late":
 *   the trigger gave no warning of it, so it is not a hit for that trigger.
 * - Space: decided by the caller (`near`), e.g. inside the trigger's zone or within a distance of
 *   its matched area; a report on a zone edge counts as inside.
 * - Two reports, one trigger: one verified trigger, two detected reports.
 * - One report, two triggers: both triggers are verified; the report is detected once, and its
 *   lead time runs from the earlier of the two openings.
 */

export interface TriggerToMatch {
  id: number;
  /** Epoch milliseconds. */
  openedAt: number;
  firstValidTime: number;
  lastValidTime: number;
}

export interface ReportToMatch {
  id: number;
  /** Epoch milliseconds. */
  time: number;
}

export type ReportOutcome = "detected" | "late" | "missed";

export interface ReportMatch {
  id: number;
  outcome: ReportOutcome;
  /** Triggers the report verifies (empty unless detected). */
  triggerIds: number[];
  /** Triggers that covered the report in space and valid time but opened after it. */
  lateTriggerIds: number[];
  /** Report time minus the earliest opening among its triggers, in minutes; null unless detected. */
  leadMinutes: number | null;
}

export interface TriggerMatch {
  id: number;
  verified: boolean;
  reportIds: number[];
}

export interface MatchResult {
  triggers: TriggerMatch[];
  reports: ReportMatch[];
  counts: VerificationCounts;
  /** Lead time of every detected report, in minutes, in report order. */
  leadTimesMinutes: number[];
}

const HOUR_MS = 3_600_000;
const MINUTE_MS = 60_000;

/**
 * Matches every report against every trigger. `near(t, r)` says whether report r lies close
 * enough in space to trigger t (indices into the two arrays); it is asked only for pairs that
 * already pass the time test, since the space test is the costly one.
 */
export function matchReportsToTriggers(
  triggers: readonly TriggerToMatch[],
  reports: readonly ReportToMatch[],
  windowHours: number,
  near: (triggerIndex: number, reportIndex: number) => boolean,
): MatchResult {
  const windowMs = windowHours * HOUR_MS;
  const triggerReports: number[][] = triggers.map(() => []);
  const reportMatches: ReportMatch[] = [];
  const leadTimesMinutes: number[] = [];

  for (let r = 0; r < reports.length; r++) {
    const report = reports[r]!;
    const triggerIds: number[] = [];
    const lateTriggerIds: number[] = [];
    let earliestOpening = Infinity;
    for (let t = 0; t < triggers.length; t++) {
      const trigger = triggers[t]!;
      if (report.time < trigger.firstValidTime - windowMs || report.time > trigger.lastValidTime + windowMs) continue;
      if (!near(t, r)) continue;
      if (report.time < trigger.openedAt) {
        lateTriggerIds.push(trigger.id);
        continue;
      }
      triggerIds.push(trigger.id);
      triggerReports[t]!.push(report.id);
      earliestOpening = Math.min(earliestOpening, trigger.openedAt);
    }
    const detected = triggerIds.length > 0;
    const leadMinutes = detected ? (report.time - earliestOpening) / MINUTE_MS : null;
    if (leadMinutes !== null) leadTimesMinutes.push(leadMinutes);
    reportMatches.push({ id: report.id, outcome: detected ? "detected" : lateTriggerIds.length > 0 ? "late" : "missed", triggerIds, lateTriggerIds, leadMinutes });
  }

  const triggerMatches = triggers.map((trigger, t) => ({ id: trigger.id, verified: triggerReports[t]!.length > 0, reportIds: triggerReports[t]! }));
  const verifiedTriggers = triggerMatches.filter((t) => t.verified).length;
  const detectedReports = reportMatches.filter((r) => r.outcome === "detected").length;
  return {
    triggers: triggerMatches,
    reports: reportMatches,
    counts: { verifiedTriggers, falseAlarms: triggers.length - verifiedTriggers, detectedReports, misses: reports.length - detectedReports },
    leadTimesMinutes,
  };
}
