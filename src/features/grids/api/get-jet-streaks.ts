import { queryOptions, useQuery } from "@tanstack/react-query";
import { jetStreaksDto, type JetStreaksDto } from "@shared/api/grids.ts";
import { api } from "@/lib/api-client.ts";
import { gridKeys } from "./grid-keys.ts";

export type JetStreaks = JetStreaksDto;

/** The jet streaks of a frame, checked against the shared schema before the map draws them. */
export async function getJetStreaks(frameId: number, signal?: AbortSignal): Promise<JetStreaks> {
  return api.get(`/api/grids/frames/${frameId}/jet-streaks`, { schema: jetStreaksDto, signal });
}

export const jetStreaksQuery = (frameId: number) =>
  queryOptions({
    queryKey: gridKeys.jetStreaks(frameId),
    queryFn: ({ signal }) => getJetStreaks(frameId, signal),
    // Stored with the frame and never changed afterwards.
    staleTime: Infinity,
  });

export function useJetStreaks(frameId: number) {
  return useQuery(jetStreaksQuery(frameId));
}
