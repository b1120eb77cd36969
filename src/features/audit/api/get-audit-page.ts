import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { auditPageDto, type AuditQuery } from "@shared/api/audit.ts";
import { api } from "@/lib/api-client.ts";
import { auditKeys } from "./audit-keys.ts";

export function getAuditPage(query: AuditQuery, signal?: AbortSignal) {
  return api.get("/api/audit", { query: { ...query }, schema: auditPageDto, signal });
}

export const auditPageQuery = (query: AuditQuery) =>
  queryOptions({
    queryKey: auditKeys.page(query),
    queryFn: ({ signal }) => getAuditPage(query, signal),
    // Keep showing the current page while the next one loads, so the table does not jump.
    placeholderData: keepPreviousData,
  });

export function useAuditPage(query: AuditQuery) {
  return useQuery(auditPageQuery(query));
}
