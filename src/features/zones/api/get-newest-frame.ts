import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { frameDetailDto, gridGeometryDto, runDto } from "@shared/api/grids.ts";
import { api } from "@/lib/api-client.ts";
import { zoneKeys } from "./zone-keys.ts";

const runsEnvelope = z.object({ runs: z.array(runDto) });
const frameEnvelope = z.object({ frame: frameDetailDto.extend({ geometry: gridGeometryDto }) });
export type DrawingFrame = z.infer<typeof frameEnvelope>["frame"];

/**
 * The frame zones are drawn over: the last valid time of the newest run that has frames (the same
 * frame the rule preview uses), or null before any model run has arrived.
 */
export async function getNewestFrame(signal?: AbortSignal): Promise<DrawingFrame | null> {
  const { runs } = await api.get("/api/grids/runs", { schema: runsEnvelope, query: { limit: 3 }, signal });
  const newest = runs.find((run) => run.frames.length > 0)?.frames.at(-1);
  if (!newest) return null;
  const { frame } = await api.get(`/api/grids/frames/${newest.id}`, { schema: frameEnvelope, signal });
  return frame;
}

export const newestFrameQuery = () => queryOptions({ queryKey: [...zoneKeys.all, "newest-frame"] as const, queryFn: ({ signal }) => getNewestFrame(signal), staleTime: 60_000 });

export function useNewestFrame(enabled = true) {
  return useQuery({ ...newestFrameQuery(), enabled });
}
