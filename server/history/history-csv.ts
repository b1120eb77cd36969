import type { HistoryTriggerDto } from "../../shared/api/history.ts";
import { csvDocument } from "../../shared/csv/csv-text.ts";

/** Column names of the trigger-history CSV (README, "History and verification"); scripts read them. */
export const HISTORY_CSV_HEADER = [
  "trigger_id",
  "rule_id",
  "rule_name",
  "rule_version",
  "zone_code",
  "zone_name",
  "severity",
  "state",
  "model",
  "run_time",
  "first_valid_time",
  "last_valid_time",
  "opened_at",
  "acknowledged_at",
  "acknowledged_by",
  "minutes_to_acknowledge",
  "closed_at",
  "close_reason",
  "escalations",
  "notifications_sent",
  "notifications_failed",
  "peak_coverage_percent",
  "peak_matched_points",
] as const;

const round2 = (value: number | null) => (value === null ? null : Math.round(value * 100) / 100);

export function historyCsv(triggers: readonly HistoryTriggerDto[]): string {
  return csvDocument(
    HISTORY_CSV_HEADER,
    triggers.map((t) => [
      t.id,
      t.rule.id,
      t.rule.name,
      t.rule.version,
      t.zone.code,
      t.zone.name,
      t.severity,
      t.state,
      t.model,
      t.runTime,
      t.firstValidTime,
      t.lastValidTime,
      t.openedAt,
      t.acknowledgedAt,
      t.acknowledgedBy,
      round2(t.minutesToAcknowledge),
      t.closedAt,
      t.closeReason,
      t.escalations,
      t.notificationsSent,
      t.notificationsFailed,
      round2(t.peak.coveragePercent),
      t.peak.matchedPoints,
    ]),
  );
}
