import type { TriggerSummaryDto } from "@shared/api/triggers.ts";
import { compareSeverity, severityLevel } from "@shared/rules/severity.ts";
import { formatUtcDateTime, type LocalFormatOptions } from "@/lib/time.ts";
import { formatCoverage, formatRunLabel, formatValidWindow } from "./trigger-labels.ts";

/**
 * What is open for the next shift: unacknowledged triggers first, then acknowledged ones; within
 * each, the most severe first and then the soonest valid time.
 */
export function orderForHandover(triggers: readonly TriggerSummaryDto[]): TriggerSummaryDto[] {
  const stateRank = (t: TriggerSummaryDto) => (t.state === "open" ? 0 : t.state === "acknowledged" ? 1 : 2);
  return triggers
    .filter((t) => t.state === "open" || t.state === "acknowledged")
    .sort((a, b) => stateRank(a) - stateRank(b) || compareSeverity(b.severity, a.severity) || a.firstValidTime.localeCompare(b.firstValidTime));
}

/** One trigger as a plain line for the handover note. */
export function handoverLine(trigger: TriggerSummaryDto, options: LocalFormatOptions = {}): string {
  const validWindow = formatValidWindow(trigger.firstValidTime, trigger.lastValidTime, options);
  const who = trigger.state === "acknowledged" ? `acknowledged by ${trigger.acknowledgedBy ?? "someone"}` : "NOT acknowledged";
  return [
    `[${severityLevel(trigger.severity).label}]`,
    `${trigger.rule.name} v${trigger.rule.version}`,
    `${trigger.zone.code} ${trigger.zone.name}`,
    `${trigger.model} ${formatRunLabel(trigger.runTime)}`,
    `valid ${validWindow.utc} (${validWindow.local})`,
    `coverage ${formatCoverage(trigger.peak.coveragePercent)}`,
    who,
  ].join(" · ");
}

/** The handover note as plain text, ready to paste into the shift log. */
export function handoverText(triggers: readonly TriggerSummaryDto[], now: Date, options: LocalFormatOptions = {}): string {
  const ordered = orderForHandover(triggers);
  const open = ordered.filter((t) => t.state === "open").length;
  const header = `Bellwether handover, ${formatUtcDateTime(now)}: ${open} open, ${ordered.length - open} acknowledged.`;
  return [header, ...ordered.map((t) => `- ${handoverLine(t, options)}`)].join("\n");
}
