import { infiniteQueryOptions, useInfiniteQuery } from "@tanstack/react-query";
import { z } from "zod";
import { api } from "@/lib/api-client.ts";
import type { TimelineEntry } from "../timeline/timeline-rows.ts";
import { readTimelineEntry } from "./read-timeline-entry.ts";
import { triggerKeys } from "./trigger-keys.ts";

/** Entries per page; older pages load as the list is scrolled down. */
export const TIMELINE_PAGE_SIZE = 300;

// Entries are checked one by one (read-timeline-entry.ts), so one odd entry never blanks the list.
const timelineEnvelope = z.object({ entries: z.array(z.unknown()) });

export interface TimelinePage {
  entries: TimelineEntry[];
  /** How many entries the server sent (some may have been dropped as unreadable). */
  received: number;
  /** The time of the oldest entry sent: the next page starts before it. */
  oldestAt: string | null;
}

export async function getTimelinePage(before: string | null, signal?: AbortSignal): Promise<TimelinePage> {
  const { entries } = await api.get("/api/timeline", { schema: timelineEnvelope, query: { limit: TIMELINE_PAGE_SIZE, before }, signal });
  const read = entries.map(readTimelineEntry).filter((entry): entry is TimelineEntry => entry !== null);
  const times = entries.flatMap((entry) => (typeof entry === "object" && entry && typeof (entry as { at?: unknown }).at === "string" ? [(entry as { at: string }).at] : []));
  const oldestAt = times.length ? times.reduce((a, b) => (Date.parse(a) <= Date.parse(b) ? a : b)) : null;
  return { entries: read, received: entries.length, oldestAt };
}

export const timelineQuery = () =>
  infiniteQueryOptions({
    queryKey: triggerKeys.timeline(),
    queryFn: ({ pageParam, signal }) => getTimelinePage(pageParam, signal),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => (last.received < TIMELINE_PAGE_SIZE || !last.oldestAt ? undefined : last.oldestAt),
    // Live events keep the list current; this slow poll only covers a stream that is down.
    refetchInterval: 120_000,
  });

export function useTimeline() {
  return useInfiniteQuery(timelineQuery());
}
