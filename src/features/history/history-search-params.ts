import { historyFilters, type HistoryFilters } from "@shared/api/history.ts";

/** The history's filters live in the URL, so a review can be bookmarked, shared and printed as seen. */
export const HISTORY_FILTER_KEYS = ["from", "to", "ruleId", "ruleVersionId", "zoneId", "severity", "state", "acknowledgedBy"] as const;

/** Each parameter is checked on its own, so one bad value (hand-edited) is dropped instead of every filter. */
export function historyFiltersFromSearch(params: URLSearchParams): HistoryFilters {
  const accepted: Record<string, unknown> = {};
  for (const key of HISTORY_FILTER_KEYS) {
    const raw = params.get(key);
    if (raw === null || raw.trim() === "") continue;
    const field = historyFilters.shape[key].safeParse(raw);
    if (field.success && field.data !== undefined) accepted[key] = field.data;
  }
  return historyFilters.parse(accepted);
}

export function searchFromHistoryFilters(filters: HistoryFilters): URLSearchParams {
  const params = new URLSearchParams();
  for (const key of HISTORY_FILTER_KEYS) {
    const value = filters[key];
    if (value !== undefined && value !== "") params.set(key, String(value));
  }
  return params;
}
