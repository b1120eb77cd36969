import { queryOptions, useQueries, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { frameDetailDto, gridGeometryDto } from "@shared/api/grids.ts";
import { api } from "@/lib/api-client.ts";
import { gridKeys } from "./grid-keys.ts";

/** A frame as the map needs it: the geometry is checked here, at the edge, before any maths runs on it. */
const mapFrameDto = frameDetailDto.extend({ geometry: gridGeometryDto });
export type MapFrame = z.infer<typeof mapFrameDto>;

const frameEnvelope = z.object({ frame: mapFrameDto });

export async function getFrame(frameId: number, signal?: AbortSignal): Promise<MapFrame> {
  const { frame } = await api.get(`/api/grids/frames/${frameId}`, { schema: frameEnvelope, signal });
  return frame;
}

export const frameQuery = (frameId: number) =>
  queryOptions({
    queryKey: gridKeys.frame(frameId),
    queryFn: ({ signal }) => getFrame(frameId, signal),
    // A stored frame never changes; a newer file for the same valid time becomes a new frame id.
    staleTime: Infinity,
  });

export function useFrame(frameId: number) {
  return useQuery(frameQuery(frameId));
}

/** Several frames at once (the other valid times of a run, for a colour scale shared across them). */
export function useFrames(frameIds: readonly number[]) {
  return useQueries({ queries: frameIds.map((id) => frameQuery(id)) });
}
