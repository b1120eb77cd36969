import { useQueryClient, type QueryClient } from "@tanstack/react-query";
import type { IngestJobDto } from "@shared/api/grids.ts";
import type { ServerEvents } from "@shared/api/server-events.ts";
import { useServerEvents } from "@/hooks/use-server-events.ts";
import { gridKeys } from "../api/grid-keys.ts";

/**
 * Applies one progress event to the cached job list. Returns null when the job is not in the list
 * (a file that just landed in the inbox), so the caller refetches instead.
 */
export function withJobProgress(jobs: readonly IngestJobDto[], event: ServerEvents["ingest.progress"]): IngestJobDto[] | null {
  const index = jobs.findIndex((job) => job.id === event.jobId);
  if (index < 0) return null;
  const job = jobs[index]!;
  // A late progress message must not pull a finished job back to running.
  if (job.state === "ready" || job.state === "failed") return [...jobs];
  const next = [...jobs];
  next[index] = { ...job, state: event.state, progress: event.progress, stageNote: event.note };
  return next;
}

function applyProgress(queryClient: QueryClient, event: ServerEvents["ingest.progress"]) {
  const jobs = queryClient.getQueryData<IngestJobDto[]>(gridKeys.jobs());
  const next = jobs ? withJobProgress(jobs, event) : null;
  if (next) queryClient.setQueryData(gridKeys.jobs(), next);
  else void queryClient.invalidateQueries({ queryKey: gridKeys.jobs() });
}

/** Keeps the jobs and runs caches current from the server's live events while a grid screen is open. */
export function useGridLiveUpdates(): void {
  const queryClient = useQueryClient();
  useServerEvents({
    onOpen: () => void queryClient.invalidateQueries({ queryKey: gridKeys.all, predicate: (q) => q.queryKey[1] === "jobs" || q.queryKey[1] === "runs" }),
    "ingest.progress": (event) => applyProgress(queryClient, event),
    "ingest.finished": () => {
      void queryClient.invalidateQueries({ queryKey: gridKeys.jobs() });
      void queryClient.invalidateQueries({ queryKey: gridKeys.runs() });
    },
    "frame.ready": () => void queryClient.invalidateQueries({ queryKey: gridKeys.runs() }),
  });
}
