/**
 * Plain-words descriptions of the parts of a rule definition, shared by the list, the history and the
 * backtest so a condition reads the same everywhere.
 */
import type { RuleDefinition } from "@shared/api/rules.ts";
import { fieldByKey } from "@shared/fields.ts";
import { severityLevel } from "@shared/rules/index.ts";
import { formatCount, formatFieldValue, formatNumber, formatStorageUnit } from "@/lib/format-units.ts";

type SpatialCondition = RuleDefinition["spatialCondition"];
type ValidTimeWindow = RuleDefinition["validTimeWindow"];
type Recipients = RuleDefinition["recipients"];

const COMPARISON_WORDS: Record<string, string> = { ">=": "≥", ">": ">", "<=": "≤", "<": "<" };
const pad2 = (n: number) => String(n).padStart(2, "0");

/** "at least 10 % of the zone", "zone maximum of mlcape ≥ 2000 J/kg". */
export function describeSpatialCondition(condition: SpatialCondition): string {
  switch (condition.kind) {
    case "any-point":
      return "any grid point in the zone";
    case "min-points":
      return `at least ${formatCount(condition.points, "grid point")} in the zone`;
    case "min-coverage":
      return `at least ${formatNumber(condition.percent, condition.percent % 1 === 0 ? 0 : 1)} % of the zone's points with data`;
    case "zone-extreme": {
      const field = fieldByKey(condition.field);
      const unit = field ? formatStorageUnit(field.unit) : "";
      const shown = field && field.display.unit && field.display.unit !== unit ? ` (${formatFieldValue(field, condition.value)} ${field.display.unit})` : "";
      const statistic = condition.statistic === "max" ? "maximum" : "minimum";
      return `zone ${statistic} of ${condition.field} ${COMPARISON_WORDS[condition.comparison]} ${formatNumber(condition.value, condition.value % 1 === 0 ? 0 : 2)}${unit ? ` ${unit}` : ""}${shown}`;
    }
  }
}

/** "any valid time", "forecast hours F00–F12", "18Z to 03Z (UTC clock)". */
export function describeValidTimeWindow(window: ValidTimeWindow): string {
  switch (window.kind) {
    case "any-time":
      return "any valid time";
    case "forecast-hours":
      return `forecast hours F${pad2(window.fromHour)}–F${pad2(window.toHour)}`;
    case "clock-hours-utc":
      return `valid ${pad2(window.fromHour)}Z to ${pad2(window.toHour)}Z${window.fromHour > window.toHour ? " (across midnight)" : ""}`;
  }
}

/** "on-call forecaster, contacts 3, 5, group 1"; `name` turns an id into a readable name when one is known. */
export function describeRecipients(recipients: Recipients, name: { contact?: (id: number) => string; group?: (id: number) => string } = {}): string {
  const parts: string[] = [];
  if (recipients.onCall) parts.push("on-call forecaster");
  const contact = name.contact ?? ((id: number) => `#${id}`);
  const group = name.group ?? ((id: number) => `#${id}`);
  if (recipients.contactIds.length) parts.push(`${recipients.contactIds.length === 1 ? "contact" : "contacts"} ${recipients.contactIds.map(contact).join(", ")}`);
  if (recipients.groupIds.length) parts.push(`${recipients.groupIds.length === 1 ? "group" : "groups"} ${recipients.groupIds.map(group).join(", ")}`);
  return parts.length ? parts.join("; ") : "nobody";
}

export function describeSeverity(severity: RuleDefinition["severity"]): string {
  return severityLevel(severity).label;
}

export const describePersistence = (frames: number) => (frames === 1 ? "a single frame is enough" : `${frames} consecutive frames of a run`);
export const describeCoolDown = (hours: number) => (hours === 0 ? "no cool-down" : `${formatCount(hours, "hour")} unless the severity rises`);
