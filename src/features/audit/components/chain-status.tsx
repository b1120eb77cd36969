import { Button } from "@/components/ui/button.tsx";
import { Chip } from "@/components/ui/chip.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { formatCount } from "@/lib/format-units.ts";
import { useAuditChain } from "../api/verify-audit-chain.ts";

/** Whether the audit trail's hash chain is unbroken, with a way to check again. */
export function ChainStatus() {
  const chain = useAuditChain();
  const busy = chain.isFetching;

  let badge;
  let detail: string | null = null;
  if (chain.isPending) {
    badge = <Chip>Checking the chain…</Chip>;
  } else if (chain.isError) {
    badge = <Chip tone="caution">Chain not checked</Chip>;
    detail = describeError(chain.error).message;
  } else if (chain.data.ok) {
    badge = <Chip tone="ok">Chain intact — {formatCount(chain.data.checked, "entry", "entries")} checked</Chip>;
  } else {
    badge = (
      <Chip tone="danger">{chain.data.firstBroken !== undefined ? `Broken at entry #${chain.data.firstBroken}` : "Chain broken"}</Chip>
    );
    detail =
      "An entry no longer matches the one before it: from that entry on, the record may have been changed outside Bellwether. Keep the database as it is and tell an administrator.";
  }

  return (
    <section aria-labelledby="chain-status-title" className="mb-4 flex flex-wrap items-center gap-3 rounded-md border border-line bg-surface px-4 py-2.5">
      <h2 id="chain-status-title" className="text-sm font-semibold">
        Chain status
      </h2>
      <div role="status" aria-live="polite" className="flex flex-wrap items-center gap-2">
        {badge}
        {detail && <span className="text-muted">{detail}</span>}
      </div>
      <Button size="sm" variant="ghost" className="ml-auto" onClick={() => void chain.refetch()} disabled={busy}>
        {busy ? "Checking…" : "Check again"}
      </Button>
    </section>
  );
}
