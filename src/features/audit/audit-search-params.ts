import { auditQuery, type AuditQuery } from "@shared/api/audit.ts";

/** The filters and page of the audit screen live in the URL, so a view can be bookmarked or shared. */
export const AUDIT_PAGE_SIZES = [25, 50, 100] as const;

const FILTER_KEYS = ["action", "actor", "targetType", "from", "to"] as const;
export type AuditFilterKey = (typeof FILTER_KEYS)[number];
export type AuditFilters = Partial<Record<AuditFilterKey, string>>;

/**
 * Reads the audit query from URL parameters. Each parameter is checked on its own with the
 * shared schema, so one bad value (a hand-edited "page=abc") falls back to its default instead
 * of discarding every filter.
 */
export function auditQueryFromSearch(params: URLSearchParams): AuditQuery {
  const accepted: Record<string, unknown> = {};
  for (const key of Object.keys(auditQuery.shape) as (keyof typeof auditQuery.shape)[]) {
    const raw = params.get(key);
    if (raw === null || raw.trim() === "") continue;
    const field = auditQuery.shape[key].safeParse(raw);
    if (field.success && field.data !== undefined) accepted[key] = field.data;
  }
  return auditQuery.parse(accepted);
}

/** The reverse: only non-default values appear in the URL. */
export function searchFromAuditQuery(query: AuditQuery): URLSearchParams {
  const params = new URLSearchParams();
  for (const key of FILTER_KEYS) {
    const value = query[key];
    if (value) params.set(key, value);
  }
  const defaults = auditQuery.parse({});
  if (query.page !== defaults.page) params.set("page", String(query.page));
  if (query.pageSize !== defaults.pageSize) params.set("pageSize", String(query.pageSize));
  return params;
}

export function filtersOf(query: AuditQuery): AuditFilters {
  const filters: AuditFilters = {};
  for (const key of FILTER_KEYS) if (query[key]) filters[key] = query[key];
  return filters;
}

/** New filters start again at page 1; the page size is kept. */
export function withFilters(query: AuditQuery, filters: AuditFilters): AuditQuery {
  const next: AuditQuery = { page: 1, pageSize: query.pageSize };
  for (const key of FILTER_KEYS) {
    const value = filters[key]?.trim();
    if (value) next[key] = value;
  }
  return next;
}
