import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { runDto, type RunDto } from "@shared/api/grids.ts";
import { api } from "@/lib/api-client.ts";
import { gridKeys } from "./grid-keys.ts";

const runsEnvelope = z.object({ runs: z.array(runDto) });

/** How many recent model runs the Grids page and the frame stepper know about. */
export const RUN_LIST_LIMIT = 40;

export async function getRuns(signal?: AbortSignal): Promise<RunDto[]> {
  const { runs } = await api.get("/api/grids/runs", { schema: runsEnvelope, query: { limit: RUN_LIST_LIMIT }, signal });
  return runs;
}

export const runsQuery = () => queryOptions({ queryKey: gridKeys.runs(), queryFn: ({ signal }) => getRuns(signal) });

export function useRuns() {
  return useQuery(runsQuery());
}
