import type { AuditQuery } from "@shared/api/audit.ts";

/** The CSV download of the entries the filters select (every page, oldest first, with hashes). */
export function auditExportUrl(query: AuditQuery): string {
  const params = new URLSearchParams();
  for (const key of ["action", "actor", "targetType", "from", "to"] as const) {
    const value = query[key];
    if (value) params.set(key, value);
  }
  const search = params.toString();
  return `/api/audit/export.csv${search ? `?${search}` : ""}`;
}

export function AuditExportLink({ query }: { query: AuditQuery }) {
  return (
    <a
      href={auditExportUrl(query)}
      download
      className="inline-flex h-7 items-center rounded border border-line bg-raised px-2.5 text-xs font-medium text-ink hover:border-muted"
      title="Every entry these filters select, oldest first, with the hashes that chain them"
    >
      Export CSV
    </a>
  );
}
