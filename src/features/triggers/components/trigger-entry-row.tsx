import { Link } from "react-router-dom";
import type { TriggerSummaryDto } from "@shared/api/triggers.ts";
import { severityLevel } from "@shared/rules/severity.ts";
import { SeverityChip } from "@/components/ui/severity-chip.tsx";
import { triggerPath } from "@/config/paths.ts";
import { formatUtcCycle } from "@/lib/time.ts";
import { formatCoverage, formatRunLabel, formatValidWindow, keyValues } from "../timeline/trigger-labels.ts";
import { TrendNote } from "./trend-note.tsx";
import { TriggerStateChip } from "./trigger-state-chip.tsx";
import { UtcLocalTime } from "./utc-local-time.tsx";

/** Height of a trigger line on the timeline, in CSS pixels (the windowed list needs it up front). */
export const TRIGGER_ROW_HEIGHT = 64;

/**
 * One trigger on the timeline, in two dense lines: what fired where (severity, state, rule and
 * version, zone, model run) and how strong and how widespread (valid window, coverage, peak
 * values, run-to-run change, who acknowledged).
 */
export function TriggerEntryRow({ trigger, selected, onSelect }: { trigger: TriggerSummaryDto; selected: boolean; onSelect: () => void }) {
  const level = severityLevel(trigger.severity);
  const validWindow = formatValidWindow(trigger.firstValidTime, trigger.lastValidTime);
  const values = keyValues(trigger.peak.fields);
  const active = trigger.state === "open" || trigger.state === "acknowledged";
  return (
    <div
      data-testid="timeline-trigger"
      data-trigger-id={trigger.id}
      data-state={trigger.state}
      aria-current={selected ? "true" : undefined}
      onClick={onSelect}
      className={`flex h-full cursor-default flex-col justify-center gap-1 border-b border-l-4 border-b-line py-1.5 pr-3 pl-3 ${
        selected ? "bg-raised outline-2 -outline-offset-2 outline-focus" : "hover:bg-raised/60"
      } ${active ? "" : "opacity-75"}`}
      style={{ borderLeftColor: trigger.state === "open" ? level.colour : "transparent" }}
    >
      <div className="flex min-w-0 items-center gap-2">
        <SeverityChip severity={trigger.severity} />
        <TriggerStateChip state={trigger.state} />
        <Link to={triggerPath(trigger.id)} className="min-w-0 truncate font-semibold text-ink hover:underline" onClick={(event) => event.stopPropagation()}>
          {trigger.rule.name}
        </Link>
        <span className="shrink-0 font-mono text-xs text-muted">v{trigger.rule.version}</span>
        <span className="min-w-0 truncate text-ink">
          <span className="font-mono text-xs">{trigger.zone.code}</span> {trigger.zone.name}
        </span>
        <span className="shrink-0 text-xs text-muted" title={`Model run ${formatUtcCycle(trigger.runTime)}`}>
          {trigger.model} · {formatRunLabel(trigger.runTime)}
        </span>
        <span className="ml-auto shrink-0 text-xs">
          <span className="sr-only">Opened </span>
          <UtcLocalTime value={trigger.openedAt} />
        </span>
      </div>
      <div className="flex min-w-0 items-center gap-3 text-xs text-muted">
        <span className="shrink-0 font-mono tabular-nums">
          <span className="text-ink">{validWindow.utc}</span> · {validWindow.local}
        </span>
        <span className="shrink-0">
          coverage <span className="font-mono text-ink tabular-nums">{formatCoverage(trigger.peak.coveragePercent)}</span>
        </span>
        {values.map((value) => (
          <span key={value.key} className="shrink-0">
            <span className="font-mono">{value.key}</span> <span className="font-mono text-ink tabular-nums">{value.text}</span>
          </span>
        ))}
        <TrendNote trend={trigger.trend} />
        {trigger.acknowledgedBy && (
          <span className="ml-auto min-w-0 truncate">
            acknowledged by <span className="text-ink">{trigger.acknowledgedBy}</span>
            {trigger.acknowledgedAt && (
              <>
                {" "}
                at <UtcLocalTime value={trigger.acknowledgedAt} />
              </>
            )}
          </span>
        )}
        {!trigger.acknowledgedBy && trigger.closeReason && <span className="ml-auto min-w-0 truncate">{trigger.closeReason}</span>}
      </div>
    </div>
  );
}
