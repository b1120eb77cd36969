import type { NotifyChange } from "../../../shared/api/notifications.ts";
import type { TriggerSummaryDto } from "../../../shared/api/triggers.ts";
import { severityLevel, type Severity } from "../../../shared/rules/severity.ts";
import { localSpan, peakLines, utcCycle, utcSpan } from "./format-facts.ts";

/** Everything a message says about one trigger, already worded for people. */
export interface TriggerFacts {
  triggerId: number;
  change: string;
  rule: string;
  severity: Severity;
  severityLabel: string;
  severityColour: string;
  zone: string;
  zoneCode: string;
  validUtc: string;
  validLocal: string;
  model: string;
  run: string;
  level: string;
  coverage: string;
  peak: string[];
  link: string;
  state: string;
}

export function changeLabel(change: NotifyChange, level: number | null): string {
  switch (change) {
    case "opened":
      return "New trigger";
    case "severity-rose":
      return "Severity rose";
    case "escalated":
      return `Escalation, level ${level ?? 1} (not acknowledged yet)`;
    case "digest":
      return "Digest";
  }
}

export function triggerLink(publicUrl: string, triggerId: number): string {
  return `${publicUrl.replace(/\/+$/, "")}/triggers/${triggerId}`;
}

export function triggerFacts(trigger: TriggerSummaryDto, ctx: { change: NotifyChange; level: number | null; publicUrl: string; timeZone: string }): TriggerFacts {
  const severity = severityLevel(trigger.severity);
  const coverage = trigger.peak.coveragePercent === null ? `${trigger.peak.matchedPoints} matched point(s)` : `${trigger.peak.coveragePercent.toFixed(0)} % of the zone (${trigger.peak.matchedPoints} point(s))`;
  return {
    triggerId: trigger.id,
    change: changeLabel(ctx.change, ctx.level),
    rule: trigger.rule.name,
    severity: trigger.severity,
    severityLabel: severity.label,
    severityColour: severity.colour,
    zone: trigger.zone.name,
    zoneCode: trigger.zone.code,
    validUtc: utcSpan(trigger.firstValidTime, trigger.lastValidTime),
    validLocal: localSpan(trigger.firstValidTime, trigger.lastValidTime, ctx.timeZone),
    model: trigger.model,
    run: utcCycle(trigger.runTime),
    level: ctx.level === null ? "" : String(ctx.level),
    coverage,
    peak: peakLines(trigger.peak.fields),
    link: triggerLink(ctx.publicUrl, trigger.id),
    state: trigger.state,
  };
}

/** Values for the office's templates (shared/api/notifications.ts lists which each template may use). */
export function templateValues(facts: TriggerFacts): Record<string, string> {
  return {
    change: facts.change,
    rule: facts.rule,
    severity: facts.severityLabel,
    zone: facts.zone,
    zoneCode: facts.zoneCode,
    validUtc: facts.validUtc,
    validLocal: facts.validLocal,
    model: facts.model,
    run: facts.run,
    level: facts.level,
    link: facts.link,
  };
}
