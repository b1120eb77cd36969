import { ACTIVE_TRIGGER_STATES, TRIGGER_STATES, type TriggerState, type TriggerSummaryDto } from "@shared/api/triggers.ts";
import { SEVERITY_KEYS, compareSeverity, type Severity } from "@shared/rules/severity.ts";
import type { TimelineEntry } from "./timeline-rows.ts";

/**
 * The timeline's filters live in the URL (`?state=active&severity=serious&zone=3&rule=7`), so a
 * filtered view survives a reload and can be shared. Unknown or malformed values are ignored.
 */
export type StateFilter = TriggerState | "active";

export interface TimelineFilters {
  state: StateFilter | null;
  /** At least this severity. */
  severity: Severity | null;
  zoneId: number | null;
  ruleId: number | null;
}

export const NO_FILTERS: TimelineFilters = { state: null, severity: null, zoneId: null, ruleId: null };

const positiveId = (value: string | null): number | null => {
  if (value === null || !/^\d{1,9}$/.test(value)) return null;
  const id = Number(value);
  return id > 0 ? id : null;
};

export function filtersFromSearch(search: URLSearchParams): TimelineFilters {
  const state = search.get("state");
  const severity = search.get("severity");
  return {
    state: state === "active" || (TRIGGER_STATES as readonly string[]).includes(state ?? "") ? (state as StateFilter) : null,
    severity: (SEVERITY_KEYS as readonly string[]).includes(severity ?? "") ? (severity as Severity) : null,
    zoneId: positiveId(search.get("zone")),
    ruleId: positiveId(search.get("rule")),
  };
}

/** The filters written back into a query string; other parameters of `base` are kept. */
export function searchFromFilters(filters: TimelineFilters, base: URLSearchParams = new URLSearchParams()): URLSearchParams {
  const search = new URLSearchParams(base);
  const set = (name: string, value: string | number | null) => (value === null ? search.delete(name) : search.set(name, String(value)));
  set("state", filters.state);
  set("severity", filters.severity);
  set("zone", filters.zoneId);
  set("rule", filters.ruleId);
  return search;
}

export function hasFilters(filters: TimelineFilters): boolean {
  return filters.state !== null || filters.severity !== null || filters.zoneId !== null || filters.ruleId !== null;
}

export function triggerMatchesFilters(trigger: TriggerSummaryDto, filters: TimelineFilters): boolean {
  if (filters.state === "active" && !ACTIVE_TRIGGER_STATES.includes(trigger.state)) return false;
  if (filters.state !== null && filters.state !== "active" && trigger.state !== filters.state) return false;
  if (filters.severity !== null && compareSeverity(trigger.severity, filters.severity) < 0) return false;
  if (filters.zoneId !== null && trigger.zone.id !== filters.zoneId) return false;
  if (filters.ruleId !== null && trigger.rule.id !== filters.ruleId) return false;
  return true;
}

/**
 * The entries a filtered timeline shows. Triggers must match every filter; an escalation follows
 * its trigger (kept only when that trigger is loaded and matches); grid arrivals and other light
 * entries describe no trigger, so any filter hides them.
 */
export function filterTimeline(entries: readonly TimelineEntry[], filters: TimelineFilters): TimelineEntry[] {
  if (!hasFilters(filters)) return [...entries];
  const matching = new Set<number>();
  for (const entry of entries) if (entry.kind === "trigger" && triggerMatchesFilters(entry.trigger, filters)) matching.add(entry.trigger.id);
  return entries.filter((entry) => (entry.kind === "trigger" ? matching.has(entry.trigger.id) : entry.kind === "escalation" ? matching.has(entry.triggerId) : false));
}

export interface FilterOption {
  id: number;
  label: string;
}

/** The zones and rules met in the loaded entries, for the filter menus, sorted by label. */
export function filterOptions(entries: readonly TimelineEntry[]): { zones: FilterOption[]; rules: FilterOption[] } {
  const zones = new Map<number, string>();
  const rules = new Map<number, string>();
  for (const entry of entries) {
    if (entry.kind !== "trigger") continue;
    zones.set(entry.trigger.zone.id, `${entry.trigger.zone.code} · ${entry.trigger.zone.name}`);
    rules.set(entry.trigger.rule.id, entry.trigger.rule.name);
  }
  const sorted = (map: Map<number, string>) => [...map].map(([id, label]) => ({ id, label })).sort((a, b) => a.label.localeCompare(b.label));
  return { zones: sorted(zones), rules: sorted(rules) };
}
