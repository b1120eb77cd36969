import type { HistoryQuery } from "@shared/api/history.ts";
import type { StormReportsQuery } from "@shared/api/storm-reports.ts";
import type { CompareQuery, VerificationQuery } from "@shared/api/verification.ts";

/** The one query-key factory for alert history, storm reports and verification. */
export const historyKeys = {
  all: ["history"] as const,
  triggers: (query: HistoryQuery) => [...historyKeys.all, "triggers", query] as const,
  trigger: (id: number) => [...historyKeys.all, "trigger", id] as const,
  options: () => [...historyKeys.all, "options"] as const,
  versions: (ruleId: number) => [...historyKeys.all, "versions", ruleId] as const,
  reports: (query: StormReportsQuery) => [...historyKeys.all, "reports", query] as const,
  /** Everything derived from storm reports, refreshed after an upload. */
  reportsAll: () => [...historyKeys.all, "reports"] as const,
  verification: (query: VerificationQuery) => [...historyKeys.all, "verification", query] as const,
  verificationAll: () => [...historyKeys.all, "verification"] as const,
  comparison: (query: CompareQuery) => [...historyKeys.all, "comparison", query] as const,
};
