import type { ReactNode } from "react";
import { Link } from "react-router-dom";
import type { TriggerDetailDto } from "@shared/api/triggers.ts";
import { Panel } from "@/components/ui/panel.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { rulePaths } from "@/config/paths.ts";
import { formatLocalBeside, formatUtcCycle } from "@/lib/time.ts";
import { expressionOf } from "../detail/trigger-frames.ts";
import { formatCoverage, formatValidWindow, keyValues } from "../timeline/trigger-labels.ts";
import { TrendNote } from "./trend-note.tsx";

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="grid grid-cols-[8rem_1fr] gap-x-3 border-b border-line/60 py-1.5 last:border-0">
      <dt className="text-xs text-muted">{term}</dt>
      <dd className="min-w-0">{children}</dd>
    </div>
  );
}

/** What fired, where and when: the rule version with its expression, the zone, the model run and the valid times. */
export function TriggerFacts({ trigger }: { trigger: TriggerDetailDto }) {
  const validWindow = formatValidWindow(trigger.firstValidTime, trigger.lastValidTime);
  const values = keyValues(trigger.peak.fields, 6);
  return (
    <Panel title="What fired">
      <dl className="text-sm">
        <Fact term="Rule">
          <Link to={rulePaths.detail(trigger.rule.id)} className="font-medium text-accent hover:underline">
            {trigger.rule.name}
          </Link>{" "}
          <span className="font-mono text-xs text-muted">version {trigger.rule.version}</span>
          <pre className="mt-1 font-mono text-xs break-words whitespace-pre-wrap text-ink">{expressionOf(trigger) || "—"}</pre>
        </Fact>
        <Fact term="Zone">
          <span className="font-mono text-xs">{trigger.zone.code}</span> {trigger.zone.name}
        </Fact>
        <Fact term="Model run">
          <span className="font-mono text-xs">
            {trigger.model} · {formatUtcCycle(trigger.runTime)}
          </span>
          <span className="text-xs text-muted"> · {formatLocalBeside(trigger.runTime)}</span>
        </Fact>
        <Fact term="Valid">
          <span className="font-mono text-xs">{validWindow.utc}</span>
          <span className="text-xs text-muted"> · {validWindow.local}</span>
        </Fact>
        <Fact term="Peak">
          <span className="text-xs">
            coverage <span className="font-mono">{formatCoverage(trigger.peak.coveragePercent)}</span>
            {values.map((value) => (
              <span key={value.key}>
                {" · "}
                <span className="font-mono text-muted">{value.key}</span> <span className="font-mono">{value.text}</span>
              </span>
            ))}
            {" · "}
            <TrendNote trend={trigger.trend} />
          </span>
        </Fact>
        <Fact term="Opened">
          <Timestamp value={trigger.openedAt} />
        </Fact>
        {trigger.acknowledgedBy && (
          <Fact term="Acknowledged">
            <span className="text-xs">{trigger.acknowledgedBy} · </span>
            <Timestamp value={trigger.acknowledgedAt} />
          </Fact>
        )}
        {trigger.closedAt && (
          <Fact term="Closed">
            <Timestamp value={trigger.closedAt} />
            {trigger.closeReason && <p className="text-xs text-muted">{trigger.closeReason}</p>}
          </Fact>
        )}
      </dl>
    </Panel>
  );
}
