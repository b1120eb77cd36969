import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { historyPageDto, historyTriggerDetailDto, type HistoryFilters, type HistoryQuery } from "@shared/api/history.ts";
import { api } from "@/lib/api-client.ts";
import { historyKeys } from "./history-keys.ts";

export function getTriggerHistory(query: HistoryQuery, signal?: AbortSignal) {
  return api.get("/api/history/triggers", { query: { ...query }, schema: historyPageDto, signal });
}

export const triggerHistoryQuery = (query: HistoryQuery) =>
  queryOptions({
    queryKey: historyKeys.triggers(query),
    queryFn: ({ signal }) => getTriggerHistory(query, signal),
    placeholderData: keepPreviousData,
  });

export function useTriggerHistory(query: HistoryQuery) {
  return useQuery(triggerHistoryQuery(query));
}

export const historyTriggerQuery = (id: number) =>
  queryOptions({
    queryKey: historyKeys.trigger(id),
    queryFn: ({ signal }) => api.get(`/api/history/triggers/${id}`, { schema: historyTriggerDetailDto, signal }),
  });

export function useHistoryTrigger(id: number, enabled = true) {
  return useQuery({ ...historyTriggerQuery(id), enabled });
}

/** The CSV download of the same filters (a plain link: the browser saves the file). */
export function triggerHistoryCsvUrl(filters: HistoryFilters): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value !== undefined && value !== "") params.set(key, String(value));
  const search = params.toString();
  return `/api/history/triggers.csv${search ? `?${search}` : ""}`;
}
