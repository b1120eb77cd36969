import { useState } from "react";
import { Link } from "react-router-dom";
import type { TriggerSummaryDto } from "@shared/api/triggers.ts";
import { Button } from "@/components/ui/button.tsx";
import { Dialog } from "@/components/ui/dialog.tsx";
import { SeverityChip } from "@/components/ui/severity-chip.tsx";
import { triggerPath } from "@/config/paths.ts";
import { handoverText, orderForHandover } from "../timeline/handover-text.ts";
import { formatCoverage, formatRunLabel, formatValidWindow } from "../timeline/trigger-labels.ts";
import { TriggerStateChip } from "./trigger-state-chip.tsx";

/** What is open for the next shift, most pressing first, with a plain-text copy for the shift log. */
export function HandoverDialog({ open, onClose, triggers }: { open: boolean; onClose: () => void; triggers: readonly TriggerSummaryDto[] }) {
  const [copied, setCopied] = useState<"idle" | "done" | "failed">("idle");
  const ordered = orderForHandover(triggers);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(handoverText(triggers, new Date()));
      setCopied("done");
    } catch {
      setCopied("failed");
    }
  };
  return (
    <Dialog
      open={open}
      onClose={() => {
        setCopied("idle");
        onClose();
      }}
      title="Handover: what is open"
      description="Unacknowledged first, then by severity and valid time."
      width="lg"
    >
      {ordered.length === 0 ? (
        <p className="text-muted">Nothing is open or acknowledged: the next shift starts clean.</p>
      ) : (
        <table className="w-full text-xs">
          <caption className="sr-only">Open and acknowledged triggers</caption>
          <thead className="text-left text-muted">
            <tr className="border-b border-line">
              <th className="py-1 pr-2 font-medium">Severity</th>
              <th className="py-1 pr-2 font-medium">Rule and zone</th>
              <th className="py-1 pr-2 font-medium">Run · valid (UTC · local)</th>
              <th className="py-1 pr-2 font-medium">Coverage</th>
              <th className="py-1 font-medium">State</th>
            </tr>
          </thead>
          <tbody>
            {ordered.map((trigger) => {
              const validWindow = formatValidWindow(trigger.firstValidTime, trigger.lastValidTime);
              return (
                <tr key={trigger.id} className="border-b border-line/60 align-top last:border-0">
                  <td className="py-1.5 pr-2">
                    <SeverityChip severity={trigger.severity} />
                  </td>
                  <td className="py-1.5 pr-2">
                    <Link to={triggerPath(trigger.id)} className="font-medium text-ink hover:underline">
                      {trigger.rule.name}
                    </Link>
                    <div className="text-muted">
                      <span className="font-mono">{trigger.zone.code}</span> {trigger.zone.name}
                    </div>
                  </td>
                  <td className="py-1.5 pr-2 font-mono tabular-nums">
                    {formatRunLabel(trigger.runTime)}
                    <div className="text-muted">
                      {validWindow.utc} · {validWindow.local}
                    </div>
                  </td>
                  <td className="py-1.5 pr-2 font-mono tabular-nums">{formatCoverage(trigger.peak.coveragePercent)}</td>
                  <td className="py-1.5">
                    <TriggerStateChip state={trigger.state} />
                    {trigger.acknowledgedBy && <div className="mt-0.5 text-muted">by {trigger.acknowledgedBy}</div>}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
      <div className="mt-4 flex items-center justify-end gap-3">
        {copied === "done" && <span className="text-xs text-ok">Copied as text.</span>}
        {copied === "failed" && <span className="text-xs text-danger">The browser refused the clipboard; select the table instead.</span>}
        <Button onClick={() => void copy()} disabled={ordered.length === 0}>
          Copy as text
        </Button>
      </div>
    </Dialog>
  );
}
