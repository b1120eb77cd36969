import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { ingestJobDto, type IngestJobDto } from "@shared/api/grids.ts";
import { api } from "@/lib/api-client.ts";
import { gridKeys } from "./grid-keys.ts";

const jobsEnvelope = z.object({ jobs: z.array(ingestJobDto) });

/** How many recent jobs the Grids page lists. */
export const JOB_LIST_LIMIT = 50;

export async function getIngestJobs(signal?: AbortSignal): Promise<IngestJobDto[]> {
  const { jobs } = await api.get("/api/grids/jobs", { schema: jobsEnvelope, query: { limit: JOB_LIST_LIMIT }, signal });
  return jobs;
}

export function isJobRunning(job: Pick<IngestJobDto, "state">): boolean {
  return job.state !== "ready" && job.state !== "failed";
}

export const ingestJobsQuery = () =>
  queryOptions({
    queryKey: gridKeys.jobs(),
    queryFn: ({ signal }) => getIngestJobs(signal),
    // Live events keep running jobs current; this slow poll only covers a stream that is down.
    refetchInterval: (query) => (query.state.data?.some(isJobRunning) ? 15_000 : false),
  });

export function useIngestJobs() {
  return useQuery(ingestJobsQuery());
}
