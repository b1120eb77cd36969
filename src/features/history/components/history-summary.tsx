import type { HistorySummaryDto } from "@shared/api/history.ts";
import { formatCount } from "@/lib/format-units.ts";
import { formatMinutes } from "../format-verification.ts";
import { TRIGGER_STATE_LABELS } from "./trigger-state-label.tsx";

function Figure({ label, value, detail, tone = "" }: { label: string; value: string; detail?: string; tone?: string }) {
  return (
    <div className="flex min-w-36 flex-col rounded-md border border-line bg-surface px-3 py-2">
      <dt className="text-xs text-muted">{label}</dt>
      <dd className={`text-xl font-semibold tabular-nums ${tone}`}>{value}</dd>
      {detail && <dd className="text-xs text-muted">{detail}</dd>}
    </div>
  );
}

/** The figures a post-event review starts from: counts, acknowledgement times, escalations and failed messages. */
export function HistorySummary({ summary }: { summary: HistorySummaryDto }) {
  const top = Math.max(1, ...summary.byRule.map((r) => r.count));
  return (
    <section aria-labelledby="history-summary-title" className="mb-4 flex flex-col gap-3">
      <h2 id="history-summary-title" className="sr-only">
        Summary figures
      </h2>
      <dl className="flex flex-wrap gap-3" data-testid="history-figures">
        <Figure label="Triggers" value={String(summary.triggers)} detail={summary.byState.filter((s) => s.count > 0).map((s) => `${s.count} ${TRIGGER_STATE_LABELS[s.state].toLowerCase()}`).join(" · ") || undefined} />
        <Figure
          label="Median time to acknowledge"
          value={formatMinutes(summary.minutesToAcknowledge.median)}
          detail={`over ${formatCount(summary.acknowledged, "acknowledged trigger")}`}
        />
        <Figure label="90th percentile to acknowledge" value={formatMinutes(summary.minutesToAcknowledge.p90)} detail="9 in 10 were acknowledged sooner" />
        <Figure label="Escalations" value={String(summary.escalations)} tone={summary.escalations > 0 ? "text-caution" : ""} />
        <Figure
          label="Notification failures"
          value={String(summary.notificationFailures)}
          detail={`${formatCount(summary.notificationsSent, "message")} delivered`}
          tone={summary.notificationFailures > 0 ? "text-danger" : ""}
        />
      </dl>
      {summary.byRule.length > 0 && (
        <table className="max-w-xl text-left" aria-label="Triggers per rule">
          <thead className="text-xs text-muted">
            <tr>
              <th scope="col" className="py-1 pr-3 font-medium">
                Rule
              </th>
              <th scope="col" className="py-1 font-medium">
                Triggers
              </th>
            </tr>
          </thead>
          <tbody>
            {summary.byRule.map((r) => (
              <tr key={r.ruleId}>
                <td className="py-0.5 pr-3">{r.ruleName}</td>
                <td className="flex items-center gap-2 py-0.5">
                  <span aria-hidden="true" className="inline-block h-2.5 rounded-sm bg-accent" style={{ width: `${(r.count / top) * 10}rem` }} />
                  <span className="tabular-nums">{r.count}</span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
