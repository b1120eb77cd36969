import { useMemo } from "react";
import { useQueries } from "@tanstack/react-query";
import { Link, useSearchParams } from "react-router-dom";
import { MAX_HISTORY_TRIGGERS, type HistoryFilters, type HistoryTriggerDto } from "@shared/api/history.ts";
import { DEFAULT_WINDOW_HOURS, type VerificationQuery } from "@shared/api/verification.ts";
import { SAFETY_CAUTION } from "@shared/caution.ts";
import { severityLevel } from "@shared/rules/index.ts";
import { Button } from "@/components/ui/button.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { paths } from "@/config/paths.ts";
import { describeError } from "@/lib/describe-error.ts";
import { formatUtcDateTime } from "@/lib/time.ts";
import { historyTriggerQuery, useTriggerHistory } from "../api/get-trigger-history.ts";
import { useFilterOptions } from "../api/get-filter-options.ts";
import { useVerification } from "../api/get-verification.ts";
import { LeadTimeHistogram } from "../charts/lead-time-histogram.tsx";
import { PerformanceDiagram } from "../charts/performance-diagram.tsx";
import { diagramPoints } from "../charts/diagram-points.ts";
import { formatMinutes } from "../format-verification.ts";
import { historyFiltersFromSearch, searchFromHistoryFilters } from "../history-search-params.ts";
import { HistorySummary } from "./history-summary.tsx";
import { PrintStyles } from "./print-styles.tsx";
import { ScoresTable } from "./scores-table.tsx";
import { TRIGGER_STATE_LABELS } from "./trigger-state-label.tsx";

/** Event logs are listed per trigger up to this many; beyond it the report would run to dozens of pages. */
const MAX_LOGGED_TRIGGERS = 40;
const HOUR_MS = 3_600_000;

/** The verification period for the report: the valid times of its triggers (widened by the window). */
function verificationFor(filters: HistoryFilters, triggers: readonly HistoryTriggerDto[]): VerificationQuery | null {
  if (triggers.length === 0) return null;
  const first = Math.min(...triggers.map((t) => Date.parse(t.firstValidTime))) - DEFAULT_WINDOW_HOURS * HOUR_MS;
  const last = Math.max(...triggers.map((t) => Date.parse(t.lastValidTime))) + DEFAULT_WINDOW_HOURS * HOUR_MS;
  return { from: new Date(first).toISOString(), to: new Date(Math.max(last, first + HOUR_MS)).toISOString(), ruleId: filters.ruleId, ruleVersionId: filters.ruleVersionId, space: "zone", windowHours: DEFAULT_WINDOW_HOURS };
}

function FilterLine({ filters }: { filters: HistoryFilters }) {
  const options = useFilterOptions();
  const rule = options.data?.rules.find((r) => r.id === filters.ruleId);
  const zone = options.data?.zones.find((z) => z.id === filters.zoneId);
  const parts = [
    filters.from || filters.to ? `opened ${filters.from ? `from ${formatUtcDateTime(filters.from)} ` : ""}${filters.to ? `to ${formatUtcDateTime(filters.to)}` : "onwards"}` : "every trigger on record",
    rule ? `rule ${rule.name}` : null,
    filters.ruleVersionId ? `version id ${filters.ruleVersionId}` : null,
    zone ? `zone ${zone.code}` : null,
    filters.severity ? `severity ${severityLevel(filters.severity).label}` : null,
    filters.state ? `state ${TRIGGER_STATE_LABELS[filters.state]}` : null,
    filters.acknowledgedBy ? (filters.acknowledgedBy === "none" ? "never acknowledged" : `acknowledged by ${filters.acknowledgedBy}`) : null,
  ].filter(Boolean);
  return <p className="text-muted">Selection: {parts.join(" · ")}.</p>;
}

/** A print-styled post-event report: the review's figures, scores, failed messages, every trigger and its log. */
export function EventReportPage() {
  const [searchParams] = useSearchParams();
  const filters = historyFiltersFromSearch(searchParams);
  const history = useTriggerHistory({ ...filters, limit: MAX_HISTORY_TRIGGERS });
  const triggers = history.data?.triggers ?? [];
  const verificationQuery = useMemo(() => verificationFor(filters, triggers), [history.data]);
  const verification = useVerification(verificationQuery);
  const logged = triggers.length <= MAX_LOGGED_TRIGGERS ? triggers : [];
  const logs = useQueries({ queries: logged.map((t) => historyTriggerQuery(t.id)) });
  const generatedAt = useMemo(() => new Date().toISOString(), []);
  const failed = triggers.filter((t) => t.notificationsFailed > 0);
  const search = searchFromHistoryFilters(filters).toString();

  return (
    <article className="mx-auto flex max-w-5xl flex-col gap-5" aria-labelledby="report-title">
      <PrintStyles />
      <div data-print-hide className="flex items-center gap-2">
        <Button variant="primary" size="sm" onClick={() => window.print()}>
          Print or save as PDF
        </Button>
        <Link to={`${paths.history}${search ? `?${search}` : ""}`} className="text-xs text-accent hover:underline">
          Back to the history
        </Link>
      </div>
      <header className="flex flex-col gap-1 border-b border-line pb-3">
        <h1 id="report-title" className="text-xl font-semibold">
          Post-event review
        </h1>
        <FilterLine filters={filters} />
        <p className="text-xs text-muted">Generated {formatUtcDateTime(generatedAt)} from Bellwether's records. All times UTC.</p>
        <p className="text-xs text-muted">{SAFETY_CAUTION}</p>
      </header>

      {history.isPending && <Loading label="Loading the history…" />}
      {history.isError && (
        <Notice tone="danger" title="Could not load the history">
          {describeError(history.error).message}
        </Notice>
      )}
      {history.data && (
        <>
          <section aria-labelledby="report-figures">
            <h2 id="report-figures" className="mb-2 text-base font-semibold">
              Figures
            </h2>
            <HistorySummary summary={history.data.summary} />
          </section>

          <section aria-labelledby="report-verification" className="flex flex-col gap-3">
            <h2 id="report-verification" className="text-base font-semibold">
              Verification against storm reports
            </h2>
            {verificationQuery === null && <p className="text-muted">No trigger in this selection, so nothing to verify.</p>}
            {verification.isPending && verificationQuery && <Loading label="Scoring…" />}
            {verification.isError && <Notice tone="danger">{describeError(verification.error).message}</Notice>}
            {verification.data && (
              <>
                <p className="text-xs text-muted">
                  Valid times {formatUtcDateTime(verification.data.from)} – {formatUtcDateTime(verification.data.to)}; a report counts inside the trigger's zone from its opening until{" "}
                  {verification.data.options.windowHours} h after its last valid time.
                  {verification.data.reports.some((r) => r.invented) && " The demo office's storm reports are invented."}
                </p>
                <ScoresTable result={verification.data} overallLabel="Selection" />
                <div className="grid grid-cols-2 gap-4">
                  <PerformanceDiagram title="Performance" points={diagramPoints(verification.data, "Selection")} />
                  <LeadTimeHistogram title="Lead time" minutes={verification.data.overall.leadTime.minutes} median={verification.data.overall.leadTime.median} p90={verification.data.overall.leadTime.p90} />
                </div>
              </>
            )}
          </section>

          <section aria-labelledby="report-failures">
            <h2 id="report-failures" className="mb-2 text-base font-semibold">
              Messages that failed
            </h2>
            {failed.length === 0 ? (
              <p className="text-muted">Every message was delivered or is still on its way.</p>
            ) : (
              <ul className="list-disc pl-5">
                {failed.map((t) => (
                  <li key={t.id}>
                    Trigger #{t.id} ({t.rule.name}, {t.zone.code}): {t.notificationsFailed} failed, {t.notificationsSent} delivered
                  </li>
                ))}
              </ul>
            )}
          </section>

          <section aria-labelledby="report-triggers">
            <h2 id="report-triggers" className="mb-2 text-base font-semibold">
              Triggers ({triggers.length})
            </h2>
            <table className="w-full text-left text-xs" aria-label="Triggers in the report">
              <thead className="border-b border-line text-muted">
                <tr>
                  {["#", "Opened", "Rule", "Zone", "Severity", "State", "Valid", "Acknowledged", "To acknowledge", "Escalations", "Messages sent / failed"].map((h) => (
                    <th key={h} scope="col" className="py-1 pr-2 font-medium">
                      {h}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {triggers.map((t) => (
                  <tr key={t.id} className="border-b border-line">
                    <td className="py-1 pr-2 font-mono">{t.id}</td>
                    <td className="py-1 pr-2 font-mono whitespace-nowrap">{formatUtcDateTime(t.openedAt)}</td>
                    <td className="py-1 pr-2">
                      {t.rule.name} v{t.rule.version}
                    </td>
                    <td className="py-1 pr-2">{t.zone.code}</td>
                    <td className="py-1 pr-2">{severityLevel(t.severity).label}</td>
                    <td className="py-1 pr-2">{TRIGGER_STATE_LABELS[t.state]}</td>
                    <td className="py-1 pr-2 font-mono whitespace-nowrap">
                      {formatUtcDateTime(t.firstValidTime)} – {formatUtcDateTime(t.lastValidTime).slice(11)}
                    </td>
                    <td className="py-1 pr-2">{t.acknowledgedBy ?? "nobody"}</td>
                    <td className="py-1 pr-2 font-mono">{formatMinutes(t.minutesToAcknowledge)}</td>
                    <td className="py-1 pr-2 font-mono">{t.escalations}</td>
                    <td className="py-1 pr-2 font-mono">
                      {t.notificationsSent} / {t.notificationsFailed}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </section>

          <section aria-labelledby="report-logs" className="flex flex-col gap-3">
            <h2 id="report-logs" className="text-base font-semibold">
              Event log per trigger
            </h2>
            {triggers.length > MAX_LOGGED_TRIGGERS && <p className="text-muted">More than {MAX_LOGGED_TRIGGERS} triggers: narrow the selection to print each trigger's log.</p>}
            {logged.map((t, k) => {
              const log = logs[k];
              return (
                <div key={t.id} className="flex flex-col gap-1">
                  <h3 className="text-sm font-semibold">
                    #{t.id} {t.rule.name} — {t.zone.code}
                  </h3>
                  {log?.data ? (
                    <ol className="text-xs">
                      {log.data.timeline.map((item) => (
                        <li key={`${item.kind}-${item.kind === "event" ? item.event.id : item.notification.id}`} className="grid grid-cols-[10rem_1fr] gap-2">
                          <span className="font-mono">{formatUtcDateTime(item.at)}</span>
                          <span>
                            {item.kind === "event"
                              ? `${item.event.kind}${item.event.actor ? ` by ${item.event.actor}` : ""}${item.event.note ? ` — ${item.event.note}` : ""}`
                              : `${item.notification.channel} to ${item.notification.recipient}: ${item.notification.state}${item.notification.lastError ? ` (${item.notification.lastError})` : ""}`}
                          </span>
                        </li>
                      ))}
                    </ol>
                  ) : (
                    <p className="text-xs text-muted">{log?.isError ? "Could not load this log." : "Loading…"}</p>
                  )}
                </div>
              );
            })}
          </section>
        </>
      )}
    </article>
  );
}
