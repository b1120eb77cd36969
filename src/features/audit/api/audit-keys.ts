import type { AuditQuery } from "@shared/api/audit.ts";

/** The one query-key factory for the audit trail. */
export const auditKeys = {
  all: ["audit"] as const,
  pages: () => [...auditKeys.all, "page"] as const,
  page: (query: AuditQuery) => [...auditKeys.pages(), query] as const,
  verify: () => [...auditKeys.all, "verify"] as const,
};
