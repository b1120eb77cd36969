import { queryOptions, useQuery } from "@tanstack/react-query";
import { auditVerifyDto } from "@shared/api/audit.ts";
import { api } from "@/lib/api-client.ts";
import { auditKeys } from "./audit-keys.ts";

export function verifyAuditChain(signal?: AbortSignal) {
  return api.get("/api/audit/verify", { schema: auditVerifyDto, signal });
}

export const auditChainQuery = () =>
  queryOptions({
    queryKey: auditKeys.verify(),
    queryFn: ({ signal }) => verifyAuditChain(signal),
    // Walking the whole chain costs the server a pass over every row: check on demand, not on focus.
    staleTime: 5 * 60_000,
    refetchOnWindowFocus: false,
  });

export function useAuditChain() {
  return useQuery(auditChainQuery());
}
