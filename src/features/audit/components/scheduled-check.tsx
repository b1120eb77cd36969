import { useQuery } from "@tanstack/react-query";
import { auditPageDto } from "@shared/api/audit.ts";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { api } from "@/lib/api-client.ts";
import { auditKeys } from "../api/audit-keys.ts";

/** The nightly job records each chain check in the trail itself ("audit.verified" or "audit.verify_failed"). */
function useLastScheduledCheck() {
  return useQuery({
    queryKey: [...auditKeys.all, "last-scheduled-check"] as const,
    queryFn: async ({ signal }) => (await api.get("/api/audit", { query: { action: "audit.verif", pageSize: 1 }, schema: auditPageDto, signal })).entries[0] ?? null,
    staleTime: 5 * 60_000,
  });
}

/** One line beside the chain status: when the nightly check last ran and what it found. */
export function ScheduledCheck() {
  const last = useLastScheduledCheck();
  if (!last.data) return <p className="mb-3 text-xs text-muted">{last.isPending ? "" : "The nightly chain check (03:17 UTC) has not run yet."}</p>;
  const ok = last.data.action === "audit.verified";
  return (
    <p className="mb-3 text-xs text-muted" data-testid="scheduled-check">
      Last nightly check <Timestamp value={last.data.at} />: <span className={ok ? "text-ok" : "font-semibold text-danger"}>{ok ? "chain intact" : "chain broken"}</span>
    </p>
  );
}
